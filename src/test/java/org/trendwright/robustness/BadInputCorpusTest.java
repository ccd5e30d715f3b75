package org.trendwright.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Every malformed request of src/test/resources/bad-input/ against a really started server, on
 * SQLite and on PostgreSQL: each yields its 4xx as application/problem+json (never a 5xx), the
 * detail holds the expected fragment, and the store's row counts are the same afterwards (a refused
 * request stores nothing). The server holds one good series throughout, so "unchanged" is checked
 * against a non-empty store.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class BadInputCorpusTest {

    private static final String[] TABLES = {"series", "series_version", "upload", "fit_result"};

    @Parameter
    FreshStore.Kind kind;

    private RunningServer server;

    @BeforeAll
    void start() {
        server = RunningServer.start(kind);
        server.given().contentType("text/csv").body("period,kettles\n2024-Q1,10\n2024-Q2,11\n2024-Q3,13\n2024-Q4,12\n")
                .post("/api/series").then().statusCode(201);
    }

    @AfterAll
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    static Stream<BadInputCase> cases() {
        return BadInputCase.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void answers_a_malformed_request_with_a_problem_and_stores_nothing(BadInputCase c) throws SQLException {
        Map<String, Long> before = rowCounts();
        Response response = send(c);
        assertEquals(c.status(), response.statusCode(), () -> c.name() + ": " + response.asString());
        assertTrue(response.contentType().startsWith("application/problem+json"), response::contentType);
        String detail = response.jsonPath().getString("detail");
        assertTrue(detail.contains(c.message()), () -> "expected '" + c.message() + "' in: " + detail);
        assertEquals(before, rowCounts(), () -> c.name() + " changed the store");
    }

    private Response send(BadInputCase c) {
        RequestSpecification request = server.given().urlEncodingEnabled(false);
        if (c.contentType() != null) {
            request = request.contentType(c.contentType());
        }
        byte[] body = c.body();
        if (body != null && "application/x-www-form-urlencoded".equals(c.contentType())) {
            // REST Assured encodes form bodies itself and takes them only as text.
            request = request.body(new String(body, StandardCharsets.UTF_8));
        } else if (body != null) {
            request = request.body(body);
        }
        return request.request(c.method(), c.path());
    }

    private Map<String, Long> rowCounts() throws SQLException {
        Map<String, Long> counts = new LinkedHashMap<>();
        try (Connection connection = server.database().dataSource().getConnection();
             Statement statement = connection.createStatement()) {
            for (String table : TABLES) {
                try (ResultSet rows = statement.executeQuery("SELECT COUNT(*) FROM " + table)) {
                    rows.next();
                    counts.put(table, rows.getLong(1));
                }
            }
        }
        return counts;
    }
}
