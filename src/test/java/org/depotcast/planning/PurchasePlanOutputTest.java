package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A purchase plan says what it left out (only the unbought remainder), its objective and unit, and a caution. */
@QuarkusTest
class PurchasePlanOutputTest {
    @Inject
    ForecastRunService runs;
    @Inject
    TestData data;

    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    @Test
    void leftOutListsOnlyWhatWasNotBoughtAndThePlanStatesItsObjective() {
        // A part added after the forecast run has no programme forecast: listed as such, never bought.
        String unforecast = data.part(UnitOfIssue.EACH);
        boolean partFunded = false;
        for (int budget : new int[]{150, 400, 900, 2000}) {
            partFunded |= checkLeftOut(plan(budget), unforecast);
        }
        assertTrue(partFunded, "some budget funds a part only in part, and its remainder is what is left out");

        JsonPath plan = plan(400);
        assertEquals("expected pump-days without water", plan.getString("objective.measure"));
        assertEquals("pump-days", plan.getString("objective.unit"));
        int days = plan.getInt("objective.horizonDaysMin");
        assertTrue(days >= 30 + 30, "supplier lead time + 30-day review: " + days);
        assertTrue(plan.getString("objective.statement").contains("pump-days without water over the next " + days));
        assertEquals(plan.getDouble("pumpDaysBefore"), plan.getDouble("objective.before"), 1e-9);
        // The statement is for people, as the budget page shows it: thousands separators, one decimal.
        assertTrue(plan.getDouble("pumpDaysBefore") >= 1000, "the demo's programme has thousands of pump-days at risk");
        String said = String.format(java.util.Locale.ROOT, "%,.1f before this plan, %,.1f after",
                plan.getDouble("pumpDaysBefore"), plan.getDouble("pumpDaysAfter"));
        assertTrue(plan.getString("objective.statement").endsWith(said), plan.getString("objective.statement"));
        assertTrue(plan.getString("caution").contains("drinking water"));

        String csv = as("lead").get("/api/planning/purchase-plans/" + plan.getLong("id") + "/export").then().statusCode(200)
                .extract().asString();
        List<String> rows = csv.strip().lines().toList();
        assertEquals(plan.getList("lines").size() + 3, rows.size());
        assertTrue(rows.get(rows.size() - 2).startsWith("objective,") && rows.get(rows.size() - 2).contains("pump-days"));
        assertTrue(rows.get(rows.size() - 1).startsWith("caution,") && rows.get(rows.size() - 1).contains("drinking water"));
    }

    private static JsonPath plan(int budget) {
        return as("lead").contentType("application/json").body(Map.of("budget", budget, "planningDate", "2026-12-02"))
                .post("/api/planning/purchase-plans").then().statusCode(201).extract().jsonPath();
    }

    /** Checks every left-out entry; true when one is the unfunded remainder of a line the plan did buy. */
    private static boolean checkLeftOut(JsonPath plan, String unforecast) {
        List<Map<String, Object>> lines = plan.getList("lines");
        List<Map<String, Object>> leftOut = plan.getList("leftOut");
        assertFalse(leftOut.isEmpty(), "a small budget leaves parts below their reorder point");
        assertTrue(plan.getList("noForecast").contains(unforecast));
        assertTrue(lines.stream().noneMatch(l -> unforecast.equals(l.get("partNumber"))));
        boolean partFunded = false;
        for (Map<String, Object> out : leftOut) {
            double quantity = ((Number) out.get("quantity")).doubleValue();
            assertTrue(quantity > 0, "left out lists what was not bought: " + out);
            assertEquals("BUDGET", out.get("reason"));
            assertTrue(((Number) out.get("positionAfter")).doubleValue() < ((Number) out.get("reorderPoint")).doubleValue());
            Map<String, Object> bought = lines.stream().filter(l -> l.get("partNumber").equals(out.get("partNumber")))
                    .findFirst().orElse(null);
            if (bought != null) {
                partFunded = true;
                double before = ((Number) bought.get("positionBefore")).doubleValue();
                double boughtUnits = ((Number) bought.get("quantity")).doubleValue();
                double orderUpTo = ((Number) bought.get("orderUpTo")).doubleValue();
                // The remainder, not the whole need: together they reach the order-up-to level, apart they do not.
                assertEquals(before + boughtUnits, ((Number) out.get("positionAfter")).doubleValue(), 1e-9);
                assertTrue(quantity < orderUpTo - before, out + " vs " + bought);
                assertTrue(before + boughtUnits + quantity >= orderUpTo, out + " vs " + bought);
            }
        }
        return partFunded;
    }
}
