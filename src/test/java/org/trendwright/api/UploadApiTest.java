package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.HttpURLConnection;
import java.net.Socket;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.UUID;
import java.util.concurrent.CompletableFuture;
import java.util.function.Predicate;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Uploads as a whole, through the running server on both stores: the id an upload answers with
 * names its series for a batch job, a CSV body is parsed while it streams in and reports its
 * progress under the client's key, and the body limit holds for a body without a length. The
 * series are invented (a few quarterly series of small integers): only ids, counts and phases are
 * checked here; the values' reading is checked in CsvIntakeTest.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class UploadApiTest {

    private final FreshStore.Kind kind;
    private RunningServer server;

    UploadApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    /** A long-format CSV of {@code series} monthly series of {@code periods} months, with a header. */
    private static String longCsv(int series, int periods) {
        StringBuilder csv = new StringBuilder("series,period,value\n");
        for (int s = 0; s < series; s++) {
            for (int t = 0; t < periods; t++) {
                csv.append("s").append(s).append(',').append(1950 + t / 12).append('-')
                        .append(String.format("%02d", t % 12 + 1)).append(',').append(s + t).append('\n');
            }
        }
        return csv.toString();
    }

    private JsonPath upload(String csv) {
        return server.given().contentType("text/csv").body(csv).post("/api/series").then().statusCode(201)
                .extract().jsonPath();
    }

    @Test
    void a_job_named_by_upload_id_judges_every_series_that_upload_created() throws InterruptedException {
        server = RunningServer.start(kind);
        JsonPath first = upload(longCsv(3, 24));
        upload(longCsv(1, 24));
        List<Long> ids = first.getList("series.id", Long.class);
        long job = server.given().contentType("application/json").body("{\"uploadId\": " + first.getLong("uploadId")
                + "}").post("/api/jobs").then().statusCode(202).body("total", equalTo(3)).extract().jsonPath()
                .getLong("id");
        long deadline = System.nanoTime() + Duration.ofSeconds(90).toNanos();
        while (!server.given().get("/api/jobs/" + job).then().extract().jsonPath().getBoolean("finished")) {
            assertTrue(System.nanoTime() < deadline, "job " + job + " did not finish in 90 s");
            Thread.sleep(100);
        }
        List<Long> judged = server.given().get("/api/jobs/" + job + "/results").then().statusCode(200).extract()
                .jsonPath().getList("results.seriesId", Long.class);
        assertEquals(ids, judged.stream().sorted().toList());
    }

    @Test
    void refuses_a_job_over_an_unknown_or_emptied_upload_or_one_named_twice() {
        server = RunningServer.start(kind);
        JsonPath created = upload(longCsv(1, 12));
        long uploadId = created.getLong("uploadId");
        server.given().contentType("application/json").body("{\"uploadId\": 999999}").post("/api/jobs").then()
                .statusCode(404).body("field", equalTo("uploadId"));
        server.given().contentType("application/json").body("{\"uploadId\": " + uploadId + ", \"seriesIds\": [1]}")
                .post("/api/jobs").then().statusCode(400).body("detail", containsString("not both"));
        long id = created.getLong("series[0].id");
        server.given().header("If-Match", "\"s" + id + "-v1\"").delete("/api/series/" + id).then().statusCode(204);
        server.given().contentType("application/json").body("{\"uploadId\": " + uploadId + "}").post("/api/jobs")
                .then().statusCode(409).body("detail", containsString("deleted"));
    }

    @Test
    void reports_rows_read_while_the_body_streams_in_then_every_series_stored() throws Exception {
        server = RunningServer.start(kind);
        String key = UUID.randomUUID().toString();
        String csv = longCsv(30, 1000);
        int half = csv.indexOf('\n', csv.length() / 2) + 1;
        HttpURLConnection post = streamingPost("/api/series?progress=" + key);
        JsonPath receiving;
        try (OutputStream out = post.getOutputStream()) {
            out.write(csv.substring(0, half).getBytes(StandardCharsets.UTF_8));
            out.flush();
            // Half the rows are in (15,000; rows are counted every 10,000): the server has read them and
            // waits for the rest, storing nothing.
            receiving = awaitProgress(key, p -> p.getLong("rowsRead") > 0);
            assertEquals("receiving", receiving.getString("phase"));
            assertEquals(0, receiving.getInt("seriesStored"));
            assertEquals(List.of(), server.given().get("/api/series").then().extract().jsonPath().getList("series"));
            out.write(csv.substring(half).getBytes(StandardCharsets.UTF_8));
        }
        assertEquals(201, post.getResponseCode());
        JsonPath done = awaitProgress(key, p -> p.getBoolean("finished"));
        assertEquals("done", done.getString("phase"));
        assertEquals(30_000, done.getLong("rowsRead"));
        assertTrue(receiving.getLong("rowsRead") < 30_000);
        assertEquals(30, done.getInt("seriesTotal"));
        assertEquals(30, done.getInt("seriesChecked"));
        assertEquals(30, done.getInt("seriesStored"));
        assertEquals(100.0, done.getDouble("percent"));
    }

    @Test
    void a_refused_upload_reports_failed_and_keys_are_checked() throws Exception {
        server = RunningServer.start(kind);
        String key = UUID.randomUUID().toString();
        server.given().contentType("text/csv").body("series,period,value\na,2024-01,1\na,2024-01,2\n")
                .post("/api/series?progress=" + key).then().statusCode(422);
        assertEquals("failed", server.given().get("/api/upload-progress/" + key).then().statusCode(200).extract()
                .jsonPath().getString("phase"));
        server.given().get("/api/upload-progress/short").then().statusCode(400).body("field", equalTo("progress"));
        server.given().get("/api/upload-progress/" + UUID.randomUUID()).then().statusCode(404);
        server.given().contentType("text/csv").body("period,a\n2024,1\n").post("/api/series?progress=bad key")
                .then().statusCode(400);
    }

    @Test
    void refuses_a_chunked_body_past_the_limit_while_reading_it_and_stores_nothing() throws Exception {
        server = RunningServer.start(kind);
        byte[] rows = longCsv(1, 1200).substring("series,period,value\n".length()).getBytes(StandardCharsets.UTF_8);
        // A raw socket: the answer is read while the body is still being sent, as a client would see it.
        try (Socket socket = new Socket("127.0.0.1", server.port())) {
            OutputStream out = socket.getOutputStream();
            out.write(("POST /api/series HTTP/1.1\r\nHost: 127.0.0.1\r\nAuthorization: Bearer " + server.adminToken()
                    + "\r\nContent-Type: text/csv\r\nTransfer-Encoding: chunked\r\nConnection: close\r\n\r\n")
                    .getBytes(StandardCharsets.US_ASCII));
            CompletableFuture<Void> writing = CompletableFuture.runAsync(() -> {
                try {
                    chunk(out, "series,period,value\n".getBytes(StandardCharsets.UTF_8));
                    for (long sent = 0; sent <= 11L * 1024 * 1024; sent += rows.length) {
                        chunk(out, rows);
                    }
                    out.write("0\r\n\r\n".getBytes(StandardCharsets.US_ASCII));
                    out.flush();
                } catch (IOException e) {
                    // The server may answer and close before the whole body is sent.
                }
            });
            String answer = new String(socket.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertTrue(answer.startsWith("HTTP/1.1 413"), answer);
            assertTrue(answer.contains("larger than the configured limit"), answer);
            writing.join();
        }
        assertEquals(List.of(), server.given().get("/api/series").then().extract().jsonPath().getList("series"));
    }

    private static void chunk(OutputStream out, byte[] data) throws IOException {
        out.write((Integer.toHexString(data.length) + "\r\n").getBytes(StandardCharsets.US_ASCII));
        out.write(data);
        out.write("\r\n".getBytes(StandardCharsets.US_ASCII));
    }

    /** A POST of a CSV body sent in chunks, without a length, signed in as the test admin. */
    private HttpURLConnection streamingPost(String path) throws IOException {
        HttpURLConnection post = (HttpURLConnection) URI.create("http://127.0.0.1:" + server.port() + path).toURL()
                .openConnection();
        post.setRequestMethod("POST");
        post.setDoOutput(true);
        post.setChunkedStreamingMode(64 * 1024);
        post.setRequestProperty("Content-Type", "text/csv");
        post.setRequestProperty("Authorization", "Bearer " + server.adminToken());
        return post;
    }

    private JsonPath awaitProgress(String key, Predicate<JsonPath> reached) throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(30).toNanos();
        while (System.nanoTime() < deadline) {
            var answer = server.given().get("/api/upload-progress/" + key);
            if (answer.statusCode() == 200 && reached.test(answer.jsonPath())) {
                return answer.jsonPath();
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the progress of " + key + " did not reach the expected state in 30 s");
    }
}
