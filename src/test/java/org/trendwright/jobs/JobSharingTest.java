package org.trendwright.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import io.restassured.RestAssured;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.app.Settings;
import org.trendwright.app.TrendwrightApp;
import org.trendwright.store.Database;
import org.trendwright.store.JobRepository;
import org.trendwright.store.SeriesRepository;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.testing.TeamAccess;

/**
 * Correctness of batch jobs lives in the database: two instances on one PostgreSQL schema split a
 * job and judge every series exactly once; items a dead worker had claimed are taken again once
 * their lease runs out, and the job still ends with one result per series.
 */
class JobSharingTest {

    private static long scalar(Database database, String sql) throws SQLException {
        try (Connection c = database.dataSource().getConnection(); Statement s = c.createStatement();
             ResultSet rs = s.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    @Test
    void two_instances_on_one_postgresql_schema_judge_every_series_exactly_once() throws Exception {
        Settings settings = RunningServer.testSettings().withJobWorkers(2, Duration.ofSeconds(60));
        try (FreshStore store = FreshStore.create(FreshStore.Kind.POSTGRESQL);
             Database first = store.open(); Database second = store.open()) {
            try (TrendwrightApp one = TrendwrightApp.start(settings, TeamAccess.testSettings(), first, Clock.systemUTC());
                 TrendwrightApp two = TrendwrightApp.start(settings, TeamAccess.testSettings(), second,
                         Clock.systemUTC())) {
                // Both instances share the members and tokens in the one store.
                String token = "Bearer " + TeamAccess.bootstrap(one.port());
                List<Long> ids = RestAssured.given().port(one.port()).header("Authorization", token).contentType("text/csv")
                        .body(JobApiTest.upload(120, 32, 11)).post("/api/series").then().statusCode(201).extract()
                        .jsonPath().getList("series.id", Long.class);
                long job = RestAssured.given().port(two.port()).header("Authorization", token)
                        .contentType("application/json")
                        .body(JobApiTest.jobBody(ids)).post("/api/jobs").then().statusCode(202).extract().jsonPath()
                        .getLong("id");
                awaitDone(new JobRepository(first, Clock.systemUTC()), job, 120);
            }
            assertEquals(120, scalar(first, "SELECT COUNT(*) FROM fit_job_item WHERE status IN ('done', 'failed')"));
            assertEquals(120, scalar(first, "SELECT COUNT(DISTINCT series_id) FROM fit_job_item"));
            // Each item was claimed once: no series was fitted twice.
            assertEquals(120, scalar(first, "SELECT SUM(attempts) FROM fit_job_item"));
        }
    }

    @ParameterizedTest
    @EnumSource(FreshStore.Kind.class)
    void items_of_a_dead_worker_are_claimed_again_after_their_lease(FreshStore.Kind kind) throws Exception {
        Settings settings = RunningServer.testSettings().withJobWorkers(0, Duration.ofSeconds(60));
        try (RunningServer server = RunningServer.start(kind, settings)) {
            List<Long> ids = JobApiTest.create(server, 40, 24);
            long job = server.given().contentType("application/json").body(JobApiTest.jobBody(ids)).post("/api/jobs")
                    .then().statusCode(202).extract().jsonPath().getLong("id");
            JobRepository jobs = new JobRepository(server.database(), Clock.systemUTC());
            // A worker claims 10 items with a short lease and dies without storing anything.
            assertEquals(10, jobs.claim("dead-worker", 10, Duration.ofMillis(300)).size());
            try (JobWorker restarted = new JobWorker(jobs, new SeriesRepository(server.database(), Clock.systemUTC()),
                    2, Duration.ofSeconds(60), CompletableFuture.completedFuture(null))) {
                awaitDone(jobs, job, 40);
            }
            assertEquals(40, jobs.results(job).size());
            assertEquals(40, jobs.results(job).stream().map(SeriesVerdict::seriesId).distinct().count());
            assertEquals(50, jobs.attempts(job), "the 10 abandoned items are claimed a second time, no item a third");
        }
    }

    private static void awaitDone(JobRepository jobs, long job, int total) throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(120).toNanos();
        while (System.nanoTime() < deadline) {
            if (jobs.progress(job).orElseThrow().done() == total) {
                return;
            }
            Thread.sleep(100);
        }
        throw new AssertionError("job " + job + " did not finish: " + jobs.progress(job));
    }
}
