package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.specification.RequestSpecification;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.access.AccountService;
import org.depotcast.stock.LocationService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Sensor reports for a mechanic: without a depot, their own pumps against their own kit; a depot named is outside a
 * mechanic's scope (403), as for the pump list. The demo shows a pump probably down at every depot.
 */
@QuarkusTest
class SensorScopeTest {
    private static final LocalDate FIRST = LocalDate.of(2026, 9, 1);
    private static final String PASSWORD = "sensor-scope-1";

    @Inject
    TestData data;
    @Inject
    AccountService accounts;
    @Inject
    LocationService locations;

    /** StopFlagTest's stopped series: 28 days alternating 5 and 7 h, 12 days of 6 h, then two days of nothing. */
    private static String stopped(String... assets) {
        StringBuilder csv = new StringBuilder("asset_id,day,hours\n");
        for (String asset : assets) {
            for (int d = 0; d < 42; d++) {
                double hours = d < 28 ? (d % 2 == 0 ? 5 : 7) : d < 40 ? 6 : 0;
                csv.append(asset).append(',').append(FIRST.plusDays(d)).append(',').append(hours).append('\n');
            }
        }
        return csv.toString();
    }

    private static String pumpOf(String depot, String mechanic) {
        String asset = TestData.unique("SCOPE").toUpperCase();
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", asset);
        body.put("modelCode", "RB-2");
        body.put("depthM", 30);
        body.put("installedOn", "2024-05-01");
        body.put("depotCode", depot);
        body.put("assignedMechanic", mechanic);
        as("officer").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
        return asset;
    }

    private static RequestSpecification signedIn(String user, String password) {
        return given().auth().preemptive().basic(user, password).accept("application/json");
    }

    @Test
    void aMechanicSeesTheirOwnPumpsAgainstTheirKitAndNoDepot() {
        String depot = data.depot();
        String mechanic = TestData.unique("smech").toLowerCase();
        String kit = data.kit(depot, mechanic);
        data.asSystem(() -> accounts.create(mechanic, PASSWORD, Set.of("mechanic"), locations.require(null, kit).id));
        String mine = pumpOf(depot, mechanic);
        String alsoMine = pumpOf(depot, mechanic);
        String other = pumpOf(depot, null);
        SensorIntakeTest.csv("officer", stopped(mine, other)).then().statusCode(200).body("added", equalTo(84));

        JsonPath officers = as("officer").queryParam("depot", depot).get("/api/sensors/probably-down").then()
                .statusCode(200).extract().jsonPath();
        assertEquals(Set.of(mine, other), Set.copyOf(officers.getList("pumps.assetId", String.class)));

        JsonPath down = signedIn(mechanic, PASSWORD).get("/api/sensors/probably-down").then().statusCode(200)
                .extract().jsonPath();
        assertEquals(List.of(mine), down.getList("pumps.assetId"), "the mechanic's own stopped pump, not the other");
        assertEquals(mechanic, down.getString("mechanic"));
        assertEquals(depot, down.getString("depotCode"));
        assertEquals("in your kit " + kit, down.getString("stockCounted"));
        // stopped on 2026-10-11 (as StopFlagTest): the days since are counted to today
        assertEquals(java.time.temporal.ChronoUnit.DAYS.between(LocalDate.of(2026, 10, 11), LocalDate.now()),
                down.getLong("pumps[0].daysSinceUseFell"));
        assertNull(down.get("pumps[0].openRepairRef"));
        for (Map<String, Object> part : down.<Map<String, Object>>getList("parts")) {
            assertNull(part.get("onHandDepot"), "a mechanic is not shown the depot's shelves");
        }

        JsonPath plan = signedIn(mechanic, PASSWORD).get("/api/sensors/service-plan").then().statusCode(200)
                .extract().jsonPath();
        assertEquals(Set.of(mine, alsoMine), Set.copyOf(plan.getList("pumps.assetId", String.class)));
        assertEquals(mechanic, plan.getString("mechanic"));
        assertEquals(13, plan.getList("weeks").size());

        for (String path : List.of("/api/sensors/probably-down", "/api/sensors/service-plan")) {
            signedIn(mechanic, PASSWORD).queryParam("depot", depot).get(path).then().statusCode(403)
                    .contentType("application/problem+json");
            as("officer").get(path).then().statusCode(400).contentType("application/problem+json")
                    .body("errors[0].field", equalTo("depot"));
        }
    }

    @Test
    void theDemoShowsAPumpProbablyDownAtEveryDepotAndItsMechanicSeesIt() {
        List<String> depots = as("lead").queryParam("kind", "DEPOT").get("/api/locations").then().statusCode(200)
                .extract().jsonPath().getList("code", String.class);
        assertFalse(depots.isEmpty());
        for (String depot : depots.stream().filter(d -> d.startsWith("DEP-")).toList()) {
            JsonPath report = as("lead").queryParam("depot", depot).get("/api/sensors/probably-down").then()
                    .statusCode(200).extract().jsonPath();
            List<String> demoPumps = report.getList("pumps.findAll { it.assetId.startsWith('OB-') }.assetId");
            assertFalse(demoPumps.isEmpty(), depot + " shows a demo pump probably down");
            String asset = demoPumps.get(0);
            String mechanic = report.getString("pumps.find { it.assetId == '" + asset + "' }.assignedMechanic");
            assertTrue(report.getDouble("pumps.find { it.assetId == '" + asset + "' }.probabilityDown") >= 0.5);
            List<String> seen = signedIn(mechanic, mechanic + "-demo").get("/api/sensors/probably-down").then()
                    .statusCode(200).extract().jsonPath().getList("pumps.assetId");
            assertTrue(seen.contains(asset), mechanic + " sees " + asset);
        }
    }
}
