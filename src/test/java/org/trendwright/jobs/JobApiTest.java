package org.trendwright.jobs;

import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.time.Duration;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Batch jobs through the running server on both stores: every series of a multi-series upload is
 * judged exactly once, progress reaches 100%, and the results read the same as JSON and CSV. The
 * series are seeded simulations (linear trend plus Gaussian noise, and random walks), so each
 * verdict comes from the core's own comparison; here only completeness and shape are checked.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class JobApiTest {

    private final FreshStore.Kind kind;
    private RunningServer server;

    JobApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    /** A wide CSV of {@code count} quarterly series of {@code length} quarters, seeded. */
    static String upload(int count, int length, long seed) {
        Random random = new Random(seed);
        StringBuilder csv = new StringBuilder("period");
        for (int s = 0; s < count; s++) {
            csv.append(",s").append(s);
        }
        double[] walk = new double[count];
        for (int t = 0; t < length; t++) {
            csv.append('\n').append(2000 + t / 4).append("-Q").append(t % 4 + 1);
            for (int s = 0; s < count; s++) {
                walk[s] += random.nextGaussian();
                double value = s % 2 == 0 ? 50 + 0.5 * t + random.nextGaussian() : 50 + walk[s];
                csv.append(',').append(value);
            }
        }
        return csv.append('\n').toString();
    }

    static List<Long> create(RunningServer server, int count, int length) {
        return server.given().contentType("text/csv").body(upload(count, length, 7)).post("/api/series").then()
                .statusCode(201).extract().jsonPath().getList("series.id", Long.class);
    }

    static String jobBody(List<Long> ids) {
        return "{\"seriesIds\": " + ids + "}";
    }

    static JsonPath awaitFinished(RunningServer server, long job, Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            JsonPath progress = server.given().get("/api/jobs/" + job).then().statusCode(200).extract().jsonPath();
            if (progress.getBoolean("finished")) {
                return progress;
            }
            Thread.sleep(100);
        }
        throw new AssertionError("job " + job + " did not finish within " + timeout);
    }

    @Test
    void judges_every_series_of_an_upload_once_and_reports_progress_and_results() throws Exception {
        server = RunningServer.start(kind);
        List<Long> ids = create(server, 24, 40);
        long job = server.given().contentType("application/json").body(jobBody(ids)).post("/api/jobs").then()
                .statusCode(202).header("Location", startsWith("/api/jobs/")).body("total", equalTo(24))
                .extract().jsonPath().getLong("id");
        JsonPath progress = awaitFinished(server, job, Duration.ofSeconds(90));
        assertEquals(100.0, progress.getDouble("percent"));
        assertEquals(24, progress.getInt("seriesDone"));
        assertEquals(0.0, progress.getDouble("secondsLeft"));
        List<Map<String, Object>> results = server.given().get("/api/jobs/" + job + "/results").then().statusCode(200)
                .extract().jsonPath().getList("results");
        assertEquals(24, results.size());
        Set<Object> seen = new HashSet<>();
        for (Map<String, Object> row : results) {
            assertTrue(seen.add(row.get("seriesId")), "series judged twice: " + row);
            assertNotNull(row.get("recommendedModel"), row::toString);
            assertNotNull(row.get("nextForecast"), row::toString);
            assertNotNull(row.get("serialCorrelation"), row::toString);
        }
        String csv = server.given().queryParam("format", "csv").get("/api/jobs/" + job + "/results").then()
                .statusCode(200).contentType(startsWith("text/csv")).extract().asString();
        assertEquals(25, csv.split("\n").length, csv);
        assertTrue(csv.startsWith("seriesId,version,recommendedModel,serialCorrelation,unitRoot,trendBreak,"));
    }

    @Test
    void refuses_a_job_over_unknown_or_repeated_series_and_stores_nothing() {
        server = RunningServer.start(kind);
        List<Long> ids = create(server, 2, 12);
        server.given().contentType("application/json").body(jobBody(List.of(ids.get(0), 999_999L)))
                .post("/api/jobs").then().statusCode(404).body("detail", equalTo(
                        "There is no series 999999; list the series with GET /api/series."));
        server.given().contentType("application/json").body(jobBody(List.of(ids.get(0), ids.get(0))))
                .post("/api/jobs").then().statusCode(400).body("field", equalTo("seriesIds"));
        server.given().contentType("application/json").body("{\"seriesIds\": []}").post("/api/jobs").then()
                .statusCode(400);
        server.given().get("/api/jobs/1").then().statusCode(404).contentType(startsWith("application/problem+json"));
    }
}
