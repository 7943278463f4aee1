package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The central store buys for the whole programme, so its reorder alerts read the same echelon position as the budget
 * plan (stock in every store and kit, and everything on order). Before, they set the programme-wide reorder point
 * against the central store's own shelf: the demo's board asked to buy 645 bush bearings where the plan bought 530.
 */
@QuarkusTest
class CentralStoreAlertsTest {
    @Inject
    ForecastRunService runs;

    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    @Test
    void theCentralStoresAlertsAndPoliciesReadTheProgrammesPosition() {
        Map<String, Map<String, Object>> programme = byPart(as("lead").get("/api/planning/policies")
                .then().statusCode(200).extract().jsonPath().getList("$"));
        List<Map<String, Object>> central = as("officer").queryParam("location", "CENTRAL")
                .get("/api/planning/policies").then().statusCode(200).extract().jsonPath().getList("$");
        assertFalse(central.isEmpty());
        for (Map<String, Object> p : central) {
            Map<String, Object> plan = programme.get((String) p.get("partNumber"));
            for (String figure : List.of("onHand", "onOrder", "position", "reorderPoint", "orderUpTo")) {
                assertEquals(number(plan, figure), number(p, figure), 1e-9, p.get("partNumber") + " " + figure);
            }
        }
        Map<String, Double> shelf = new HashMap<>();
        for (Map<String, Object> b : as("officer").queryParam("location", "CENTRAL").get("/api/stock/balances")
                .then().statusCode(200).extract().jsonPath().<Map<String, Object>>getList("$")) {
            shelf.put((String) b.get("partNumber"), number(b, "onHand"));
        }
        List<Map<String, Object>> alerts = as("officer").queryParam("location", "CENTRAL")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
        assertFalse(alerts.isEmpty(), "the demo's central store has parts to buy");
        int countedElsewhere = 0;
        for (Map<String, Object> a : alerts) {
            Map<String, Object> plan = programme.get((String) a.get("partNumber"));
            assertEquals(number(plan, "position"), number(a, "position"), 1e-9, a.get("partNumber") + " position");
            assertEquals(number(plan, "reorderPoint"), number(a, "reorderPoint"), 1e-9);
            double own = shelf.getOrDefault((String) a.get("partNumber"), 0.0);
            assertTrue(number(a, "onHand") >= own, a.get("partNumber") + ": the programme holds at least the shelf");
            countedElsewhere += number(a, "onHand") > own ? 1 : 0;
        }
        assertTrue(countedElsewhere > 0, "stock at depots and kits counts towards the central store's position");
    }

    private static Map<String, Map<String, Object>> byPart(List<Map<String, Object>> policies) {
        Map<String, Map<String, Object>> out = new HashMap<>();
        policies.forEach(p -> out.put((String) p.get("partNumber"), p));
        return out;
    }

    private static double number(Map<String, Object> row, String key) {
        return ((Number) row.get(key)).doubleValue();
    }
}
