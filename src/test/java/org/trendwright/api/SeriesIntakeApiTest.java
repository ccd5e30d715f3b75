package org.trendwright.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.nullValue;

import io.restassured.response.ValidatableResponse;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * Series intake through the running server, on SQLite and on PostgreSQL: every period form, every
 * delimiter, long format, and each refusal with its status, type, place and message. Calendar
 * facts (ISO 8601 week numbers, month lengths) are checked by hand against a calendar.
 */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class SeriesIntakeApiTest {

    private final FreshStore.Kind kind;
    private RunningServer server;

    SeriesIntakeApiTest(FreshStore.Kind kind) {
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

    private ValidatableResponse postCsv(String csv, String query) {
        return server.given().contentType("text/csv").body(csv.getBytes(StandardCharsets.UTF_8))
                .post("/api/series" + query).then();
    }

    /** Form, three periods in it, the frequency expected and the canonical first and last labels. */
    private record Form(String periods, String frequency, String first, String last) {
    }

    @Test
    void detects_the_frequency_of_every_accepted_period_form_and_echoes_it() {
        List<Form> forms = List.of(
                new Form("2024-Q1|2024-Q2|2024-Q3", "quarterly", "2024-Q1", "2024-Q3"),
                new Form("2024Q4|2025Q1|2025Q2", "quarterly", "2024-Q4", "2025-Q2"),
                new Form("Q1 2024|Q2 2024|Q3 2024", "quarterly", "2024-Q1", "2024-Q3"),
                new Form("2024-03|2024-04|2024-05", "monthly", "2024-03", "2024-05"),
                new Form("11/2024|12/2024|01/2025", "monthly", "2024-11", "2025-01"),
                // ISO 8601: 2020 has 53 weeks; 2021-W01 begins Monday 4 January 2021.
                new Form("2020-W52|2020-W53|2021-W01", "weekly", "2020-W52", "2021-W01"),
                new Form("2022|2023|2024", "annual", "2022", "2024"),
                new Form("2024-03-31|2024-06-30|2024-09-30", "quarterly", "2024-Q1", "2024-Q3"),
                // 2024 is a leap year: 29 February is February's last day.
                new Form("2024-01-31|2024-02-29|2024-03-31", "monthly", "2024-01", "2024-03"),
                new Form("2024-01-01|2024-04-01|2024-07-01", "quarterly", "2024-Q1", "2024-Q3"),
                // Monday 4 March 2024 opens ISO week 10 (1 January 2024 was a Monday, in week 1).
                new Form("2024-03-04|2024-03-11|2024-03-18", "weekly", "2024-W10", "2024-W12"),
                new Form("2024-02-28|2024-02-29|2024-03-01", "daily", "2024-02-28", "2024-03-01"),
                new Form("2022-12-31|2023-12-31|2024-12-31", "annual", "2022", "2024"));
        for (Form form : forms) {
            String[] p = form.periods().split("\\|");
            String csv = "period,value\n" + p[0] + ",1.5\n" + p[1] + ",2.5\n" + p[2] + ",3.5\n";
            postCsv(csv, "").statusCode(201)
                    .body("series[0].frequency", equalTo(form.frequency()))
                    .body("series[0].firstPeriod", equalTo(form.first()))
                    .body("series[0].lastPeriod", equalTo(form.last()))
                    .body("series[0].observations", equalTo(3));
        }
    }

    @Test
    void reads_comma_semicolon_and_tab_delimited_files_with_or_without_a_byte_order_mark() {
        String[] files = {
            "quarter,Kettles\n2024-Q1,10.5\n2024-Q2,11\n",
            "quarter;Kettles\r\n2024-Q1;10.5\r\n2024-Q2;11\r\n",
            "quarter\tKettles\n2024-Q1\t10.5\n2024-Q2\t11\n",
            "\uFEFFquarter;Kettles\n2024-Q1;10.5\n2024-Q2;11\n",
            "\uFEFF2024-Q1,10.5\n2024-Q2,11\n"};
        for (String file : files) {
            String id = postCsv(file, "?name=Kettles").statusCode(201)
                    .body("series[0].name", equalTo("Kettles")).extract().path("series[0].id").toString();
            server.given().get("/api/series/" + id).then().statusCode(200)
                    .body("observations.period", equalTo(List.of("2024-Q1", "2024-Q2")))
                    .body("observations.value", equalTo(List.of(10.5, 11.0)));
        }
    }

    @Test
    void creates_one_series_per_column_of_a_wide_file_and_per_name_of_a_long_file() {
        postCsv("month,North,South\n2024-01,1,2\n2024-02,3,4\n", "").statusCode(201)
                .body("series.name", equalTo(List.of("North", "South")));
        postCsv("series,period,value\n\"Tea, green\",2024,5\nMugs,2024,7\n\"Tea, green\",2025,6\nMugs,2025,8\n", "")
                .statusCode(201)
                .body("series.name", equalTo(List.of("Tea, green", "Mugs")))
                .body("series.frequency", equalTo(List.of("annual", "annual")));
        server.given().get("/api/series").then().body("series", hasSize(4));
    }

    @Test
    void reads_a_csv_file_sent_as_a_form_upload() {
        byte[] csv = "week,Visits\n2024-W05,10\n2024-W06,12\n".getBytes(StandardCharsets.UTF_8);
        server.given().multiPart("file", "visits.csv", csv, "text/csv").post("/api/series").then().statusCode(201)
                .body("series[0].name", equalTo("Visits")).body("series[0].frequency", equalTo("weekly"));
        server.given().multiPart("other", "visits.csv", csv, "text/csv").post("/api/series").then().statusCode(400)
                .body("field", equalTo("file"));
    }

    @Test
    void refuses_a_json_frequency_that_contradicts_the_periods() {
        server.given().contentType("application/json").body("{\"name\": \"A\", \"frequency\": \"monthly\","
                + " \"observations\": [{\"period\": \"2024-Q1\", \"value\": 1}]}").post("/api/series").then()
                .statusCode(422).body("field", equalTo("frequency"))
                .body("detail", containsString("the request says monthly but the periods are quarterly"));
        server.given().contentType("application/json").body("{\"observations\": [{\"period\": \"2024\","
                + " \"value\": 1}]}").post("/api/series").then().statusCode(422).body("field", equalTo("name"));
    }

    @Test
    void creates_several_series_from_one_json_request() {
        String body = "{\"series\": [{\"name\": \"A\", \"observations\": [{\"period\": \"2024-01\", \"value\": 1},"
                + " {\"period\": \"2024-02\", \"value\": 2}]}, {\"name\": \"B\", \"frequency\": \"annual\","
                + " \"observations\": [{\"period\": \"2020\", \"value\": 3}]}]}";
        server.given().contentType("application/json").body(body).post("/api/series").then().statusCode(201)
                .body("series.frequency", equalTo(List.of("monthly", "annual")));
    }

    @Test
    void refuses_a_non_numeric_cell_naming_its_line_and_column() {
        postCsv("period,value\n2024-Q1,1\n2024-Q2,1.234,5\n", "").statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:invalid-upload")).body("line", equalTo(3));
        postCsv("period,a,b\n2024-Q1,1,2\n2024-Q2,3,x7\n", "").statusCode(422)
                .contentType("application/problem+json")
                .body("type", equalTo("urn:trendwright:problem:invalid-upload"))
                .body("line", equalTo(3)).body("column", equalTo(3))
                .body("detail", containsString("'x7' is not a number"));
    }

    @Test
    void refuses_nan_and_infinity_in_csv_and_json() {
        postCsv("period,value\n2024-Q1,NaN\n", "").statusCode(422).body("line", equalTo(2))
                .body("column", equalTo(2)).body("detail", containsString("NaN and Infinity are not accepted"));
        postCsv("period,value\n2024-Q1,1\n2024-Q2,-Infinity\n", "").statusCode(422).body("line", equalTo(3));
        postCsv("period,value\n2024-Q1,1e999\n", "").statusCode(422).body("detail", containsString("not a finite"));
        server.given().contentType("application/json")
                .body("{\"name\": \"x\", \"observations\": [{\"period\": \"2024\", \"value\": \"NaN\"}]}")
                .post("/api/series").then().statusCode(422).body("field", equalTo("observations[0].value"));
        server.given().contentType("application/json")
                .body("{\"name\": \"x\", \"observations\": [{\"period\": \"2024\", \"value\": NaN}]}")
                .post("/api/series").then().statusCode(400).body("detail", containsString("line 1"));
    }

    @Test
    void refuses_a_duplicate_period_naming_both_lines() {
        postCsv("period,value\n2024-Q1,1\n2024-Q2,2\n2024Q1,3\n", "").statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:inconsistent-upload")).body("line", equalTo(4))
                .body("detail", containsString("period 2024-Q1 appears twice (first at line 2, column 2)"));
    }

    @Test
    void refuses_mixed_frequencies() {
        postCsv("period,value\n2024-Q1,1\n2024-05,2\n", "").statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:inconsistent-upload"))
                .body("line", equalTo(3)).body("column", equalTo(1))
                .body("detail", containsString("'2024-05' is a monthly period but the first period '2024-Q1' is a"
                        + " quarterly"));
    }

    @Test
    void refuses_an_empty_value_unless_the_request_keeps_it_as_a_gap() {
        String csv = "period,value\n2024-Q1,1\n2024-Q2,\n2024-Q3,3\n";
        postCsv(csv, "").statusCode(422).body("type", equalTo("urn:trendwright:problem:missing-value"))
                .body("line", equalTo(3)).body("column", equalTo(2)).body("detail", containsString("missing=gap"));
        postCsv("period,value\n2024-Q1,1\n2024-Q3,3\n", "?missing=refuse").statusCode(422)
                .body("detail", containsString("period 2024-Q2 is missing between 2024-Q1 and 2024-Q3"));
        String id = postCsv(csv, "?missing=gap").statusCode(201).body("series[0].observations", equalTo(2))
                .extract().path("series[0].id").toString();
        server.given().get("/api/series/" + id).then()
                .body("observations.period", equalTo(List.of("2024-Q1", "2024-Q3")));
    }

    @Test
    void refuses_an_ambiguous_file_with_the_reason() {
        postCsv("period,value\n2024-03-15,1\n2024-04-15,2\n", "").statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:ambiguous-upload"))
                .body("detail", containsString("days apart"));
        postCsv("period,value\n2024-03-31,1\n", "").statusCode(422)
                .body("detail", containsString("a single date cannot show"));
        postCsv("2024-Q1;1,5\n2024-Q2;2,5\n", "").statusCode(422)
                .body("type", equalTo("urn:trendwright:problem:ambiguous-upload"))
                .body("detail", containsString("delimiter could be"));
        postCsv("2024-Q1;1,5\n2024-Q2;2,5\n", "?delimiter=semicolon").statusCode(422)
                .body("detail", containsString("'1,5' is not a number"));
    }

    @Test
    void stores_nothing_of_an_upload_that_fails_in_its_last_series() {
        postCsv("series,period,value\nA,2024,1\nA,2025,2\nB,2024,3\nB,2025,oops\n", "").statusCode(422)
                .body("line", equalTo(5));
        server.given().get("/api/series").then().statusCode(200).body("series", hasSize(0));
    }

    @Test
    void refuses_unreadable_requests_with_a_4xx_problem() {
        server.given().contentType("application/xml").body("<a/>").post("/api/series").then().statusCode(415)
                .body("field", equalTo("Content-Type"));
        server.given().contentType("application/json").body("{\"name\": ").post("/api/series").then()
                .statusCode(400).body("type", equalTo("urn:trendwright:problem:bad-request"))
                .body("errorId", nullValue());
        postCsv("period,value\n2024,1\n", "?missing=maybe").statusCode(400).body("field", equalTo("missing"));
        server.given().contentType("text/csv").body(new byte[] {(byte) 0xC3, (byte) 0x28, 0x2C, 0x31})
                .post("/api/series").then().statusCode(422).body("detail", containsString("not valid UTF-8"));
        server.given().get("/api/series/abc").then().statusCode(400).body("field", equalTo("id"));
        server.given().get("/api/series/999").then().statusCode(404)
                .body("type", equalTo("urn:trendwright:problem:not-found"));
    }
}
