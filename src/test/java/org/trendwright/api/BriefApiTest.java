package org.trendwright.api;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.http.ContentType;
import io.restassured.path.json.JsonPath;
import io.restassured.path.json.config.JsonPathConfig;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/** Publishing, reading, superseding, revoking and tracking forecast briefs, on both stores. */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class BriefApiTest {

    /** Twelve quarters with trend and a fourth-quarter peak (invented). */
    private static final String QUARTERS = "quarter,Kettles\n2022-Q1,50.1\n2022-Q2,51.9\n2022-Q3,52.4\n2022-Q4,60.8\n"
            + "2023-Q1,53.0\n2023-Q2,54.6\n2023-Q3,55.9\n2023-Q4,64.1\n2024-Q1,56.2\n2024-Q2,57.0\n2024-Q3,59.3\n"
            + "2024-Q4,67.5\n";
    private static final String BRIEF = "{\"version\": %d, \"model\": {\"family\": \"trend\", \"seasonal\": true},"
            + " \"horizon\": 4, \"note\": \"Plan on the upper band for Q4.\"}";

    private final FreshStore.Kind kind;
    private RunningServer server;
    private String seriesId;

    BriefApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @BeforeEach
    void start() {
        server = RunningServer.start(kind);
        seriesId = server.given().contentType("text/csv").body(QUARTERS.getBytes(StandardCharsets.UTF_8))
                .post("/api/series").then().statusCode(201).extract().path("series[0].id").toString();
    }

    @AfterEach
    void stop() {
        if (server != null) { // null when the PostgreSQL variant was skipped
            server.close();
        }
    }

    private JsonPath publish(int version) {
        return json(server.given().contentType(ContentType.JSON).body(BRIEF.formatted(version))
                .post("/api/series/" + seriesId + "/briefs").then().statusCode(201).extract().asString());
    }

    private String read(String token) {
        return server.anonymous().get("/api/public/briefs/" + token).then().statusCode(200)
                .header("Referrer-Policy", "no-referrer").extract().asString();
    }

    private void addVersion(int current, String csv) {
        server.given().header("If-Match", "\"s" + seriesId + "-v" + current + "\"").contentType("text/csv")
                .body(csv.getBytes(StandardCharsets.UTF_8)).post("/api/series/" + seriesId + "/versions").then()
                .statusCode(201);
    }

    /** A JSON document whose numbers read as doubles (the default, float, would round the forecasts). */
    private static JsonPath json(String text) {
        return JsonPath.from(text).using(new JsonPathConfig(JsonPathConfig.NumberReturnType.DOUBLE));
    }

    /** The frozen part of a public brief: everything before the fields computed at read time. */
    private static String frozen(String body) {
        return body.substring(0, body.indexOf(",\"newerBriefExists\":"));
    }

    @Test
    void publishes_a_frozen_snapshot_readable_without_sign_in_at_an_unguessable_link() {
        JsonPath created = publish(1);
        String token = created.getString("token");
        // 256 random bits in URL-safe base64 without padding: 43 characters (common practice: >= 128 bits).
        assertTrue(token.matches("[A-Za-z0-9_-]{43}"), token);
        assertEquals("/b/" + token, created.getString("url"));
        assertEquals("admin", created.getString("author"));
        JsonPath brief = json(read(token));
        assertEquals("Kettles", brief.getString("series.name"));
        assertEquals(1, brief.getInt("series.version"));
        assertEquals(12, brief.getList("series.observations").size());
        assertEquals(List.of("2025-Q1", "2025-Q2", "2025-Q3", "2025-Q4"), brief.getList("chart.forecastPeriods"));
        assertEquals(List.of(0.8, 0.95), brief.getList("model.levels"));
        assertEquals("Plan on the upper band for Q4.", brief.getString("note"));
        assertEquals("admin", brief.getString("author"));
        assertEquals(brief.getString("results.description"), server.given().contentType(ContentType.JSON)
                .body("{\"model\": {\"family\": \"trend\", \"seasonal\": true}, \"horizon\": 4}")
                .post("/api/series/" + seriesId + "/versions/1/fit").then().extract().path("description"));
        assertEquals(0, brief.getList("tracking.periods").size());
        server.anonymous().get("/api/public/briefs/" + token.substring(1) + "A").then().statusCode(404);
    }

    @Test
    void stays_byte_identical_after_the_series_gets_a_new_version_and_tracks_the_new_actuals() {
        String token = publish(1).getString("token");
        String before = read(token);
        JsonPath brief = json(before);
        double f1 = brief.getDouble("chart.forecast[0]");
        double f2 = brief.getDouble("chart.forecast[1]");
        addVersion(1, "period,value\n2025-Q1," + f1 + "\n2025-Q2," + (f2 + 1000) + "\n");
        String after = read(token);
        assertEquals(frozen(before), frozen(after));
        JsonPath tracking = json(after).setRootPath("tracking");
        assertEquals(2, tracking.getInt("latestVersion"));
        assertEquals(List.of("2025-Q1", "2025-Q2"), tracking.getList("periods.period"));
        assertEquals(List.of(true, false), tracking.getList("periods.inside95"));
        assertEquals(List.of(true, false), tracking.getList("periods.inside80"));
        // Hyndman & Koehler (2006): MAE = mean |e|, MAPE = 100 mean |e / y|. The first error is 0, the
        // second 1000; 1e-9 allows for the rounding of values near 60 printed and read back.
        assertEquals(500, tracking.getDouble("mae"), 1e-9);
        assertEquals(100 * (1000 / (f2 + 1000)) / 2, tracking.getDouble("mape"), 1e-9);
        assertEquals(1, tracking.getInt("outside95"));
        server.given().get("/api/briefs/misses").then().statusCode(200).body("items", hasSize(1))
                .body("items[0].brief.token", equalTo(token)).body("items[0].tracking.outside95", equalTo(1));
    }

    @Test
    void publishing_again_supersedes_and_links_the_newer_brief_only_while_it_is_shared() {
        String first = publish(1).getString("token");
        addVersion(1, "period,value\n2025-Q1,61\n");
        JsonPath second = publish(2);
        JsonPath old = json(read(first));
        assertTrue(old.getBoolean("newerBriefExists"));
        assertEquals(second.getString("url"), old.getString("supersededBy"));
        server.given().delete("/api/briefs/" + second.getInt("id")).then().statusCode(204);
        old = json(read(first));
        assertTrue(old.getBoolean("newerBriefExists"));
        assertEquals(null, old.getString("supersededBy"));
        server.anonymous().get("/api/public/briefs/" + second.getString("token")).then().statusCode(404);
    }

    @Test
    void revoking_a_brief_closes_its_link_on_the_next_request_and_the_list_shows_it() {
        JsonPath created = publish(1);
        read(created.getString("token"));
        server.given().delete("/api/briefs/" + created.getInt("id")).then().statusCode(204);
        server.anonymous().get("/api/public/briefs/" + created.getString("token")).then().statusCode(404);
        server.given().get("/api/briefs").then().statusCode(200).body("items", hasSize(1))
                .body("items[0].shared", equalTo(false));
        server.given().delete("/api/briefs/999").then().statusCode(404);
    }

    @Test
    void refuses_an_expiry_in_the_past_and_a_missing_version_and_honours_a_future_expiry() {
        String body = "{\"version\": 1, \"model\": {\"family\": \"trend\"}, \"expiresAt\": \"%s\"}";
        server.given().contentType(ContentType.JSON).body(body.formatted("2000-01-01T00:00:00Z"))
                .post("/api/series/" + seriesId + "/briefs").then().statusCode(400).body("field", equalTo("expiresAt"));
        server.given().contentType(ContentType.JSON).body("{\"model\": {\"family\": \"trend\"}}")
                .post("/api/series/" + seriesId + "/briefs").then().statusCode(400).body("field", equalTo("version"));
        String token = server.given().contentType(ContentType.JSON).body(body.formatted("2999-01-01T00:00:00Z"))
                .post("/api/series/" + seriesId + "/briefs").then().statusCode(201).body("expiresAt",
                        equalTo("2999-01-01T00:00:00Z")).extract().path("token");
        assertEquals("2999-01-01T00:00:00Z", json(read(token)).getString("expiresAt"));
    }

    @Test
    void a_brief_outlives_its_series_with_empty_tracking() {
        String token = publish(1).getString("token");
        String before = read(token);
        server.given().header("If-Match", "*").delete("/api/series/" + seriesId).then().statusCode(204);
        String after = read(token);
        assertEquals(frozen(before), frozen(after));
        assertEquals(null, json(after).getString("tracking.latestVersion"));
        server.given().get("/api/briefs/misses").then().body("items", hasSize(0));
        String lower = after.toLowerCase(Locale.ROOT);
        assertTrue(!lower.contains("password") && !lower.contains("\"token\"") && !lower.contains("\"id\""),
                "reveals nothing else: " + after);
    }

    @Test
    void only_editors_publish_and_a_viewer_reads_the_list() {
        server.given().contentType(ContentType.JSON).body("{\"username\": \"vic\", \"password\": \"vic-password\","
                + " \"role\": \"viewer\"}").post("/api/members").then().statusCode(201);
        String cookie = server.anonymous().contentType(ContentType.JSON)
                .body("{\"username\": \"vic\", \"password\": \"vic-password\"}").post("/api/session").then()
                .statusCode(200).extract().cookie("tw_session");
        String csrf = server.anonymous().cookie("tw_session", cookie).get("/api/session").path("csrfToken");
        server.anonymous().cookie("tw_session", cookie).header("X-CSRF-Token", csrf).contentType(ContentType.JSON)
                .body(BRIEF.formatted(1)).post("/api/series/" + seriesId + "/briefs").then().statusCode(403);
        server.anonymous().cookie("tw_session", cookie).get("/api/briefs").then().statusCode(200)
                .body("items", hasSize(0)).body("items[0]", nullValue());
    }
}
