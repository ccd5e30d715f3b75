package org.trendwright.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.restassured.http.ContentType;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Function;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Every registered route called by every kind of caller: admin, editor and viewer (signed in in a
 * browser, with the CSRF token), a read-only API token, nobody, and someone holding only a brief
 * link (sent as if it were a token). The expected answers are written out here, independent of the
 * server's own rule table, and the table must name exactly the routes the server registers, so a
 * new route cannot be left out. Allowed: any answer but 401/403; refused: exactly 401 or 403.
 * The rules do not depend on the store, so this runs on SQLite.
 */
class AuthorizationMatrixTest {

    /** Who may call a route. */
    private enum Rule { OPEN, MEMBER, OWN_WRITE, EDITOR, ADMIN_READ, ADMIN_WRITE }

    private enum Caller { ADMIN, EDITOR, VIEWER, READ_TOKEN, ANONYMOUS, BRIEF_LINK }

    private static final Map<String, Rule> EXPECTED = new TreeMap<>(Map.ofEntries(
            Map.entry("GET /health", Rule.OPEN), Map.entry("GET /metrics", Rule.OPEN),
            Map.entry("GET /api/openapi.json", Rule.OPEN), Map.entry("POST /api/setup", Rule.OPEN),
            Map.entry("POST /api/session", Rule.OPEN), Map.entry("GET /api/public/briefs/{token}", Rule.OPEN),
            Map.entry("GET /api/session", Rule.MEMBER), Map.entry("DELETE /api/session", Rule.OWN_WRITE),
            Map.entry("GET /api/series", Rule.MEMBER), Map.entry("GET /api/series/{id}", Rule.MEMBER),
            Map.entry("GET /api/series/{id}/versions", Rule.MEMBER),
            Map.entry("GET /api/series/{id}/versions/{version}", Rule.MEMBER),
            Map.entry("POST /api/series", Rule.EDITOR), Map.entry("DELETE /api/series/{id}", Rule.EDITOR),
            Map.entry("POST /api/series/{id}/versions", Rule.EDITOR),
            Map.entry("POST /api/series/{id}/versions/{version}/fit", Rule.EDITOR),
            Map.entry("POST /api/fit", Rule.EDITOR), Map.entry("POST /api/series/{id}/briefs", Rule.EDITOR),
            Map.entry("GET /api/briefs", Rule.MEMBER), Map.entry("GET /api/briefs/misses", Rule.MEMBER),
            Map.entry("DELETE /api/briefs/{id}", Rule.EDITOR),
            Map.entry("GET /api/tokens", Rule.MEMBER), Map.entry("POST /api/tokens", Rule.OWN_WRITE),
            Map.entry("DELETE /api/tokens/{id}", Rule.OWN_WRITE),
            Map.entry("GET /api/members", Rule.ADMIN_READ), Map.entry("POST /api/members", Rule.ADMIN_WRITE),
            Map.entry("PATCH /api/members/{id}", Rule.ADMIN_WRITE),
            Map.entry("DELETE /api/members/{id}", Rule.ADMIN_WRITE), Map.entry("GET /api/audit", Rule.ADMIN_READ),
            Map.entry("POST /api/jobs", Rule.EDITOR), Map.entry("GET /api/jobs/{id}", Rule.MEMBER),
            Map.entry("GET /api/jobs/{id}/results", Rule.MEMBER),
            // The page: the upload dry run, the model comparison (computes, stores nothing), its HTML entry points.
            Map.entry("POST /api/series/preview", Rule.EDITOR), Map.entry("GET /api/upload-progress/{key}", Rule.EDITOR),
            Map.entry("POST /api/series/{id}/versions/{version}/comparison", Rule.MEMBER),
            Map.entry("GET /setup", Rule.OPEN), Map.entry("GET /b/{token}", Rule.OPEN)));

    private RunningServer server;
    private final Map<Caller, Function<RequestSpecification, RequestSpecification>> callers = new TreeMap<>();
    private String briefToken;
    private long seriesId;

    @BeforeEach
    void start() {
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        seriesId = server.given().contentType("text/csv").body("period,value\n2024-Q1,1\n2024-Q2,2\n2024-Q3,4\n2024-Q4,5\n"
                .getBytes(StandardCharsets.UTF_8)).post("/api/series?name=a").then().statusCode(201).extract()
                .<Number>path("series[0].id").longValue();
        briefToken = server.given().contentType(ContentType.JSON).body("{\"version\": 1, \"model\": {\"family\":"
                + " \"trend\"}, \"horizon\": 2}").post("/api/series/" + seriesId + "/briefs").then().statusCode(201)
                .extract().path("token");
        callers.put(Caller.ADMIN, browser("admin", "admin-password-1"));
        callers.put(Caller.EDITOR, browser(member("eddie", "editor"), "eddie-password"));
        callers.put(Caller.VIEWER, browser(member("vera", "viewer"), "vera-password"));
        String[] eddie = session("eddie", "eddie-password");
        String readToken = server.anonymous().cookie("tw_session", eddie[0]).header("X-CSRF-Token", eddie[1])
                .contentType(ContentType.JSON)
                .body("{\"scope\": \"read\"}").post("/api/tokens").then().statusCode(201).extract().path("token");
        callers.put(Caller.READ_TOKEN, r -> r.header("Authorization", "Bearer " + readToken));
        callers.put(Caller.ANONYMOUS, r -> r);
        callers.put(Caller.BRIEF_LINK, r -> r.header("Authorization", "Bearer " + briefToken));
    }

    @AfterEach
    void stop() {
        server.close();
    }

    private String member(String username, String role) {
        server.given().contentType(ContentType.JSON).body("{\"username\": \"" + username + "\", \"password\": \""
                + username + "-password\", \"role\": \"" + role + "\"}").post("/api/members").then().statusCode(201);
        return username;
    }

    private String[] session(String username, String password) {
        Response r = server.anonymous().contentType(ContentType.JSON).body("{\"username\": \"" + username
                + "\", \"password\": \"" + password + "\"}").post("/api/session");
        assertEquals(200, r.statusCode(), r.asString());
        return new String[] {r.getCookie("tw_session"), r.path("csrfToken")};
    }

    private Function<RequestSpecification, RequestSpecification> browser(String username, String password) {
        String[] s = session(username, password);
        return r -> r.cookie("tw_session", s[0]).header("X-CSRF-Token", s[1]);
    }

    private static boolean allowed(Rule rule, Caller caller) {
        return switch (rule) {
            case OPEN -> true;
            case MEMBER -> caller.ordinal() <= Caller.READ_TOKEN.ordinal();
            case OWN_WRITE -> caller.ordinal() <= Caller.VIEWER.ordinal();
            case EDITOR -> caller == Caller.ADMIN || caller == Caller.EDITOR;
            case ADMIN_READ, ADMIN_WRITE -> caller == Caller.ADMIN;
        };
    }

    /** The route with its parameters filled: existing series and brief, absent ids for deletions. */
    private String path(String template) {
        boolean deletion = template.startsWith("DELETE");
        return template.substring(template.indexOf(' ') + 1).replace("{token}", briefToken)
                .replace("{key}", "no-such-upload-key-0001").replace("{version}", "1").replace("{id}", template.contains("/api/series/") && !deletion
                        ? Long.toString(seriesId) : "999999");
    }

    @Test
    void every_route_answers_every_caller_as_the_access_table_says() {
        assertEquals(new TreeSet<>(EXPECTED.keySet()), new TreeSet<>(server.app().routes()),
                "the expected table must name exactly the registered routes");
        List<String> wrong = new ArrayList<>();
        // Sign-out last: it ends the browsers' sessions.
        List<String> routes = EXPECTED.keySet().stream()
                .sorted(Comparator.comparing((String r) -> r.equals("DELETE /api/session")).thenComparing(r -> r))
                .toList();
        for (String route : routes) {
            for (Caller caller : Caller.values()) {
                int status = call(route, caller);
                boolean ok = allowed(EXPECTED.get(route), caller);
                int refusal = caller == Caller.ANONYMOUS || caller == Caller.BRIEF_LINK ? 401 : 403;
                if (ok ? status == 401 || status == 403 : status != refusal) {
                    wrong.add(route + " as " + caller + ": " + status + (ok ? " (should be allowed)" : " (should be "
                            + refusal + ")"));
                }
            }
        }
        assertEquals(List.of(), wrong);
    }

    private int call(String route, Caller caller) {
        String method = route.substring(0, route.indexOf(' '));
        RequestSpecification request = callers.get(caller).apply(server.anonymous());
        if (route.equals("POST /api/session")) {
            request = request.contentType(ContentType.JSON).body("{\"username\": \"vera\", \"password\":"
                    + " \"vera-password\"}");
        } else if (!method.equals("GET") && !method.equals("DELETE")) {
            request = request.contentType(ContentType.JSON).body("{}");
        }
        return request.request(method, path(route)).statusCode();
    }
}
