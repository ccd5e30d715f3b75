package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.ConnectException;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.trendwright.app.Settings;
import org.trendwright.app.TrendwrightApp;
import org.trendwright.store.Database;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.testing.TeamAccess;

/**
 * The operational surface: the OpenAPI document against the registered routes, health, metrics
 * and the graceful stop. These do not depend on the kind of store, so they run on SQLite.
 */
class OperationsApiTest {

    private RunningServer server;

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    @Test
    void every_registered_route_is_documented_and_every_documented_route_exists() throws IOException {
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        String text = server.given().get("/api/openapi.json").then().statusCode(200)
                .contentType("application/json").extract().asString();
        JsonNode document = new ObjectMapper().readTree(text);
        assertEquals("3.1.0", document.get("openapi").asText());
        Set<String> documented = new TreeSet<>();
        Set<String> methods = Set.of("get", "put", "post", "delete", "patch", "head", "options");
        document.get("paths").fields().forEachRemaining(path -> path.getValue().fieldNames().forEachRemaining(m -> {
            if (methods.contains(m)) {
                documented.add(m.toUpperCase(Locale.ROOT) + " " + path.getKey());
            }
        }));
        assertEquals(new TreeSet<>(server.app().routes()), documented);
    }

    @Test
    void every_reference_in_the_openapi_document_resolves() throws IOException {
        JsonNode document = new ObjectMapper().readTree(OperationsRoutes.readOpenApi());
        List<String> unresolved = new ArrayList<>();
        collectRefs(document, document, unresolved);
        assertEquals(List.of(), unresolved);
    }

    private static void collectRefs(JsonNode root, JsonNode node, List<String> unresolved) {
        if (node.isObject() && node.has("$ref")) {
            String ref = node.get("$ref").asText();
            if (root.at(ref.substring(1)).isMissingNode()) {
                unresolved.add(ref);
            }
        }
        for (Iterator<JsonNode> it = node.elements(); it.hasNext(); ) {
            collectRefs(root, it.next(), unresolved);
        }
    }

    @Test
    void health_reports_a_reachable_database() {
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        server.given().get("/health").then().statusCode(200).body("status", equalTo("up"))
                .body("database", equalTo("reachable"));
    }

    @Test
    void metrics_count_requests_by_route_template_in_prometheus_text() {
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        server.given().get("/api/series/41").then().statusCode(404);
        server.given().get("/api/series/42").then().statusCode(404);
        server.given().get("/metrics").then().statusCode(200).contentType(containsString("text/plain"))
                .body(containsString("http_server_requests_seconds_count{method=\"GET\",route=\"/api/series/{id}\","
                        + "status=\"404\"} 2"))
                .body(containsString("http_server_requests_seconds_bucket{"));
    }

    @Test
    void a_stop_lets_a_request_in_flight_finish() throws Exception {
        Settings settings = RunningServer.testSettings();
        settings = new Settings(settings.host(), 0, settings.dataDirectory(), null, null, 4, settings.maxBodyBytes(),
                settings.maxObservationsPerSeries(), settings.maxSeriesPerUpload(), false, Duration.ofSeconds(5));
        try (FreshStore store = FreshStore.create(FreshStore.Kind.SQLITE); Database database = store.open()) {
            TrendwrightApp app = TrendwrightApp.start(settings, TeamAccess.testSettings(), database, Clock.systemUTC());
            int port = app.port();
            String token = TeamAccess.bootstrap(port);
            byte[] body = "period,value\n2024-Q1,1\n2024-Q2,2\n".getBytes(StandardCharsets.UTF_8);
            try (Socket socket = new Socket("127.0.0.1", port)) {
                OutputStream out = socket.getOutputStream();
                out.write(("POST /api/series?name=late HTTP/1.1\r\nHost: localhost\r\nContent-Type: text/csv\r\n"
                        + "Authorization: Bearer " + token + "\r\n"
                        + "Content-Length: " + body.length + "\r\nConnection: close\r\n\r\n")
                        .getBytes(StandardCharsets.US_ASCII));
                out.write(body, 0, 10);
                out.flush();
                Thread.sleep(300);
                Thread stopper = new Thread(app::close);
                stopper.start();
                Thread.sleep(300);
                out.write(body, 10, body.length - 10);
                out.flush();
                String answer = readAll(socket.getInputStream());
                stopper.join(10_000);
                assertTrue(answer.startsWith("HTTP/1.1 201"), answer);
                assertTrue(answer.contains("\"name\":\"late\""), answer);
            }
            assertThrows(ConnectException.class, () -> new Socket("127.0.0.1", port).close());
        }
    }

    private static String readAll(InputStream in) throws IOException {
        return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
}
