package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.notNullValue;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.http.ContentType;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.team.TeamSettings;
import org.trendwright.testing.TeamAccess;

/** Setup, sign-in, members, tokens and the audit log through the running server, on both stores. */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class TeamApiTest {

    /** A signed-in browser: its cookie and CSRF token. */
    record Browser(String cookie, String csrf) {
    }

    private final FreshStore.Kind kind;
    private RunningServer server;

    TeamApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @BeforeEach
    void start() {
        server = RunningServer.start(kind);
    }

    @AfterEach
    void stop() {
        if (server != null) { // null when the PostgreSQL variant was skipped
            server.close();
        }
    }

    private long addMember(String username, String role) {
        return server.given().contentType(ContentType.JSON).body("{\"username\": \"" + username + "\", \"password\": \""
                + username + "-password\", \"role\": \"" + role + "\"}").post("/api/members").then().statusCode(201)
                .body("role", equalTo(role)).extract().<Number>path("id").longValue();
    }

    private Response signIn(String username, String password) {
        return server.anonymous().contentType(ContentType.JSON)
                .body("{\"username\": \"" + username + "\", \"password\": \"" + password + "\"}").post("/api/session");
    }

    private Browser browser(String username) {
        Response r = signIn(username, username + "-password");
        assertEquals(200, r.statusCode(), r.asString());
        return new Browser(r.getCookie("tw_session"), r.path("csrfToken"));
    }

    private RequestSpecification as(Browser b) {
        return server.anonymous().cookie("tw_session", b.cookie()).header("X-CSRF-Token", b.csrf());
    }

    private static final String CSV = "period,value\n2024-Q1,1\n2024-Q2,2\n2024-Q3,3\n";

    @Test
    void setup_works_once_and_only_with_the_setup_code() {
        String body = "{\"setupCode\": \"%s\", \"username\": \"second\", \"password\": \"second-password\"}";
        server.anonymous().contentType(ContentType.JSON).body(body.formatted(TeamAccess.SETUP_CODE)).post("/api/setup")
                .then().statusCode(409);
        server.given().get("/api/members").then().statusCode(200).body("items.username", equalTo(java.util.List.of("admin")))
                .body("items[0].role", equalTo("admin"));
    }

    @Test
    void sign_in_sets_an_http_only_same_site_strict_expiring_cookie_and_sign_out_ends_it_on_the_server() {
        addMember("ann", "viewer");
        Response r = signIn("ann", "ann-password");
        r.then().statusCode(200).body("member.username", equalTo("ann")).body("member.role", equalTo("viewer"))
                .body("csrfToken", notNullValue());
        String setCookie = r.getHeader("Set-Cookie");
        // RFC 6265 attributes; OWASP Session Management Cheat Sheet.
        assertTrue(setCookie.contains("HttpOnly"), setCookie);
        assertTrue(setCookie.contains("SameSite=Strict"), setCookie);
        assertTrue(setCookie.contains("Max-Age=43200"), setCookie);
        assertFalse(setCookie.contains("Secure"), "plain HTTP: no Secure attribute");
        Browser ann = new Browser(r.getCookie("tw_session"), r.path("csrfToken"));
        as(ann).get("/api/session").then().statusCode(200).body("member.username", equalTo("ann"))
                .body("csrfToken", equalTo(ann.csrf()));
        as(ann).delete("/api/session").then().statusCode(204);
        as(ann).get("/api/session").then().statusCode(401).header("WWW-Authenticate", "Bearer");
    }

    @Test
    void a_session_idle_longer_than_the_setting_ends_on_the_server() throws InterruptedException {
        server.close();
        TeamSettings base = TeamAccess.testSettings();
        server = RunningServer.start(kind, new TeamSettings(base.setupCode(), java.time.Duration.ofMillis(300),
                base.slowAfter(), base.slowStep(), base.lockAfter(), base.lockFor()));
        addMember("ann", "viewer");
        Browser ann = browser("ann");
        as(ann).get("/api/session").then().statusCode(200);
        Thread.sleep(600);
        as(ann).get("/api/session").then().statusCode(401);
        server.given().get("/api/session").then().statusCode(200);
    }

    @Test
    void refuses_a_wrong_password_and_an_unknown_user_alike() {
        addMember("ann", "viewer");
        String wrong = signIn("ann", "not-the-password").then().statusCode(401).extract().path("detail");
        String unknown = signIn("nobody", "not-the-password").then().statusCode(401).extract().path("detail");
        assertEquals(wrong, unknown);
    }

    @Test
    void a_write_with_the_cookie_needs_the_csrf_token() {
        addMember("ed", "editor");
        Browser ed = browser("ed");
        server.anonymous().cookie("tw_session", ed.cookie()).contentType("text/csv").body(CSV)
                .post("/api/series?name=a").then().statusCode(403).body("type", containsString("csrf"));
        server.anonymous().cookie("tw_session", ed.cookie()).header("X-CSRF-Token", "guess").contentType("text/csv")
                .body(CSV).post("/api/series?name=a").then().statusCode(403);
        as(ed).contentType("text/csv").body(CSV).post("/api/series?name=a").then().statusCode(201);
    }

    @Test
    void locks_a_username_out_after_repeated_failures_even_with_the_right_password() {
        addMember("ann", "viewer");
        for (int i = 0; i < 5; i++) {
            signIn("ann", "wrong-password-" + i).then().statusCode(401);
        }
        signIn("ann", "ann-password").then().statusCode(429).body("detail", containsString("try again in"));
    }

    @Test
    void admins_manage_members_but_never_remove_or_demote_the_last_admin() {
        long ann = addMember("ann", "viewer");
        long admin = server.given().get("/api/members").then().extract().<Number>path("items[0].id").longValue();
        server.given().contentType(ContentType.JSON).body("{\"role\": \"editor\"}").patch("/api/members/" + admin)
                .then().statusCode(409).body("type", containsString("last-admin"));
        server.given().delete("/api/members/" + admin).then().statusCode(409);
        server.given().contentType(ContentType.JSON).body("{\"role\": \"editor\"}").patch("/api/members/" + ann)
                .then().statusCode(200).body("role", equalTo("editor"));
        server.given().contentType(ContentType.JSON).body("{\"username\": \"ann\", \"password\": \"long-enough-1\"}")
                .post("/api/members").then().statusCode(409);
        server.given().contentType(ContentType.JSON).body("{\"username\": \"bob\", \"password\": \"short\"}")
                .post("/api/members").then().statusCode(400).body("field", equalTo("password"));
        Browser annBrowser = browser("ann");
        as(annBrowser).get("/api/members").then().statusCode(403);
        server.given().delete("/api/members/" + ann).then().statusCode(204);
        as(annBrowser).get("/api/session").then().statusCode(401);
    }

    @Test
    void a_read_token_reads_but_cannot_write_and_a_revoked_token_stops_at_once() {
        addMember("ed", "editor");
        Browser ed = browser("ed");
        Response created = as(ed).contentType(ContentType.JSON).body("{\"name\": \"nightly\", \"scope\": \"read\"}")
                .post("/api/tokens");
        created.then().statusCode(201).body("scope", equalTo("read")).body("lastUsedAt", nullValue());
        String token = created.path("token");
        long id = created.<Number>path("id").longValue();
        server.anonymous().auth().oauth2(token).get("/api/series").then().statusCode(200);
        server.anonymous().auth().oauth2(token).contentType("text/csv").body(CSV).post("/api/series?name=a").then()
                .statusCode(403);
        as(ed).get("/api/tokens").then().statusCode(200).body("items[0].name", equalTo("nightly"))
                .body("items[0].token", nullValue()).body("items[0].lastUsedAt", notNullValue());
        as(ed).delete("/api/tokens/" + id).then().statusCode(204);
        server.anonymous().auth().oauth2(token).get("/api/series").then().statusCode(401);
    }

    @Test
    void stores_tokens_and_sessions_only_as_digests_and_passwords_only_as_argon2id() throws Exception {
        addMember("ann", "viewer");
        Browser ann = browser("ann");
        String token = as(ann).contentType(ContentType.JSON).body("{\"scope\": \"read\"}").post("/api/tokens").then()
                .statusCode(201).extract().path("token");
        String dump = dump("SELECT token_hash FROM api_token") + dump("SELECT id_hash FROM member_session")
                + dump("SELECT password_hash FROM member");
        assertFalse(dump.contains(token));
        assertFalse(dump.contains(ann.cookie()));
        assertFalse(dump.contains("ann-password"));
        assertTrue(dump.contains("$argon2id$"));
    }

    private String dump(String sql) throws Exception {
        StringBuilder all = new StringBuilder();
        try (Connection c = server.database().dataSource().getConnection(); Statement s = c.createStatement();
             ResultSet rs = s.executeQuery(sql)) {
            while (rs.next()) {
                all.append(rs.getString(1)).append('\n');
            }
        }
        return all.toString();
    }

    @Test
    void the_audit_log_records_who_did_what_and_only_admins_read_it() {
        server.given().contentType("text/csv").body(CSV.getBytes(StandardCharsets.UTF_8)).post("/api/series?name=a")
                .then().statusCode(201);
        addMember("ann", "viewer");
        server.given().get("/api/audit").then().statusCode(200)
                .body("items.action", hasItem("POST /api/series")).body("items.action", hasItem("POST /api/members"))
                .body("items.action", hasItem("POST /api/setup")).body("items.actor", not(hasItem("ann")))
                .body("items[0].at", notNullValue());
        as(browser("ann")).get("/api/audit").then().statusCode(403);
        server.given().get("/api/audit").then().body("items.action", hasItem("POST /api/session"))
                .body("items.actor", hasItem("ann"));
    }

    @Test
    void every_answer_carries_the_security_headers() {
        for (Response r : new Response[] {server.anonymous().get("/health"), server.anonymous().get("/api/series"),
                server.given().get("/no/such/page")}) {
            r.then().header("Content-Security-Policy", equalTo("default-src 'self'; script-src 'self'; style-src 'self';"
                            + " img-src 'self' data: blob:; frame-ancestors 'none'; base-uri 'none'; form-action 'self'"))
                    .header("X-Content-Type-Options", "nosniff").header("Referrer-Policy", "no-referrer");
        }
    }

    @Test
    void health_metrics_and_the_openapi_document_stay_open() {
        server.anonymous().get("/health").then().statusCode(200);
        server.anonymous().get("/metrics").then().statusCode(200);
        server.anonymous().get("/api/openapi.json").then().statusCode(200);
        server.anonymous().get("/api/series").then().statusCode(401).body("type", containsString("unauthenticated"));
        server.anonymous().auth().oauth2("twk_made-up").get("/api/series").then().statusCode(401);
        server.given().get("/api/series").then().statusCode(200).body("series", hasSize(0));
    }
}
