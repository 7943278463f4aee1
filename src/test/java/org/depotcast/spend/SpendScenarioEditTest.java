package org.depotcast.spend;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Changing a saved scenario and listing runs, as the spend page does. */
@QuarkusTest
class SpendScenarioEditTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    ForecastRunService forecasts;

    @BeforeEach
    void forecastsExist() {
        if (forecasts.latestFinished().isEmpty()) {
            forecasts.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    private static Map<String, Object> scenario(String name) {
        Map<String, Object> body = new HashMap<>();
        body.put("name", name);
        body.put("horizonYears", 2);
        body.put("draws", 1000);
        return body;
    }

    private static long create(String name) {
        return as("lead").contentType("application/json").body(scenario(name)).post("/api/spend/scenarios")
                .then().statusCode(201).extract().jsonPath().getLong("id");
    }

    @Test
    void aScenarioIsChangedInPlaceUnderAFreeName() {
        String name = "edit-" + UUID.randomUUID();
        long id = create(name);
        String other = "other-" + UUID.randomUUID();
        create(other);
        Map<String, Object> changed = scenario(name + "-more-use");
        changed.put("usageChangePercent", 10);
        changed.put("installations", List.of(Map.of("year", 1, "count", 5, "modelCode", "RB-2", "depthM", 40,
                "depotCode", "DEP-PELLOWDENE")));
        as("lead").contentType("application/json").body(changed).put("/api/spend/scenarios/" + id).then().statusCode(200)
                .body("name", equalTo(name + "-more-use"));
        JsonPath read = as("lead").get("/api/spend/scenarios/" + id).then().statusCode(200).extract().jsonPath();
        assertEquals(10.0, read.getDouble("definition.usageChangePercent"), 0);
        assertEquals(5, read.getInt("definition.installations[0].count"));

        as("lead").contentType("application/json").body(scenario(other)).put("/api/spend/scenarios/" + id)
                .then().statusCode(409).contentType(PROBLEM).body("errors.field", hasItem("name"));
        as("lead").contentType("application/json").body(scenario("x-" + UUID.randomUUID())).put("/api/spend/scenarios/999999")
                .then().statusCode(404).contentType(PROBLEM);
        Map<String, Object> badDepot = scenario(name);
        badDepot.put("installations", List.of(Map.of("year", 1, "count", 5, "modelCode", "RB-2", "depthM", 40,
                "depotCode", "CENTRAL")));
        as("lead").contentType("application/json").body(badDepot).put("/api/spend/scenarios/" + id)
                .then().statusCode(422).contentType(PROBLEM).body("errors.field", hasItem("installations[0].depotCode"));
        Map<String, Object> noHorizon = scenario(name);
        noHorizon.remove("horizonYears");
        as("lead").contentType("application/json").body(noHorizon).put("/api/spend/scenarios/" + id)
                .then().statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("horizonYears"));
        as("mechanic1").contentType("application/json").body(scenario(name)).put("/api/spend/scenarios/" + id)
                .then().statusCode(403).contentType(PROBLEM);
        assertEquals(name + "-more-use", as("lead").get("/api/spend/scenarios/" + id).then().extract().jsonPath().getString("name"),
                "refused changes change nothing");
    }

    @Test
    void runsAreListedNewestFirstPerScenario() {
        long id = create("runs-" + UUID.randomUUID());
        long first = as("lead").post("/api/spend/scenarios/" + id + "/runs").then().statusCode(202).extract().jsonPath().getLong("id");
        long second = as("lead").post("/api/spend/scenarios/" + id + "/runs").then().statusCode(202).extract().jsonPath().getLong("id");
        List<Map<String, Object>> runs = as("lead").queryParam("scenario", id).get("/api/spend/runs").then().statusCode(200)
                .extract().jsonPath().getList("$");
        assertEquals(List.of(second, first), runs.stream().map(r -> ((Number) r.get("id")).longValue()).toList());
        assertTrue(runs.stream().allMatch(r -> r.get("startedAt") != null && ((Number) r.get("scenarioId")).longValue() == id));
        as("lead").queryParam("limit", 1).get("/api/spend/runs").then().statusCode(200).body("size()", equalTo(1));
        as("lead").queryParam("scenario", "first").get("/api/spend/runs").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("scenario"));
        as("mechanic1").get("/api/spend/runs").then().statusCode(403).contentType(PROBLEM);
        finish(first);
        finish(second);
    }

    /** Waits for a background run, so none is left working when the application stops. */
    private static void finish(long run) {
        long deadline = System.currentTimeMillis() + 600_000;
        while (System.currentTimeMillis() < deadline
                && "RUNNING".equals(as("lead").get("/api/spend/runs/" + run).then().extract().jsonPath().getString("status"))) {
            try {
                Thread.sleep(200);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
        assertEquals("DONE", as("lead").get("/api/spend/runs/" + run).then().extract().jsonPath().getString("status"));
    }
}
