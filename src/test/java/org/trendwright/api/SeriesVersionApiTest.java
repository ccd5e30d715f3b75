package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.emptyString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.nullValue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.app.Settings;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Versions, ETags and If-Match, limits, restarts and the generic 500, through the running server
 * on SQLite and on PostgreSQL.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class SeriesVersionApiTest {

    private static final String V1 = "{\"name\": \"Kettles\", \"observations\": [{\"period\": \"2024-Q1\", \"value\": 10},"
            + " {\"period\": \"2024-Q2\", \"value\": 11}, {\"period\": \"2024-Q3\", \"value\": 12}]}";

    private final FreshStore.Kind kind;
    private RunningServer server;

    SeriesVersionApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    private String createKettles() {
        return server.given().contentType("application/json").body(V1).post("/api/series").then().statusCode(201)
                .header("ETag", matchesPattern("\"s\\d+-v1\"")).extract().path("series[0].id").toString();
    }

    @Test
    void appending_and_revising_creates_a_new_version_and_keeps_the_old_one_readable() {
        server = RunningServer.start(kind);
        String id = createKettles();
        String revision = "period,value\n2024-Q2,11.5\n2024-Q4,13\n";
        server.given().header("If-Match", "\"s" + id + "-v1\"").contentType("text/csv")
                .body(revision.getBytes(StandardCharsets.UTF_8)).post("/api/series/" + id + "/versions").then()
                .statusCode(201).header("ETag", equalTo("\"s" + id + "-v2\""))
                .header("Location", equalTo("/api/series/" + id + "/versions/2"))
                .body("version", equalTo(2)).body("lastPeriod", equalTo("2024-Q4"))
                .body("observations.value", equalTo(List.of(10.0, 11.5, 12.0, 13.0)));
        server.given().get("/api/series/" + id + "/versions/1").then().statusCode(200)
                .body("observations.value", equalTo(List.of(10.0, 11.0, 12.0)));
        server.given().get("/api/series/" + id + "/versions").then().statusCode(200)
                .body("currentVersion", equalTo(2)).body("versions.observations", equalTo(List.of(3, 4)));
        server.given().get("/api/series/" + id).then().header("ETag", equalTo("\"s" + id + "-v2\""))
                .body("versionCreatedAt", matchesPattern("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}(\\.\\d+)?Z"));
    }

    @Test
    void an_update_without_if_match_is_refused_with_428_and_a_stale_one_with_412() {
        server = RunningServer.start(kind);
        String id = createKettles();
        String body = "{\"observations\": [{\"period\": \"2024-Q4\", \"value\": 13}]}";
        server.given().contentType("application/json").body(body).post("/api/series/" + id + "/versions").then()
                .statusCode(428).body("type", equalTo("urn:trendwright:problem:precondition-required"))
                .body("detail", containsString("\"s" + id + "-v1\""));
        server.given().header("If-Match", "*").contentType("application/json").body(body)
                .post("/api/series/" + id + "/versions").then().statusCode(201).body("version", equalTo(2));
        server.given().header("If-Match", "\"s" + id + "-v1\"").contentType("application/json").body(body)
                .post("/api/series/" + id + "/versions").then().statusCode(412)
                .body("type", equalTo("urn:trendwright:problem:stale-version"))
                .body("detail", containsString("is at version 2, not 1"));
        server.given().get("/api/series/" + id + "/versions").then().body("versions", hasSize(2));
    }

    @Test
    void a_refused_revision_writes_no_version() {
        server = RunningServer.start(kind);
        String id = createKettles();
        server.given().header("If-Match", "\"s" + id + "-v1\"").contentType("application/json")
                .body("{\"observations\": [{\"period\": \"2024-05\", \"value\": 1}]}")
                .post("/api/series/" + id + "/versions").then().statusCode(422)
                .body("detail", containsString("the series is quarterly but the upload gives monthly"));
        server.given().header("If-Match", "\"s" + id + "-v1\"").contentType("application/json")
                .body("{\"observations\": [{\"period\": \"2025-Q2\", \"value\": 1}]}")
                .post("/api/series/" + id + "/versions").then().statusCode(422)
                .body("detail", containsString("period 2024-Q4 is missing"));
        server.given().get("/api/series/" + id).then().body("version", equalTo(1));
    }

    @Test
    void answers_304_when_the_client_already_has_the_version() {
        server = RunningServer.start(kind);
        String id = createKettles();
        server.given().header("If-None-Match", "\"s" + id + "-v1\"").get("/api/series/" + id).then()
                .statusCode(304).body(emptyString());
    }

    @Test
    void deletes_a_series_only_with_its_current_etag() {
        server = RunningServer.start(kind);
        String id = createKettles();
        server.given().delete("/api/series/" + id).then().statusCode(428);
        server.given().header("If-Match", "\"s" + id + "-v7\"").delete("/api/series/" + id).then().statusCode(412);
        server.given().header("If-Match", "W/\"something-else\"").delete("/api/series/" + id).then().statusCode(412)
                .body("detail", containsString("If-Match names no version of series " + id));
        server.given().header("If-Match", "\"s" + id + "-v1\"").delete("/api/series/" + id).then().statusCode(204);
        server.given().get("/api/series/" + id).then().statusCode(404);
    }

    @Test
    void a_restart_keeps_every_series_and_version() {
        server = RunningServer.start(kind);
        String id = createKettles();
        server.given().header("If-Match", "*").contentType("application/json")
                .body("{\"observations\": [{\"period\": \"2024-Q4\", \"value\": 13.25}]}")
                .post("/api/series/" + id + "/versions").then().statusCode(201);
        server.given().contentType("text/csv").body("series,period,value\nA,2024,1\nB,2024,2\n".getBytes(StandardCharsets.UTF_8))
                .post("/api/series").then().statusCode(201);
        String before = server.given().get("/api/series").then().extract().asString();
        server.restart();
        server.given().get("/api/series").then().statusCode(200).body("series", hasSize(3))
                .body(equalTo(before));
        server.given().get("/api/series/" + id + "/versions/2").then().body("observations[3].value", equalTo(13.25));
    }

    @Test
    void enforces_the_configured_limits() {
        server = RunningServer.start(kind, new Settings("127.0.0.1", 0, Path.of("unused"), null, null, 4, 400, 5,
                2, false, Duration.ZERO));
        String many = "series,period,value\nA,2024,1\nB,2024,1\nC,2024,1\n";
        server.given().contentType("text/csv").body(many.getBytes(StandardCharsets.UTF_8)).post("/api/series").then()
                .statusCode(422).body("type", equalTo("urn:trendwright:problem:limit-exceeded"))
                .body("detail", containsString("the limit per upload is 2"));
        String longSeries = "period,value\n2020,1\n2021,1\n2022,1\n2023,1\n2024,1\n2025,1\n";
        server.given().contentType("text/csv").body(longSeries.getBytes(StandardCharsets.UTF_8)).post("/api/series")
                .then().statusCode(422).body("detail", containsString("would hold 6 observations; the limit is 5"));
        String big = "period,value\n" + "2024,1\n".repeat(100);
        server.given().contentType("text/csv").body(big.getBytes(StandardCharsets.UTF_8)).post("/api/series").then()
                .statusCode(413).contentType("application/problem+json");
        server.given().get("/api/series").then().body("series", hasSize(0));
    }

    @Test
    void answers_an_unexpected_failure_with_a_generic_500_carrying_an_error_id() {
        server = RunningServer.start(kind);
        server.database().close();
        server.given().get("/api/series").then().statusCode(500)
                .contentType("application/problem+json")
                .body("type", equalTo("urn:trendwright:problem:internal-error"))
                .body("errorId", matchesPattern("[0-9a-f-]{36}"))
                .body("detail", not(containsString("Exception")))
                .body("detail", not(containsString("at org.")))
                .body("line", nullValue());
        server.given().get("/health").then().statusCode(503).body("status", equalTo("down"));
    }
}
