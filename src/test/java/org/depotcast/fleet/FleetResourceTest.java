package org.depotcast.fleet;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;

@QuarkusTest
class FleetResourceTest {
    private static final String PROBLEM = "application/problem+json";

    private static Map<String, Object> pump(String assetId) {
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", assetId);
        body.put("modelCode", "RB-2");
        body.put("depthM", 42.5);
        body.put("installedOn", "2024-05-01");
        body.put("depotCode", "DEP-TESHVALE");
        body.put("assignedMechanic", "mechanic1");
        return body;
    }

    @Test
    void registeredPumpDefaultsToTheDesignLoad() {
        String asset = TestData.unique("PUMP");
        as("officer").contentType("application/json").body(pump(asset)).post("/api/pumps")
                .then().statusCode(201).body("usageHoursPerDay", equalTo(5.0f)).body("usageSource", equalTo("DEFAULT"))
                .body("status", equalTo("WORKING"));
        as("mechanic1").contentType("application/json")
                .body(Map.of("readOn", "2026-11-01", "hoursPerDay", 7.25, "source", "MEASURED"))
                .post("/api/pumps/" + asset + "/usage").then().statusCode(201);
        as("officer").get("/api/pumps/" + asset).then().body("usageHoursPerDay", equalTo(7.25f))
                .body("usageSource", equalTo("MEASURED"));
        as("mechanic1").contentType("application/json")
                .body(Map.of("readOn", "2026-11-01", "hoursPerDay", 6, "source", "MEASURED"))
                .post("/api/pumps/" + asset + "/usage").then().statusCode(409).contentType(PROBLEM);
    }

    @Test
    void pumpInputIsChecked() {
        Map<String, Object> bad = pump(TestData.unique("PUMP"));
        bad.put("depthM", -3);
        bad.put("installedOn", "2099-01-01");
        as("officer").contentType("application/json").body(bad).post("/api/pumps")
                .then().statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("depthM"))
                .body("errors.field", hasItem("installedOn"));
        Map<String, Object> kitAsDepot = pump(TestData.unique("PUMP"));
        kitAsDepot.put("depotCode", "KIT-M01");
        as("officer").contentType("application/json").body(kitAsDepot).post("/api/pumps")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("depotCode"));
        Map<String, Object> broken = pump(TestData.unique("PUMP"));
        broken.put("status", "BROKEN");
        as("officer").contentType("application/json").body(broken).post("/api/pumps")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("statusSince"));
        as("officer").queryParam("status", "SULKING").get("/api/pumps").then().statusCode(400).contentType(PROBLEM);
    }

    @Test
    void mechanicsSeeOnlyTheirPumpsAndOfficersOnlyTheirDepots() {
        as("mechanic2").get("/api/pumps").then().statusCode(200).body("assignedMechanic", org.hamcrest.Matchers.everyItem(equalTo("mechanic2")));
        as("officer2").get("/api/pumps").then().statusCode(200).body("depotCode", org.hamcrest.Matchers.everyItem(equalTo("DEP-PELLOWDENE")));
        as("officer2").queryParam("depot", "DEP-TESHVALE").get("/api/pumps").then().statusCode(403).contentType(PROBLEM);
        String export = as("officer2").get("/api/pumps/export").then().statusCode(200).extract().asString();
        org.junit.jupiter.api.Assertions.assertFalse(export.contains("DEP-TESHVALE"));
    }

    @Test
    void demoFleetIsListedPerDepot() {
        as("officer").queryParam("depot", "DEP-PELLOWDENE").get("/api/pumps")
                .then().statusCode(200).body("size()", greaterThan(200));
        as("officer").get("/api/pumps/OB-00001/usage").then().statusCode(200).body("size()", greaterThan(5));
    }
}
