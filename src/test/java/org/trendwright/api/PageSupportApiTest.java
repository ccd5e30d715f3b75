package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.path.json.JsonPath;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * What the browser page needs from the server besides the series and fit routes: the dry run of
 * an upload, the model comparison, and the page's own files (with their Content-Security-Policy)
 * and Chart.js from the jar. These do not depend on the kind of store, so they run on SQLite.
 */
class PageSupportApiTest {

    /** The policy the page is written for: no inline script, style or event handler runs. */
    private static final String POLICY = "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self'"
            + " data: blob:";

    private RunningServer server;

    @BeforeEach
    void start() {
        server = RunningServer.start(FreshStore.Kind.SQLITE);
    }

    @AfterEach
    void stop() {
        server.close();
    }

    private JsonPath preview(String csv) {
        return server.given().contentType("text/csv").body(csv.getBytes(StandardCharsets.UTF_8))
                .post("/api/series/preview").then().statusCode(200).extract().jsonPath();
    }

    @Test
    void previews_a_clean_upload_with_its_frequency_and_stores_nothing() {
        JsonPath answer = preview("period,sales\n2024-Q1,10\n2024-Q2,11.5\n2024-Q3,12\n");
        assertTrue(answer.getBoolean("acceptable"));
        assertEquals("quarterly", answer.getString("series[0].frequency"));
        assertEquals("sales", answer.getString("series[0].name"));
        assertEquals(List.of("2024-Q1", "2024-Q2", "2024-Q3"), answer.getList("series[0].observations.period"));
        assertEquals(List.of(), answer.getList("problems"));
        server.given().get("/api/series").then().body("series", hasSize(0));
    }

    @Test
    void lists_every_problem_of_a_csv_on_its_own_line_not_only_the_first() {
        // Lines 3 and 5 hold values that are not numbers; line 6 repeats the period of line 2.
        JsonPath answer = preview("period,sales\n2024-Q1,10\n2024-Q2,ten\n2024-Q3,12\n2024-Q4,1x3\n2024-Q1,9\n");
        assertFalse(answer.getBoolean("acceptable"));
        assertEquals(List.of(3, 5, 6), answer.getList("problems.line"));
        assertTrue(answer.getString("problems[0].detail").contains("ten"), answer.getString("problems[0].detail"));
        server.given().get("/api/series").then().body("series", hasSize(0));
    }

    @Test
    void previews_a_tab_separated_paste_from_a_spreadsheet() {
        JsonPath answer = preview("month\tvisits\n2024-01\t5\n2024-02\t6\n2024-03\t7\n");
        assertTrue(answer.getBoolean("acceptable"));
        assertEquals("monthly", answer.getString("series[0].frequency"));
        assertEquals(3, answer.getInt("series[0].observationCount"));
    }

    @Test
    void recommends_a_candidate_that_passes_its_checks_with_the_best_rolling_origin_rmse() {
        long id = uploadSimulatedTrend();
        JsonPath c = server.given().contentType("application/json").body("{\"holdout\": 4}")
                .post("/api/series/" + id + "/versions/1/comparison").then().statusCode(200).extract().jsonPath();
        List<Map<String, Object>> rows = c.getList("candidates");
        String recommended = c.getString("recommended");
        List<Map<String, Object>> marked = rows.stream().filter(r -> Boolean.TRUE.equals(r.get("recommended"))).toList();
        assertEquals(1, marked.size());
        assertEquals(recommended, marked.get(0).get("name"));
        assertFalse(c.getList("reasons").isEmpty());
        assertEquals(4, c.getInt("holdout"));
        // The documented rule: best rolling-origin RMSE among the candidates whose checks pass.
        double best = rows.stream().filter(r -> Boolean.TRUE.equals(r.get("passesChecks")))
                .mapToDouble(PageSupportApiTest::rollingRmse).min().orElseThrow();
        assertEquals(best, rollingRmse(marked.get(0)), 0.0);
    }

    @Test
    void refuses_a_comparison_of_a_series_that_does_not_exist() {
        server.given().contentType("application/json").body("{}").post("/api/series/99/versions/1/comparison")
                .then().statusCode(404);
    }

    @Test
    void serves_the_page_without_sign_in_under_a_policy_that_forbids_inline_code_and_chart_js_from_the_jar() {
        server.anonymous().get("/").then().statusCode(200).contentType(containsString("text/html"))
                .header("Content-Security-Policy", startsWith(POLICY));
        server.anonymous().get("/js/app.js").then().statusCode(200).header("Content-Security-Policy", startsWith(POLICY));
        server.anonymous().get("/b/some-token").then().statusCode(200)
                .header("Content-Security-Policy", startsWith(POLICY)).body(containsString("brief.js"));
        server.anonymous().get("/setup").then().statusCode(200).body(containsString("setup.js"));
        server.anonymous().get("/webjars/chart.js/4.5.1/dist/chart.umd.js").then().statusCode(200)
                .body(containsString("Chart"));
    }

    @Test
    void asks_for_sign_in_before_a_preview_or_a_comparison() {
        server.anonymous().contentType("text/csv").body("year,v\n2001,1\n").post("/api/series/preview").then()
                .statusCode(401);
        server.anonymous().contentType("application/json").body("{}").post("/api/series/1/versions/1/comparison")
                .then().statusCode(401);
    }

    private static double rollingRmse(Map<String, Object> row) {
        @SuppressWarnings("unchecked")
        Map<String, Object> rolling = (Map<String, Object>) row.get("rollingOrigin");
        return ((Number) rolling.get("rmse")).doubleValue();
    }

    /** Demo data: a seeded straight line 50 + 2t plus N(0, 1) noise over 40 years. */
    private long uploadSimulatedTrend() {
        Random random = new Random(20261202L);
        StringBuilder csv = new StringBuilder("year,level\n");
        for (int t = 1; t <= 40; t++) {
            csv.append(1980 + t).append(',').append(50 + 2 * t + random.nextGaussian()).append('\n');
        }
        return server.given().contentType("text/csv").body(csv.toString()).post("/api/series").then()
                .statusCode(201).extract().jsonPath().getLong("series[0].id");
    }
}
