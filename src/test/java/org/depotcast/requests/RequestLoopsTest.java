package org.depotcast.requests;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** Safe resends of requests, the drinking-water caution on substitutes, and today's waits in the report. */
@QuarkusTest
class RequestLoopsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;

    @Test
    void aResentRequestWithOtherContentIsAConflictNamingTheField() {
        String ref = TestData.unique("offline");
        Map<String, Object> body = new HashMap<>(Map.of("clientRef", ref, "urgency", "ROUTINE", "fault", "slow to prime",
                "lines", List.of(Map.of("partNumber", "OB-OR-SET", "quantity", 2))));
        long id = as("mechanic2").contentType("application/json").body(body).post("/api/requests").then().statusCode(201)
                .extract().jsonPath().getLong("id");
        as("mechanic2").contentType("application/json").body(body).post("/api/requests").then().statusCode(200)
                .body("id", equalTo((int) id));
        body.put("lines", List.of(Map.of("partNumber", "OB-OR-SET", "quantity", 3)));
        as("mechanic2").contentType("application/json").body(body).post("/api/requests").then().statusCode(409)
                .contentType(PROBLEM).body("type", equalTo("/problems/conflict"))
                .body("errors[0].field", equalTo("lines[0].quantity"));
        body.put("lines", List.of(Map.of("partNumber", "OB-OR-SET", "quantity", 2)));
        body.put("urgency", "PUMP_DOWN");
        as("mechanic2").contentType("application/json").body(body).post("/api/requests").then().statusCode(409)
                .body("errors[0].field", equalTo("urgency"));
        long stored = as("mechanic2").get("/api/requests").then().extract().jsonPath().getList("clientRef").stream()
                .filter(ref::equals).count();
        assertEquals(1, stored);
        as("mechanic2").get("/api/requests/" + id).then().body("urgency", equalTo("ROUTINE"))
                .body("lines[0].requested", equalTo(2.0f));
    }

    @Test
    void aSubstituteForAPartInTheWaterCarriesTheApprovalCaution() {
        as("officer").contentType("application/json").body(Map.of("partNumber", "OB-CS-63"))
                .post("/api/parts/OB-CS-50/substitutes").then().statusCode(200);
        long seal = as("mechanic1").contentType("application/json").body(Map.of("clientRef", TestData.unique("s"),
                "urgency", "ROUTINE", "lines", List.of(Map.of("partNumber", "OB-CS-50", "quantity", 2))))
                .post("/api/requests").then().statusCode(201).extract().jsonPath().getLong("id");
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-CS-50",
                "quantity", 2, "substitutePartNumber", "OB-CS-63")))).post("/api/requests/" + seal + "/approve")
                .then().statusCode(200).body("cautions", hasSize(1))
                .body("cautions[0]", containsString("approved for drinking-water contact"));
        as("mechanic1").get("/api/requests/" + seal).then().body("cautions", hasSize(1));

        // Pump-head pins are not in the water: no caution.
        as("officer").contentType("application/json").body(Map.of("partNumber", "OB-HP-20"))
                .post("/api/parts/OB-FP-20/substitutes").then().statusCode(200);
        long pin = as("mechanic1").contentType("application/json").body(Map.of("clientRef", TestData.unique("s"),
                "urgency", "ROUTINE", "lines", List.of(Map.of("partNumber", "OB-FP-20", "quantity", 1))))
                .post("/api/requests").then().statusCode(201).extract().jsonPath().getLong("id");
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-FP-20",
                "quantity", 1, "substitutePartNumber", "OB-HP-20")))).post("/api/requests/" + pin + "/approve")
                .then().statusCode(200).body("lines[0].substitute", equalTo("OB-HP-20")).body("cautions", empty());
    }

    @Test
    void theReportCountsPumpsWaitingForPartsToday() {
        String depot = data.depot();
        String asset = TestData.unique("PW");
        as("officer").contentType("application/json").body(Map.of("assetId", asset, "modelCode", "RB-2", "depthM", 30,
                "installedOn", "2019-01-01", "depotCode", depot)).post("/api/pumps").then().statusCode(201);
        LocalDate today = LocalDate.now(ZoneOffset.UTC);
        String ref = TestData.unique("rep");
        as("officer").contentType("application/json").body(Map.of("repairRef", ref, "assetId", asset,
                "mechanic", "mechanic1", "kind", "BREAKDOWN", "reportedOn", today.minusDays(6).toString(),
                "diagnosedOn", today.minusDays(5).toString(), "lines", List.of(Map.of("partNumber", "OB-RM-40", "quantity", 2),
                        Map.of("partNumber", "OB-ROD-12", "quantity", 1)))).post("/api/repairs").then().statusCode(201);
        String path = "find { it.depot == '" + depot + "' }";
        as("officer").get("/api/requests/report").then().statusCode(200)
                .body(path + ".pumpsWaitingNow", equalTo(1)).body(path + ".pumpDaysWaitingNow", equalTo(5));
        as("officer").contentType("application/json").body(Map.of("partsAvailableOn", today.toString()))
                .patch("/api/repairs/" + ref).then().statusCode(200);
        as("officer").get("/api/requests/report").then()
                .body(path + ".pumpsWaitingNow", equalTo(0)).body(path + ".repairsWaitingForParts", equalTo(1))
                .body(path + ".pumpDaysWaitingForParts", equalTo(5));
    }
}
