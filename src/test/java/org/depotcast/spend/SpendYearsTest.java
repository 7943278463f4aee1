package org.depotcast.spend;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Financial years in projections, reports and the back-check; comparing runs in different currencies; scenarios. */
@QuarkusTest
class SpendYearsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    ForecastRunService forecasts;

    @BeforeEach
    void forecastsExist() {
        if (forecasts.latestFinished().isEmpty()) {
            forecasts.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    private static long save(Map<String, Object> body) {
        return as("lead").contentType("application/json").body(body).post("/api/spend/scenarios").then().statusCode(201)
                .extract().jsonPath().getLong("id");
    }

    private static long run(long scenario) throws InterruptedException {
        long run = as("lead").post("/api/spend/scenarios/" + scenario + "/runs").then().statusCode(202)
                .extract().jsonPath().getLong("id");
        for (int i = 0; i < 600 && "RUNNING".equals(as("lead").get("/api/spend/runs/" + run).jsonPath().getString("status")); i++) {
            Thread.sleep(100);
        }
        as("lead").get("/api/spend/runs/" + run).then().body("status", equalTo("DONE"));
        return run;
    }

    @Test
    void aSavedScenarioIsReadAtItsLocation() {
        String name = TestData.unique("located");
        String location = as("lead").contentType("application/json").body(Map.of("name", name, "horizonYears", 2))
                .post("/api/spend/scenarios").then().statusCode(201).extract().header("Location");
        as("lead").get(location).then().statusCode(200).body("name", equalTo(name))
                .body("definition.horizonYears", equalTo(2));
        as("lead").get("/api/spend/scenarios/99999999").then().statusCode(404).contentType(PROBLEM);
    }

    @Test
    void projectionsAndTheBackCheckUseTheProgrammesFinancialYear() throws Exception {
        as("officer").contentType("application/json").body(Map.of("startMonth", 7)).put("/api/spend/financial-year")
                .then().statusCode(403);
        as("lead").contentType("application/json").body(Map.of("startMonth", 13)).put("/api/spend/financial-year")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("startMonth"));
        try {
            as("lead").contentType("application/json").body(Map.of("startMonth", 7)).put("/api/spend/financial-year")
                    .then().statusCode(200).body("startMonth", equalTo(7));
            LocalDate today = LocalDate.now(ZoneOffset.UTC);
            FinancialYears july = new FinancialYears(7);
            List<FinancialYears.Period> expected = july.projection(today.withDayOfMonth(1), 2);
            long runId = run(save(Map.of("name", TestData.unique("july"), "horizonYears", 2, "draws", 1000, "seed", 3)));
            JsonPath r = as("lead").get("/api/spend/runs/" + runId + "/results").then().statusCode(200).extract().jsonPath();
            assertEquals(7, r.getInt("financialYearStartMonth"));
            assertEquals(expected.stream().map(FinancialYears.Period::months).toList(), r.getList("years.months"));
            assertEquals(expected.stream().map(FinancialYears.Period::label).toList(), r.getList("years.label"));
            // On 2 December 2026: "Dec 2026 – Jun 2027" (rest of 2026/27), then "Jul 2027 – Jun 2028" (2027/28), ...
            if (today.getYear() == 2026 && today.getMonthValue() == 12) {
                assertEquals(List.of("2026/27", "2027/28", "2028/29"), r.getList("years.label"));
                assertEquals("Dec 2026 – Jun 2027", r.getString("years[0].months"));
            }
            String csv = as("lead").get("/api/spend/runs/" + runId + "/results.csv").then().extract().asString();
            assertTrue(csv.lines().skip(1).findFirst().orElseThrow().startsWith(expected.get(0).label() + ","
                    + expected.get(0).months() + ",total,all,"), csv.lines().limit(2).toList().toString());
            as("lead").get("/api/spend/runs/" + runId + "/report").then().statusCode(200)
                    .body(containsString(expected.get(1).months()));

            List<FinancialYears.Period> past = july.completedBefore(today, 1);
            as("lead").get("/api/spend/back-check?years=1").then().statusCode(200)
                    .body("[0].label", equalTo(past.get(0).label())).body("[0].months", equalTo(past.get(0).months()));
        } finally {
            as("lead").contentType("application/json").body(Map.of("startMonth", 1)).put("/api/spend/financial-year")
                    .then().statusCode(200);
        }
        as("lead").get("/api/spend/financial-year").then().body("startMonth", equalTo(1));
    }

    @Test
    void comparingRunsNeverAddsAmountsInDifferentCurrencies() throws Exception {
        long usd = run(save(Map.of("name", TestData.unique("usd"), "horizonYears", 1, "draws", 1000, "seed", 5)));
        long eur = run(save(Map.of("name", TestData.unique("eur"), "horizonYears", 1, "draws", 1000, "seed", 5,
                "currency", "EUR", "exchangeRate", 0.9)));
        JsonPath rows = as("lead").get("/api/spend/compare?runs=" + usd + "," + eur + "," + usd).then().statusCode(200)
                .body("currency", equalTo(List.of("USD", "EUR", "USD"))).extract().jsonPath();
        assertTrue(rows.getList("[1].years.differenceFromBaseline").stream().allMatch(d -> d == null));
        assertTrue(rows.getString("[1].note").contains("EUR"));
        assertEquals(0.0, rows.getDouble("[2].years[0].differenceFromBaseline"), 1e-9);
        as("lead").get("/api/spend/compare?runs=" + usd + "," + eur).then().body("[0].note", nullValue());
        // Each run's own total is in its own currency: the EUR run is 0.9 × the USD one (same seed and data).
        assertEquals(0.9 * rows.getDouble("[0].expectedTotal"), rows.getDouble("[1].expectedTotal"),
                1e-6 * rows.getDouble("[0].expectedTotal"));
    }
}
