package org.trendwright.api;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.oneOf;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;

import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/** Fits through the running server, on SQLite and on PostgreSQL. */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class FitApiTest {

    /** Twelve quarters with trend and a fourth-quarter peak (invented). */
    private static final String QUARTERS = "quarter,Kettles\n2022-Q1,50.1\n2022-Q2,51.9\n2022-Q3,52.4\n2022-Q4,60.8\n"
            + "2023-Q1,53.0\n2023-Q2,54.6\n2023-Q3,55.9\n2023-Q4,64.1\n2024-Q1,56.2\n2024-Q2,57.0\n2024-Q3,59.3\n"
            + "2024-Q4,67.5\n";
    private static final String MODEL = "{\"model\": {\"family\": \"trend\", \"scale\": \"log\", \"seasonal\": true},"
            + " \"horizon\": 6, \"levels\": [0.9]}";

    private final FreshStore.Kind kind;
    private RunningServer server;

    FitApiTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @BeforeEach
    void start() {
        server = RunningServer.start(kind);
    }

    @AfterEach
    void stop() {
        if (server != null) {
            server.close();
        }
    }

    private String upload(String csv, String query) {
        return server.given().contentType("text/csv").body(csv.getBytes(StandardCharsets.UTF_8))
                .post("/api/series" + query).then().statusCode(201).extract().path("series[0].id").toString();
    }

    private Response fit(String id, int version, String body) {
        return server.given().contentType("application/json").body(body)
                .post("/api/series/" + id + "/versions/" + version + "/fit");
    }

    /** y = 1 + t + t^2 for the years 2000..2020 (t = 1..21), with the year {@code skip} left empty. */
    private static String exactQuadratic(int skip) {
        StringBuilder csv = new StringBuilder("year,value\n");
        for (int t = 1; t <= 21; t++) {
            csv.append(1999 + t).append(',').append(1999 + t == skip ? "" : String.valueOf(1 + t + t * t)).append('\n');
        }
        return csv.toString();
    }

    @Test
    void recovers_an_exact_quadratic_with_t_counted_from_the_first_period_even_across_a_gap() {
        // Common practice: least squares recovers an exact polynomial; 1e-7 allows for the rounding
        // of a design whose t^2 column reaches 441 (condition number in the hundreds).
        for (String query : List.of("", "?missing=gap")) {
            String id = upload(exactQuadratic(query.isEmpty() ? 0 : 2010), query);
            fit(id, 1, "{\"model\": {\"family\": \"trend\", \"shape\": \"quadratic\"}, \"horizon\": 2}").then()
                    .statusCode(200)
                    .body("coefficients.name", equalTo(List.of("constant", "t", "t^2")))
                    .body("coefficients[0].estimate", closeTo(1.0, 1e-7))
                    .body("coefficients[1].estimate", closeTo(1.0, 1e-7))
                    .body("coefficients[2].estimate", closeTo(1.0, 1e-7))
                    .body("forecast.period", equalTo(List.of("2021", "2022")))
                    .body("forecast[0].value", closeTo(1 + 22 + 22 * 22, 1e-6))
                    .body("chart.periods", hasSize(query.isEmpty() ? 21 : 20))
                    .body("series.hasGaps", equalTo(!query.isEmpty()))
                    .body("notes[0]", containsString(query.isEmpty() ? "residual checks were skipped"
                            : "t = 11 is missing"))
                    .body("durbinWatson", equalTo(null));
        }
    }

    @Test
    void the_stateless_fit_gives_the_same_numbers_as_the_stored_fit() {
        String id = upload(QUARTERS, "");
        JsonPath stored = fit(id, 1, MODEL).then().statusCode(200).extract().jsonPath();
        StringBuilder observations = new StringBuilder();
        for (String line : QUARTERS.split("\n")) {
            if (!line.startsWith("quarter")) {
                String[] cells = line.split(",");
                observations.append(observations.length() == 0 ? "" : ", ")
                        .append("{\"period\": \"").append(cells[0]).append("\", \"value\": ").append(cells[1]).append('}');
            }
        }
        String body = MODEL.replace("{\"model\"", "{\"series\": {\"name\": \"Kettles\", \"observations\": ["
                + observations + "]}, \"model\"");
        JsonPath posted = server.given().contentType("application/json").body(body).post("/api/fit").then()
                .statusCode(200).extract().jsonPath();
        assertEquals(List.of("Durbin-Watson", "Breusch-Godfrey LM (order 4)", "Breusch-Godfrey F (order 4)",
                "Ljung-Box Q (2 lags)", "ARCH LM (order 1)"), stored.getList("tests.test"));
        assertEquals("classical", stored.getString("errors.treatment"));
        for (String part : List.of("model", "coefficients", "statistics", "growthRate", "errors", "tests",
                "durbinWatson", "screening", "notes", "forecast", "chart")) {
            assertEquals(stored.getString(part), posted.getString(part), part);
        }
        assertEquals("Kettles", posted.getString("series.name"));
        assertEquals(null, (Object) posted.get("series.id"));
        server.given().get("/api/series").then().body("series", hasSize(1));
    }

    @Test
    void computes_a_version_and_model_pair_once_and_answers_repeats_from_the_store() {
        String id = upload(QUARTERS, "");
        String first = fit(id, 1, MODEL).then().statusCode(200).header("X-Trendwright-Cache", "miss")
                .extract().asString();
        String spelledOut = "{\"model\": {\"family\": \"trend\", \"shape\": \"LINEAR\", \"scale\": \"log\","
                + " \"seasonal\": true}, \"horizon\": 6, \"levels\": [0.9, 0.9]}";
        fit(id, 1, spelledOut).then().statusCode(200).header("X-Trendwright-Cache", "hit").body(equalTo(first));
        fit(id, 1, MODEL.replace("\"horizon\": 6", "\"horizon\": 5")).then().header("X-Trendwright-Cache", "miss");
        server.restart();
        fit(id, 1, MODEL).then().statusCode(200).header("X-Trendwright-Cache", "hit").body(equalTo(first));
        server.given().get("/metrics").then().statusCode(200)
                .body(containsString("trendwright_fits_seconds_count{cache=\"hit\",family=\"trend\",outcome=\"fitted\"} 1"));
    }

    @Test
    void concurrent_requests_for_one_pair_compute_it_once() throws Exception {
        String id = upload(QUARTERS, "");
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(6);
        List<java.util.concurrent.Callable<Response>> calls = new java.util.ArrayList<>();
        for (int i = 0; i < 6; i++) {
            calls.add(() -> fit(id, 1, MODEL));
        }
        List<String> caches = new java.util.ArrayList<>();
        java.util.Set<String> bodies = new java.util.HashSet<>();
        for (java.util.concurrent.Future<Response> answer : pool.invokeAll(calls)) {
            caches.add(answer.get().header("X-Trendwright-Cache"));
            bodies.add(answer.get().asString());
        }
        pool.shutdown();
        assertEquals(1, caches.stream().filter("miss"::equals).count(), caches.toString());
        assertEquals(1, bodies.size());
        server.given().get("/metrics").then()
                .body(containsString("trendwright_fits_seconds_count{cache=\"miss\",family=\"trend\",outcome=\"fitted\"} 1"));
    }

    @Test
    void answers_422_with_the_cores_reason_when_the_data_cannot_support_the_model() {
        String withZero = upload("period,value\n2024-01,3\n2024-02,0\n2024-03,5\n2024-04,6\n", "");
        fit(withZero, 1, "{\"model\": {\"family\": \"trend\", \"scale\": \"log\"}}").then().statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:non-positive-value"))
                .body("detail", containsString("needs values above zero"))
                .body("detail", containsString("for period 2024-02 (t = 2)"));
        String two = upload("period,value\n2024-01,3\n2024-02,4\n", "");
        fit(two, 1, "{\"model\": {\"family\": \"trend\", \"shape\": \"quadratic\"}}").then().statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:insufficient-data"));
        String annual = upload("period,value\n2020,3\n2021,4\n2022,6\n2023,7\n", "");
        fit(annual, 1, "{\"model\": {\"family\": \"trend\", \"seasonal\": true}}").then().statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:invalid-specification"));
        fit(annual, 1, "{\"model\": {\"family\": \"trend\"}, \"levels\": [1.5]}").then().statusCode(422)
                .body("detail", containsString("between 0 and 1"));
        fit(annual, 1, "{\"model\": {\"family\": \"trend\"}, \"significanceLevel\": 0}").then().statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:invalid-specification"));
        server.given().get("/metrics").then()
                .body(containsString("trendwright_fits_seconds_count{cache=\"miss\",family=\"trend\",outcome=\"refused\"} 4"));
    }

    @Test
    void treats_serially_correlated_errors_and_screens_the_series_on_request() {
        byte[] demo = org.trendwright.demo.DemoDataGenerator.files().get("brindlewood-long.csv");
        String filters = server.given().contentType("text/csv").body(demo).post("/api/series").then().statusCode(201)
                .extract().path("series[0].id").toString();
        // Seeded simulation (DemoDataGenerator): Water filters' level rises 35% from 2019-Q3, about
        // seven noise standard deviations, so the sup-F search finds it to within a quarter.
        fit(filters, 1, "{\"model\": {\"family\": \"trend\"}}").then().statusCode(200)
                .body("errors.treatment", equalTo("classical"))
                .body("tests.test", hasItem(startsWith("Augmented Dickey-Fuller")))
                .body("tests.test", hasItem(startsWith("sup-F")))
                .body("screening.breakPeriod", oneOf("2019-Q2", "2019-Q3", "2019-Q4"))
                .body("durbinWatson.verdict", oneOf("positive-serial-correlation", "none-detected",
                        "negative-serial-correlation"))
                .body("chart.autocorrelations.size()", greaterThan(0));
        fit(filters, 1, "{\"model\": {\"family\": \"trend\", \"errors\": \"prais-winsten\"}}").then()
                .statusCode(200).body("errors.treatment", equalTo("prais-winsten"))
                .body("errors.rho", greaterThan(0.0)).body("errors.converged", equalTo(true));
        fit(filters, 1, "{\"model\": {\"family\": \"trend\", \"errors\": \"newey-west\", \"hacLag\": 3}}")
                .then().statusCode(200).body("errors.lag", equalTo(3))
                .body("notes", hasItem(containsString("Newey-West errors correct")));
        fit(filters, 1, "{\"model\": {\"family\": \"trend\", \"hacLag\": 3}}").then().statusCode(400)
                .body("field", equalTo("model.hacLag"));
        fit(filters, 1, "{\"model\": {\"family\": \"trend\", \"errors\": \"robust\"}}").then().statusCode(400)
                .body("field", equalTo("model.errors"));
    }

    @Test
    void fits_an_autoregression_through_the_same_endpoint() {
        byte[] demo = org.trendwright.demo.DemoDataGenerator.files().get("brindlewood-core-lines.csv");
        String kettles = server.given().contentType("text/csv").body(demo).post("/api/series").then().statusCode(201)
                .extract().path("series[0].id").toString();
        fit(kettles, 1, "{\"model\": {\"family\": \"autoregression\", \"order\": 2, \"differenced\": true,"
                + " \"seasonalLag\": true}, \"horizon\": 4}").then().statusCode(200)
                .body("model.family", equalTo("autoregression"))
                .body("coefficients.name", equalTo(List.of("constant", "lag 1", "lag 2", "lag 4")))
                .body("statistics.observations", equalTo(47 - 4))
                .body("tests.test", hasItem(startsWith("Ljung-Box")))
                .body("durbinWatson", equalTo(null)).body("errors", equalTo(null))
                .body("chart.fitted[3]", equalTo(null)).body("chart.fitted[5]", greaterThan(0.0))
                .body("forecast.period", equalTo(List.of("2025-Q1", "2025-Q2", "2025-Q3", "2025-Q4")));
        String gap = upload("period,value\n2024-01,3\n2024-02,\n2024-03,5\n2024-04,6\n2024-05,6\n", "?missing=gap");
        fit(gap, 1, "{\"model\": {\"family\": \"autoregression\", \"order\": 1}}").then().statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:invalid-specification"));
        fit(gap, 1, "{\"model\": {\"family\": \"autoregression\", \"selection\": \"hqc\"}}").then()
                .statusCode(400).body("field", equalTo("model.selection"));
    }

    @Test
    void refuses_malformed_fit_requests_with_400_naming_the_field() {
        String id = upload(QUARTERS, "");
        fit(id, 1, "{\"horizon\": 4}").then().statusCode(400).body("field", equalTo("model"));
        fit(id, 1, "{\"model\": {\"family\": \"crystal-ball\"}}").then().statusCode(400)
                .body("field", equalTo("model"));
        fit(id, 1, "{\"model\": {\"family\": \"trend\"}, \"horizon\": 0}").then().statusCode(400)
                .body("field", equalTo("horizon"));
        fit(id, 1, "{\"model\": {\"family\": \"trend\", \"shape\": \"cubic\"}}").then().statusCode(400)
                .body("field", equalTo("model.shape"));
        fit(id, 1, "{\"model\": {\"family\": \"trend\"}, \"horizn\": 4}").then().statusCode(400)
                .body("field", equalTo("horizn"));
        fit(id, 1, "{\"model\": {\"family\": \"trend\"}, \"horizon\": \"4\"}").then().statusCode(400)
                .body("field", equalTo("horizon"));
        fit(id, 2, "{\"model\": {\"family\": \"trend\"}}").then().statusCode(404);
        server.given().contentType("application/json").body("{\"model\": {\"family\": \"trend\"}}").post("/api/fit")
                .then().statusCode(400).body("field", equalTo("series"));
    }
}
