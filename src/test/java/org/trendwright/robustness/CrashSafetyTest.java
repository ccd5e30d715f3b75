package org.trendwright.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.RestAssured;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.io.IOException;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.TeamAccess;

/**
 * Kills the real server process with SIGKILL (Process.destroyForcibly on Linux) while 8 clients
 * send up to 2,000 uploads, restarts it on the same store, and checks that every upload answered
 * 201 is there and intact, and that every series present is complete: an upload is one
 * transaction, so none may be half-stored. Runs on SQLite and on PostgreSQL.
 */
class CrashSafetyTest {

    private static final int UPLOADS = 2000;
    private static final int CLIENTS = 8;
    private static final int KILL_AFTER_ACKS = 250;
    private static final int POINTS = 12;

    /** The values of upload {@code n}: distinct per upload, so a mixed-up row would show. */
    private static double value(int n, int t) {
        return n * 1000.0 + t + 0.25;
    }

    private static String upload(int n) {
        StringBuilder csv = new StringBuilder("period,u" + n + "\n");
        for (int t = 0; t < POINTS; t++) {
            csv.append(2000 + t / 4).append("-Q").append(t % 4 + 1).append(',').append(value(n, t)).append('\n');
        }
        return csv.toString();
    }

    @ParameterizedTest
    @EnumSource(FreshStore.Kind.class)
    void every_acknowledged_upload_survives_a_sigkill_and_none_is_half_stored(FreshStore.Kind kind) throws Exception {
        try (FreshStore store = FreshStore.create(kind)) {
            Path folder = Files.createTempDirectory("trendwright-crash-");
            int port = freePort();
            Process server = start(store, folder, port, 1);
            String token = "Bearer " + TeamAccess.bootstrap(port);
            Map<Integer, Long> acknowledged = sendUntilKilled(port, server, token);
            server = start(store, folder, port, 2);
            try {
                checkStore(port, acknowledged, token);
            } finally {
                server.destroyForcibly().waitFor(10, TimeUnit.SECONDS);
            }
        }
    }

    private static Map<Integer, Long> sendUntilKilled(int port, Process server, String token) throws Exception {
        Map<Integer, Long> acknowledged = new ConcurrentHashMap<>();
        AtomicInteger next = new AtomicInteger();
        ExecutorService clients = Executors.newFixedThreadPool(CLIENTS);
        List<Future<?>> running = new ArrayList<>();
        for (int c = 0; c < CLIENTS; c++) {
            running.add(clients.submit(() -> {
                for (int n = next.getAndIncrement(); n < UPLOADS; n = next.getAndIncrement()) {
                    try {
                        Response r = RestAssured.given().port(port).header("Authorization", token)
                                .contentType("text/csv").body(upload(n))
                                .post("/api/series");
                        if (r.statusCode() == 201) {
                            acknowledged.put(n, r.jsonPath().getLong("series[0].id"));
                        }
                    } catch (Exception connectionLost) {
                        // The server was killed; this client's work is over.
                        return;
                    }
                    if (acknowledged.size() >= KILL_AFTER_ACKS && server.isAlive()) {
                        server.destroyForcibly();
                    }
                }
            }));
        }
        for (Future<?> f : running) {
            f.get(3, TimeUnit.MINUTES);
        }
        clients.shutdown();
        assertTrue(server.waitFor(30, TimeUnit.SECONDS), "the server did not die");
        assertTrue(acknowledged.size() >= KILL_AFTER_ACKS && acknowledged.size() < UPLOADS,
                () -> "the kill did not fall part-way: " + acknowledged.size() + " acknowledged");
        return acknowledged;
    }

    private static void checkStore(int port, Map<Integer, Long> acknowledged, String token) {
        List<Map<String, Object>> listed = RestAssured.given().port(port).header("Authorization", token)
                .get("/api/series").then().statusCode(200)
                .extract().jsonPath().getList("series");
        Map<String, Long> byName = new ConcurrentHashMap<>();
        for (Map<String, Object> s : listed) {
            byName.put((String) s.get("name"), ((Number) s.get("id")).longValue());
        }
        for (Map.Entry<Integer, Long> ack : acknowledged.entrySet()) {
            assertEquals(ack.getValue(), byName.get("u" + ack.getKey()), "acknowledged upload u" + ack.getKey());
        }
        assertTrue(listed.size() >= acknowledged.size());
        for (Map.Entry<String, Long> stored : byName.entrySet()) {
            int n = Integer.parseInt(stored.getKey().substring(1));
            JsonPath detail = RestAssured.given().port(port).header("Authorization", token)
                    .get("/api/series/" + stored.getValue()).then()
                    .statusCode(200).extract().jsonPath();
            List<Float> values = detail.getList("observations.value", Float.class);
            assertEquals(POINTS, values.size(), "series " + stored.getKey() + " is incomplete");
            for (int t = 0; t < POINTS; t++) {
                // Values are exact in binary (quarters), so float equality after JSON is exact.
                assertEquals((float) value(n, t), values.get(t), "series " + stored.getKey() + " at t=" + t);
            }
        }
    }

    private static Process start(FreshStore store, Path folder, int port, int round) throws Exception {
        List<String> command = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-cp", System.getProperty("java.class.path"), "org.trendwright.app.Main",
                "--port=" + port, "--data-dir=" + folder, "--no-demo-data");
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(folder.resolve("server-" + round + ".log").toFile());
        if (store.kind() == FreshStore.Kind.POSTGRESQL) {
            builder.environment().put("TRENDWRIGHT_DATABASE_URL", store.jdbcUrl());
            builder.environment().put("TRENDWRIGHT_DATABASE_SCHEMA", store.schema());
        }
        builder.environment().put("TRENDWRIGHT_JOB_WORKERS", "0");
        builder.environment().put("TRENDWRIGHT_SETUP_CODE", TeamAccess.SETUP_CODE);
        Process process = builder.start();
        awaitHealthy(port, process, Duration.ofSeconds(60));
        return process;
    }

    private static void awaitHealthy(int port, Process process, Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline && process.isAlive()) {
            try {
                if (RestAssured.given().port(port).get("/health").statusCode() == 200) {
                    return;
                }
            } catch (Exception notYet) {
                // Connection refused until the server listens (REST Assured rethrows it unchecked).
                Thread.sleep(100);
            }
        }
        throw new AssertionError("the server did not become healthy on port " + port);
    }

    private static int freePort() throws IOException {
        try (ServerSocket socket = new ServerSocket(0)) {
            return socket.getLocalPort();
        }
    }
}
