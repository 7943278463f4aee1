package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The settings page reads what is in force: service levels per part class and every lane's cost. */
@QuarkusTest
class PlanningSettingsReadTest {
    @Inject
    TestData data;

    @Test
    void serviceLevelsInForceAreReadBesideTheDefaults() {
        as("lead").contentType("application/json").body(Map.of("partClass", "CRITICAL", "level", 0.98))
                .put("/api/planning/service-levels").then().statusCode(204);
        Map<String, Object> levels = as("officer").get("/api/planning/service-levels").then().statusCode(200)
                .extract().jsonPath().getMap("$");
        assertEquals(0.98, ((Number) levels.get("critical")).doubleValue(), 1e-6);
        assertTrue(((Number) levels.get("standard")).doubleValue() > 0.5);
        assertEquals(0.98, ((Number) levels.get("defaultCritical")).doubleValue(), 1e-6);
        assertEquals(0.95, ((Number) levels.get("defaultStandard")).doubleValue(), 1e-6);
    }

    @Test
    void everyLaneBetweenDepotsIsListedWithTheCostSetForIt() {
        String a = data.depot(), b = data.depot();
        as("lead").contentType("application/json").body(Map.of("from", a, "to", b, "unitCost", 1.25))
                .put("/api/planning/transfer-costs").then().statusCode(204);
        List<Map<String, Object>> lanes = as("lead").get("/api/planning/transfer-costs").then().statusCode(200)
                .extract().jsonPath().getList("$");
        Map<String, Object> there = lanes.stream().filter(l -> a.equals(l.get("from")) && b.equals(l.get("to"))).findFirst().orElseThrow();
        Map<String, Object> back = lanes.stream().filter(l -> b.equals(l.get("from")) && a.equals(l.get("to"))).findFirst().orElseThrow();
        assertEquals(1.25, ((Number) there.get("setCost")).doubleValue(), 1e-9);
        assertNull(back.get("setCost"), "a lane's cost is set one way only");
        assertTrue(lanes.stream().noneMatch(l -> l.get("from").equals(l.get("to"))));
        Map<String, Object> demo = lanes.stream().filter(l -> "DEP-TESHVALE".equals(l.get("from")) && "DEP-PELLOWDENE".equals(l.get("to")))
                .findFirst().orElseThrow();
        assertTrue(((Number) demo.get("distanceKm")).doubleValue() > 0, "demo depots have coordinates");
        as("mechanic1").get("/api/planning/transfer-costs").then().statusCode(403).contentType("application/problem+json");
    }
}
