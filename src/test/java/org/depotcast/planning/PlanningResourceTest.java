package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.lessThanOrEqualTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

@QuarkusTest
class PlanningResourceTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    ForecastRunService runs;
    @Inject
    StockQueryService stock;
    @Inject
    TestData data;

    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    @Test
    void statelessReorderPointMatchesThePoissonTable() {
        // Poisson lead-time demand 4 at 95%: s = 8, F(8) = 0.978637, G(8) = 0.033627 (see DemandDistributionTest).
        as("officer").contentType("application/json")
                .body(Map.of("leadTimeDemandMean", 4.0, "serviceLevel", 0.95, "distribution", "poisson", "orderQuantity", 5))
                .post("/api/policy/reorder-point").then().statusCode(200)
                .body("reorderPoint", equalTo(8.0f)).body("distribution", equalTo("poisson"));
        JsonPath nb = as("officer").contentType("application/json")
                .body(Map.of("leadTimeDemandMean", 4.0, "variance", 8.0, "serviceLevel", 0.95, "distribution", "negative-binomial"))
                .post("/api/policy/reorder-point").then().statusCode(200).extract().jsonPath();
        assertEquals(9.0, nb.getDouble("reorderPoint"), 0);
        as("officer").contentType("application/json").body(Map.of("leadTimeDemandMean", 4.0, "serviceLevel", 1.2))
                .post("/api/policy/reorder-point").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("serviceLevel"));
        as("officer").contentType("application/json")
                .body(Map.of("leadTimeDemandMean", 4.0, "serviceLevel", 0.9, "distribution", "negative-binomial"))
                .post("/api/policy/reorder-point").then().statusCode(400).body("errors.field", hasItem("variance"));
        as("officer").contentType("application/json")
                .body(Map.of("leadTimeDemandMean", 4.0, "serviceLevel", 0.9, "distribution", "weibull"))
                .post("/api/policy/reorder-point").then().statusCode(400).body("errors.field", hasItem("distribution"));
    }

    @Test
    void alertsAreSortedByConsequenceAndCarryTheirNumbers() {
        List<Map<String, Object>> alerts = as("officer").queryParam("location", "DEP-MARROWFORD")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
        assertFalse(alerts.isEmpty(), "the demo's uneven stock raises alerts");
        for (int i = 1; i < alerts.size(); i++) {
            assertTrue(((Number) alerts.get(i - 1).get("pumpDaysAtRisk")).doubleValue()
                    >= ((Number) alerts.get(i).get("pumpDaysAtRisk")).doubleValue());
        }
        Map<String, Object> first = alerts.get(0);
        assertTrue(first.containsKey("reorderPoint") && first.containsKey("position") && first.containsKey("detail"));
        as("officer").queryParam("location", "DEP-MARROWFORD").queryParam("kind", "SPROCKETS")
                .get("/api/planning/alerts").then().statusCode(400).contentType(PROBLEM);
    }

    @Test
    void snoozedAlertsLeaveTheListUntilTheirDate() {
        List<Map<String, Object>> alerts = as("officer").queryParam("location", "DEP-PELLOWDENE")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
        Map<String, Object> target = alerts.get(alerts.size() - 1);
        Map<String, Object> body = new HashMap<>();
        body.put("partNumber", target.get("partNumber"));
        body.put("location", "DEP-PELLOWDENE");
        body.put("kind", target.get("kind"));
        body.put("action", "SNOOZE");
        body.put("snoozeUntil", LocalDate.now().plusDays(7).toString());
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then().statusCode(201);
        List<Map<String, Object>> after = as("officer").queryParam("location", "DEP-PELLOWDENE")
                .get("/api/planning/alerts").then().extract().jsonPath().getList("$");
        assertTrue(after.stream().noneMatch(a -> a.get("partNumber").equals(target.get("partNumber"))
                && a.get("kind").equals(target.get("kind"))));
        as("officer").queryParam("location", "DEP-PELLOWDENE").queryParam("includeSnoozed", "true")
                .get("/api/planning/alerts").then().body("snoozedUntil", hasItem(LocalDate.now().plusDays(7).toString()));
        body.put("snoozeUntil", LocalDate.now().minusDays(1).toString());
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("snoozeUntil"));
    }

    @Test
    void purchasePlanStaysInBudgetAndIsAcceptedOnce() {
        JsonPath plan = as("lead").contentType("application/json")
                .body(Map.of("budget", 1500, "planningDate", "2026-12-02")).post("/api/planning/purchase-plans")
                .then().statusCode(201).body("spent", lessThanOrEqualTo(1500.0f)).extract().jsonPath();
        assertTrue(plan.getDouble("pumpDaysAfter") <= plan.getDouble("pumpDaysBefore"));
        List<Map<String, Object>> lines = plan.getList("lines");
        assertFalse(lines.isEmpty());
        double sum = 0;
        for (Map<String, Object> line : lines) {
            sum += ((Number) line.get("cost")).doubleValue();
        }
        assertEquals(plan.getDouble("spent"), sum, 0.01);
        long id = plan.getLong("id");
        String csv = as("lead").get("/api/planning/purchase-plans/" + id + "/export").then().statusCode(200).extract().asString();
        assertEquals(lines.size() + 3, csv.strip().split("\n").length); // header, lines, objective, caution
        as("lead").post("/api/planning/purchase-plans/" + id + "/accept").then().statusCode(200).body("status", equalTo("ACCEPTED"));
        try {
            as("lead").post("/api/planning/purchase-plans/" + id + "/accept").then().statusCode(409).contentType(PROBLEM);
            as("lead").queryParam("status", "OPEN").get("/api/purchase-orders").then().body("orderNumber", hasItem("PP" + id + "-1"));
        } finally {
            cancelOrdersOf(id);
        }
        as("lead").contentType("application/json").body(Map.of("budget", 0)).post("/api/planning/purchase-plans")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("budget"));
        as("mechanic1").contentType("application/json").body(Map.of("budget", 10)).post("/api/planning/purchase-plans")
                .then().statusCode(403);
    }

    /**
     * The plan's orders put most of the programme's shortfall on order for every later test in this JVM (a purchase
     * plan then found under a thousand pump-days at risk where the demo has thousands): cancelled, so the programme is
     * as the test found it.
     */
    private static void cancelOrdersOf(long planId) {
        List<String> placed = as("lead").queryParam("status", "OPEN").get("/api/purchase-orders").then().statusCode(200)
                .extract().jsonPath().getList("orderNumber", String.class);
        placed.stream().filter(n -> n.startsWith("PP" + planId + "-")).forEach(n -> as("lead")
                .post("/api/purchase-orders/" + n + "/cancel").then().statusCode(200).body("status", equalTo("CANCELLED")));
    }

    @Test
    void depotsAndKitsHoldAtMost180DaysOfCoverUnlessAPackNeedsMore() {
        int checked = 0;
        for (String location : List.of("DEP-TESHVALE", "DEP-PELLOWDENE", "KIT-M01")) {
            List<Map<String, Object>> policies = as("lead").queryParam("location", location).get("/api/planning/policies")
                    .then().statusCode(200).extract().jsonPath().getList("$");
            for (Map<String, Object> p : policies) {
                double daily = ((Number) p.get("dailyDemand")).doubleValue();
                double upTo = ((Number) p.get("orderUpTo")).doubleValue();
                double s = ((Number) p.get("reorderPoint")).doubleValue();
                int pack = location.startsWith("KIT") ? 1 : ((Number) p.get("packSize")).intValue();
                String rule = (String) p.get("orderUpToRule");
                assertFalse(rule == null || rule.isBlank(), p.toString());
                if (daily > 0) {
                    checked++;
                    assertTrue(upTo <= Math.max(Math.floor(daily * 180), s + pack) + 1e-9, p.toString());
                    if (upTo > Math.floor(daily * 180)) {
                        assertTrue(rule.contains("one pack") || rule.contains("one unit") || rule.contains("shelf"), p.toString());
                    }
                }
            }
        }
        assertTrue(checked > 20, "policies with demand checked: " + checked);
    }

    @Test
    void transferSuggestionsNeverTakeADonorBelowItsReorderPoint() {
        List<Map<String, Object>> suggestions = as("officer").get("/api/planning/transfers/suggestions")
                .then().statusCode(200).extract().jsonPath().getList("$");
        // The demo has depots over their reorder point beside depots under it (the officer's page dispatches one):
        // an empty list would make the check below pass without checking anything.
        assertFalse(suggestions.isEmpty(), "the demo programme has transfer suggestions");
        Map<String, Double> given = new HashMap<>();
        for (Map<String, Object> s : suggestions) {
            // Pump-days are counted over the receiver's own protection period, said with them.
            List<Map<String, Object>> toPolicies = as("officer").queryParam("location", s.get("to"))
                    .get("/api/planning/policies").then().extract().jsonPath().getList("$");
            assertEquals(toPolicies.stream().filter(p -> p.get("partNumber").equals(s.get("partNumber"))).findFirst()
                    .orElseThrow().get("protectionDays"), s.get("overDays"), "over the receiver's protection period");
            given.merge(s.get("partNumber") + "|" + s.get("from"), ((Number) s.get("quantity")).doubleValue(), Double::sum);
        }
        for (Map.Entry<String, Double> g : given.entrySet()) {
            String[] key = g.getKey().split("\\|");
            List<Map<String, Object>> policies = as("officer").queryParam("location", key[1])
                    .get("/api/planning/policies").then().extract().jsonPath().getList("$");
            Map<String, Object> policy = policies.stream().filter(p -> p.get("partNumber").equals(key[0])).findFirst().orElseThrow();
            double onHand = ((Number) policy.get("onHand")).doubleValue();
            double committed = ((Number) policy.get("committed")).doubleValue();
            double s = ((Number) policy.get("reorderPoint")).doubleValue();
            // Units promised to the donor's own mechanics stay with it.
            assertTrue(onHand - committed - g.getValue() >= s, g.getKey() + " gives " + g.getValue() + " of " + onHand
                    + " (" + committed + " promised) above s " + s);
        }
        // The same data give the same suggestions.
        assertEquals(suggestions, as("officer").get("/api/planning/transfers/suggestions").then().extract().jsonPath().getList("$"));
    }

    @Test
    void aTransferOnTheWayCountsInTheReceivingStoresPositionUntilItIsReceived() {
        // Without it, the morning board kept telling the receiving officer to buy what was already on the road.
        String part = data.part(org.depotcast.catalogue.UnitOfIssue.EACH), from = data.depot(), to = data.depot();
        data.stock(part, from, 10);
        long id = as("officer").contentType("application/json")
                .body(Map.of("partNumber", part, "from", from, "to", to, "quantity", 4))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        assertEquals(List.of(0.0, 4.0, 4.0), stockOf(part, to));
        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 3))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(200);
        assertEquals(List.of(3.0, 1.0, 4.0), stockOf(part, to));
        as("officer").post("/api/planning/transfers/" + id + "/receive").then().statusCode(200);
        assertEquals(List.of(4.0, 0.0, 4.0), stockOf(part, to));
        assertEquals(List.of(6.0, 0.0, 6.0), stockOf(part, from));
    }

    /** On hand, on order and position of the part's policy at the location. */
    private static List<Double> stockOf(String part, String location) {
        Map<String, Object> p = as("officer").queryParam("location", location).get("/api/planning/policies").then()
                .statusCode(200).extract().jsonPath().<Map<String, Object>>getList("$").stream()
                .filter(x -> part.equals(x.get("partNumber"))).findFirst().orElseThrow(() -> new AssertionError(
                        "no policy of " + part + " at " + location));
        return List.of(((Number) p.get("onHand")).doubleValue(), ((Number) p.get("onOrder")).doubleValue(),
                ((Number) p.get("position")).doubleValue());
    }

    @Test
    void theLeadSetsServiceLevelsAndPoliciesFollow() {
        double before = policyOf("OB-CS-50", "DEP-TESHVALE").get("reorderPoint");
        as("lead").contentType("application/json").body(Map.of("partClass", "CRITICAL", "level", 0.999))
                .put("/api/planning/service-levels").then().statusCode(204);
        Map<String, Double> after = policyOf("OB-CS-50", "DEP-TESHVALE");
        assertEquals(0.999, after.get("serviceLevel"), 1e-6); // read back through a JSON float
        assertTrue(after.get("reorderPoint") >= before);
        as("lead").contentType("application/json").body(Map.of("partClass", "CRITICAL", "level", 0.98))
                .put("/api/planning/service-levels").then().statusCode(204);
        as("lead").contentType("application/json").body(Map.of("partClass", "CRITICAL", "level", 1.2))
                .put("/api/planning/service-levels").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("level"));
        as("officer").contentType("application/json").body(Map.of("partClass", "STANDARD", "level", 0.9))
                .put("/api/planning/service-levels").then().statusCode(403);
    }

    @Test
    void aMissingValueIsSaidInPlainWordsBesideItsField() {
        as("lead").contentType("application/json").body("{}").post("/api/planning/purchase-plans")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("budget"))
                .body("errors[0].message", equalTo("is required"));
        as("lead").contentType("application/json").body(Map.of("partClass", " ", "level", 0.95))
                .put("/api/planning/service-levels").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("partClass")).body("errors[0].message", equalTo("is required"));
    }

    @Test
    void aServiceLevelBelowAHalfIsRefusedNamingTheFieldAndItsScale() {
        // 99 % typed as 0.99 on the per-cent form arrives as 0.0099: it must not become the level in force.
        double before = as("lead").get("/api/planning/service-levels").then().extract().jsonPath().getDouble("critical");
        as("lead").contentType("application/json").body(Map.of("partClass", "CRITICAL", "level", 0.0099))
                .put("/api/planning/service-levels").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("level"))
                .body("errors[0].message", equalTo("must be a fraction from 0.5 to 0.999 (50 % to 99.9 %)"));
        assertEquals(before, as("lead").get("/api/planning/service-levels").then().statusCode(200).extract().jsonPath()
                .getDouble("critical"), 1e-9);
    }

    private static Map<String, Double> policyOf(String part, String location) {
        List<Map<String, Object>> policies = as("lead").queryParam("location", location).get("/api/planning/policies")
                .then().statusCode(200).extract().jsonPath().getList("$");
        Map<String, Object> p = policies.stream().filter(x -> part.equals(x.get("partNumber"))).findFirst().orElseThrow();
        return Map.of("reorderPoint", ((Number) p.get("reorderPoint")).doubleValue(),
                "serviceLevel", ((Number) p.get("serviceLevel")).doubleValue());
    }

    @Test
    void laneCostsAreSetAndNeverNegative() {
        as("lead").contentType("application/json").body(Map.of("from", "DEP-TESHVALE", "to", "DEP-PELLOWDENE", "unitCost", -1))
                .put("/api/planning/transfer-costs").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("unitCost"));
        as("lead").contentType("application/json").body(Map.of("from", "DEP-TESHVALE", "to", "NOWHERE", "unitCost", 1))
                .put("/api/planning/transfer-costs").then().statusCode(422).contentType(PROBLEM);
        as("officer").contentType("application/json").body(Map.of("from", "DEP-TESHVALE", "to", "DEP-PELLOWDENE", "unitCost", 1))
                .put("/api/planning/transfer-costs").then().statusCode(403);
        as("lead").contentType("application/json").body(Map.of("from", "DEP-PELLOWDENE", "to", "DEP-MARROWFORD", "unitCost", 0.75))
                .put("/api/planning/transfer-costs").then().statusCode(204);
        List<Map<String, Object>> suggestions = as("officer").get("/api/planning/transfers/suggestions")
                .then().statusCode(200).extract().jsonPath().getList("$");
        suggestions.stream().filter(s -> "DEP-PELLOWDENE".equals(s.get("from")) && "DEP-MARROWFORD".equals(s.get("to")))
                .forEach(s -> assertEquals(0.75, ((Number) s.get("unitCost")).doubleValue(), 1e-9));
    }

    @Test
    void acceptedTransferMovesThroughTransitAndIsReceivedOnce() {
        BigDecimal fromBefore = stock.onHand("OB-CS-63", "DEP-TESHVALE");
        BigDecimal toBefore = stock.onHand("OB-CS-63", "DEP-PELLOWDENE");
        long id = as("officer").contentType("application/json")
                .body(Map.of("partNumber", "OB-CS-63", "from", "DEP-TESHVALE", "to", "DEP-PELLOWDENE", "quantity", 2))
                .post("/api/planning/transfers").then().statusCode(201).body("status", equalTo("IN_TRANSIT"))
                .extract().jsonPath().getLong("id");
        assertEquals(0, fromBefore.subtract(BigDecimal.valueOf(2)).compareTo(stock.onHand("OB-CS-63", "DEP-TESHVALE")));
        as("officer").post("/api/planning/transfers/" + id + "/receive").then().statusCode(200).body("status", equalTo("RECEIVED"));
        // Received already: answered as it is, nothing moves again.
        as("officer").post("/api/planning/transfers/" + id + "/receive").then().statusCode(200).body("status", equalTo("RECEIVED"));
        assertEquals(0, toBefore.add(BigDecimal.valueOf(2)).compareTo(stock.onHand("OB-CS-63", "DEP-PELLOWDENE")));
        as("officer").contentType("application/json")
                .body(Map.of("partNumber", "OB-CS-63", "from", "DEP-TESHVALE", "to", "DEP-TESHVALE", "quantity", 1))
                .post("/api/planning/transfers").then().statusCode(422).contentType(PROBLEM);
        as("officer").contentType("application/json")
                .body(Map.of("partNumber", "OB-CS-63", "from", "DEP-TESHVALE", "to", "DEP-PELLOWDENE", "quantity", 100000))
                .post("/api/planning/transfers").then().statusCode(422).contentType(PROBLEM);
        assertTrue(data.asSystem(stock::reconcile).consistent());
        TestData.as("lead").get("/api/stock/reconcile").then().body("consistent", equalTo(true));
    }
}
