package org.depotcast.forecasting;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import io.restassured.RestAssured;
import io.restassured.config.JsonConfig;
import io.restassured.path.json.config.JsonPathConfig;
import io.restassured.specification.RequestSpecification;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.notNullValue;

@QuarkusTest
class ForecastResourceTest {
    private static final String PROBLEM = "application/problem+json";

    /** Reads JSON numbers as doubles: the checks below go to 1e-9. */
    private static RequestSpecification as(String user) {
        return org.depotcast.TestData.as(user).config(RestAssured.config().jsonConfig(
                JsonConfig.jsonConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE)));
    }

    private static Map<String, Object> body(Object history, String method, Object alpha, Object horizon) {
        Map<String, Object> body = new HashMap<>();
        body.put("history", history);
        body.put("method", method);
        body.put("alpha", alpha);
        body.put("horizon", horizon);
        return body;
    }

    @Test
    void seriesWithFixedAlphaGivesTheCrostonValue() {
        // y = (1,0,0,0,2,0,0), α = 0.1 → 0.8461538 (R forecast croston; see ReferenceLibraryTest).
        as("mechanic1").contentType("application/json").body(body(List.of(1, 0, 0, 0, 2, 0, 0), "croston", 0.1, 6))
                .post("/api/forecast/series").then().statusCode(200)
                .body("forecast", hasSize(6)).body("forecast[5]", closeTo(0.8461538, 1e-6))
                .body("method", equalTo("croston")).body("alpha", closeTo(0.1, 1e-12))
                .body("adi", closeTo(2.5, 1e-12)).body("demandClass", equalTo("intermittent"))
                .body("horizonDemand.distribution", notNullValue());
    }

    @Test
    void autoChoosesByBacktestAndReportsWhy() {
        List<Integer> history = List.of(0, 2, 0, 0, 1, 0, 3, 0, 0, 1, 0, 0, 2, 0, 1, 0, 0, 0, 4, 0, 0, 1, 0, 2);
        as("officer").contentType("application/json").body(body(history, "auto", null, 3))
                .post("/api/forecast/series").then().statusCode(200)
                .body("backtest.keySet()", hasItem("sba")).body("backtest.sba.rmsse", notNullValue())
                .body("demandClass", equalTo("intermittent"));
    }

    @Test
    void seriesInputIsChecked() {
        expect(body(List.of(), "croston", 0.1, 6), "history");
        expect(body(List.of(1, -2, 0), "croston", 0.1, 6), "history[1]");
        expect(body(List.of(1, 0, 2), "croston", 1.5, 6), "alpha");
        expect(body(List.of(1, 0, 2), "croston", 0.1, 61), "horizon");
        expect(body(List.of(1, 0, 2), "holt-winters", 0.1, 6), "method");
        expect(body(List.of(1, "x", 2), "croston", 0.1, 6), "history[1]");
    }

    private static void expect(Map<String, Object> body, String field) {
        as("officer").contentType("application/json").body(body).post("/api/forecast/series")
                .then().statusCode(400).contentType(PROBLEM).body("errors.field", hasItem(field));
    }

    @Test
    void batchForecastsEverySeriesInTheCsv() {
        String csv = "series_id,period,quantity\nA,1,1\nA,2,0\nA,3,0\nA,4,0\nA,5,2\nA,6,0\nA,7,0\n"
                + "B,1,3\nB,2,4\nB,3,3\nB,4,5\n";
        String out = as("officer").contentType("text/csv").body(csv)
                .post("/api/forecast/batch?method=croston&alpha=0.1&horizon=2")
                .then().statusCode(200).contentType(containsString("text/csv")).extract().asString();
        List<String> lines = List.of(out.strip().split("\n"));
        org.junit.jupiter.api.Assertions.assertEquals(5, lines.size());
        org.junit.jupiter.api.Assertions.assertTrue(lines.get(1).startsWith("A,1,0.846154,croston,0.10"), lines.get(1));
        as("officer").contentType("text/csv").body("series_id,period,quantity\nA,1,one\nA,x,2\n")
                .post("/api/forecast/batch?method=croston").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("row 2, column quantity")).body("errors.field", hasItem("row 3, column period"));
        as("officer").contentType("text/csv").body(csv).post("/api/forecast/batch?alpha=lots")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("alpha"));
    }

    @Test
    void aBatchOverTheOrdinaryBodyLimitStreamsThroughAndEachSeriesIsForecast() {
        // 10,000 series × 120 months is about 14 MB, over the 10 MB limit of other requests.
        StringBuilder csv = new StringBuilder("series_id,period,quantity\n");
        for (int s = 0; s < 10_000; s++) {
            for (int p = 1; p <= 120; p++) {
                csv.append("S").append(s).append(',').append(p).append(',').append(p % 5 == s % 5 ? 2 : 0).append('\n');
            }
        }
        org.junit.jupiter.api.Assertions.assertTrue(csv.length() > 12_000_000, "the body is over 10 MB");
        String out = as("officer").contentType("text/csv").body(csv.toString())
                .post("/api/forecast/batch?method=croston&alpha=0.1&horizon=3").then().statusCode(200)
                .header("Content-Disposition", containsString("forecasts.csv")).extract().asString();
        List<String> lines = List.of(out.strip().split("\n"));
        org.junit.jupiter.api.Assertions.assertEquals(1 + 30_000, lines.size());
        // Demand 2 every 5th month from month 5 (series 9995): Croston's size 2 over interval 5 → 0.4 a month.
        org.junit.jupiter.api.Assertions.assertTrue(lines.contains("S9995,3,0.400000,croston,0.10,,intermittent"));
        // From month 4 (series 9999): the first interval is 4, then 23 of 5 → 2 / (5 − 0.9^23) (Croston 1972).
        org.junit.jupiter.api.Assertions.assertEquals(String.format(java.util.Locale.ROOT,
                "S9999,3,%.6f,croston,0.10,,intermittent", 2 / (5 - Math.pow(0.9, 23))), lines.get(lines.size() - 1));
    }

    @Test
    void aSeriesWhoseRowsAreNotTogetherOrRepeatAPeriodIsRefusedByRow() {
        as("officer").contentType("text/csv").body("series_id,period,quantity\nA,1,1\nB,1,2\nA,2,0\n")
                .post("/api/forecast/batch?method=croston").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("row 4, column series_id"))
                .body("errors[0].message", containsString("must be together"));
        as("officer").contentType("text/csv").body("series_id,period,quantity\nA,1,1\nA,2,2\nA,1,0\n")
                .post("/api/forecast/batch?method=croston").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("row 4, column period"))
                .body("errors[0].message", containsString("appears twice"));
        as("officer").contentType("text/csv").body("series_id,period,quantity\n\"A,1,1\nA,2,2\n")
                .post("/api/forecast/batch?method=croston").then().statusCode(400).contentType(PROBLEM);
    }

    @Test
    void aBatchReadsTheSameWhetherItsRecordsAreReadAsBytesOrByFastCsv() {
        // Plain records are read from the bytes; from the first quoted one on FastCSV reads the rest. The answer
        // and the row numbers of problems are the same as when FastCSV reads the whole body (a CRLF body).
        String plain = "series_id,period,quantity\nA,1,1\nA,2,0\nA,3,4\nB,1,2\nB,2,0\nB,3,5\nC,1,0\nC,2,3\n";
        String quoted = plain.replace("B,2,0", "\"B\",2,0");
        String crlf = plain.replace("\n", "\r\n");
        String expected = batch(plain).then().statusCode(200).extract().asString();
        org.junit.jupiter.api.Assertions.assertEquals(1 + 3 * 2, expected.strip().split("\n").length);
        for (String body : List.of(quoted, crlf)) {
            org.junit.jupiter.api.Assertions.assertEquals(expected, batch(body).then().statusCode(200).extract().asString());
            batch(body.replace("C,2,3", "C,2,three")).then().statusCode(400).contentType(PROBLEM)
                    .body("errors.field", hasItem("row 9, column quantity"));
        }
    }

    private static io.restassured.response.Response batch(String csv) {
        return as("officer").contentType("text/csv").body(csv).post("/api/forecast/batch?method=croston&alpha=0.1&horizon=2");
    }

    @Test
    void rateFitMatchesTheClosedForm() {
        // Shallow 10 events in 10,000 h, deep 16 in 8,000 h → intercept log(0.001), deep log 2.
        Map<String, Object> shallow = Map.of("count", 10, "exposure", 10_000, "covariates", Map.of("deep", 0));
        Map<String, Object> deep = Map.of("count", 16, "exposure", 8_000, "covariates", Map.of("deep", 1));
        as("lead").contentType("application/json").body(Map.of("rows", List.of(shallow, deep)))
                .post("/api/forecast/rate-fit").then().statusCode(200)
                .body("coefficients.intercept", closeTo(Math.log(0.001), 1e-9))
                .body("coefficients.deep", closeTo(Math.log(2), 1e-9))
                .body("standardErrors.deep", closeTo(Math.sqrt(0.1 + 1.0 / 16), 1e-9));
        Map<String, Object> a = Map.of("count", 1, "exposure", 10, "covariates", Map.of("x", 1));
        Map<String, Object> b = Map.of("count", 2, "exposure", 10, "covariates", Map.of("x", 1));
        as("lead").contentType("application/json").body(Map.of("rows", List.of(a, b, a)))
                .post("/api/forecast/rate-fit").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("rows"));
        as("lead").contentType("application/json").body(Map.of("rows", List.of(Map.of("count", 1, "exposure", -1))))
                .post("/api/forecast/rate-fit").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("rows[0].exposure"));
    }

    @Test
    void onlyPlannersStartRuns() {
        as("mechanic1").post("/api/forecast/runs").then().statusCode(403).contentType(PROBLEM);
        as("officer").get("/api/forecast/runs/999999").then().statusCode(404).contentType(PROBLEM);
    }

    @Test
    void aRunOriginMustBeADateNotInTheFuture() {
        as("lead").queryParam("origin", java.time.LocalDate.now(java.time.ZoneOffset.UTC).plusMonths(1).toString())
                .post("/api/forecast/runs").then().statusCode(400).contentType(PROBLEM)
                .body("type", org.hamcrest.Matchers.endsWith("/invalid-input")).body("errors[0].field", equalTo("origin"));
        as("lead").queryParam("origin", "last-year").post("/api/forecast/runs").then().statusCode(400)
                .contentType(PROBLEM).body("errors[0].field", equalTo("origin"));
        // Before the register's first pump (the demo's: 2015) there is no history: refused, not an empty run.
        as("lead").queryParam("origin", "1900-01-01").post("/api/forecast/runs").then().statusCode(400)
                .contentType(PROBLEM).body("errors[0].field", equalTo("origin"))
                .body("errors[0].message", org.hamcrest.Matchers.containsString("first pump"));
    }
}
