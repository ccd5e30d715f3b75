package org.trendwright.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Saturates a server whose fitting capacity is one running and one queued fit with parallel fits:
 * the overflow is refused with 503, Retry-After and a problem body, everything else succeeds, no
 * other status appears, and the server answers normally afterwards. Whether a given request is
 * refused depends on timing; that at least one is follows from 24 simultaneous clients against a
 * capacity of two, each fit taking tens of milliseconds (a 2,000-point autoregression with order
 * selection up to 12).
 */
class BackpressureTest {

    private static final int CLIENTS = 24;

    private RunningServer server;

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    private static String heavyFit() {
        Random random = new Random(20_261_202L);
        StringBuilder observations = new StringBuilder();
        double level = 100;
        for (int i = 0; i < 2000; i++) {
            level += random.nextGaussian();
            observations.append(i == 0 ? "" : ", ").append("{\"period\": \"").append(LocalDate.of(2000, 1, 1).plusDays(i))
                    .append("\", \"value\": ").append(level).append('}');
        }
        return "{\"series\": {\"observations\": [" + observations + "]}, \"model\": {\"family\": \"autoregression\","
                + " \"order\": 12, \"selection\": \"aic\"}, \"horizon\": 50}";
    }

    @Test
    void refuses_fits_beyond_capacity_with_503_and_retry_after_and_stays_healthy() throws Exception {
        server = RunningServer.start(FreshStore.Kind.SQLITE, RunningServer.testSettings().withFitCapacity(1, 1));
        String body = heavyFit();
        server.given().contentType("application/json").body(body).post("/api/fit").then().statusCode(200);
        Map<Integer, Integer> statuses = new TreeMap<>();
        ExecutorService clients = Executors.newFixedThreadPool(CLIENTS);
        try {
            List<Callable<Response>> calls = new ArrayList<>();
            for (int i = 0; i < CLIENTS; i++) {
                calls.add(() -> server.given().contentType("application/json").body(body).post("/api/fit"));
            }
            for (Future<Response> future : clients.invokeAll(calls)) {
                Response response = future.get();
                statuses.merge(response.statusCode(), 1, Integer::sum);
                if (response.statusCode() == 503) {
                    assertEquals("1", response.header("Retry-After"));
                    assertTrue(response.contentType().startsWith("application/problem+json"));
                    assertTrue(response.jsonPath().getString("detail").contains("retry"));
                }
            }
        } finally {
            clients.shutdownNow();
        }
        assertTrue(statuses.keySet().stream().allMatch(s -> s == 200 || s == 503), statuses::toString);
        assertTrue(statuses.getOrDefault(503, 0) > 0, () -> "nothing was refused: " + statuses);
        assertTrue(statuses.getOrDefault(200, 0) > 0, () -> "nothing was served: " + statuses);
        server.given().get("/health").then().statusCode(200);
        server.given().contentType("application/json").body(body).post("/api/fit").then().statusCode(200);
    }
}
