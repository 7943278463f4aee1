package org.depotcast.repairs;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Services due from operating hours at each pump's load, and the open repairs of the caller's pumps. */
@QuarkusTest
class ServiceDueTest {
    private static final String PROBLEM = "application/problem+json";
    private static final LocalDate TODAY = LocalDate.now();

    /** An RB-2 pump (service every 9,125 h) at Teshvale for mechanic5, running 5 h a day with no readings. */
    private static String newPump(LocalDate installedOn) {
        String asset = TestData.unique("SD");
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", asset);
        body.put("modelCode", "RB-2");
        body.put("depthM", 30);
        body.put("installedOn", installedOn.toString());
        body.put("depotCode", "DEP-TESHVALE");
        body.put("assignedMechanic", "mechanic5");
        body.put("usageHoursPerDay", 5);
        as("officer").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
        return asset;
    }

    private static Map<String, Object> dueOf(String user, String asset) {
        List<Map<String, Object>> all = as(user).get("/api/pumps/service-due").then().statusCode(200)
                .extract().jsonPath().getList("$");
        return all.stream().filter(d -> asset.equals(d.get("assetId"))).findFirst().orElse(null);
    }

    @Test
    void hoursSinceInstallationAtTheRecordedLoadsSetTheDueDayAndAServiceRestartsTheCount() {
        String asset = newPump(TODAY.minusDays(1000));
        Map<String, Object> due = dueOf("mechanic5", asset);
        assertEquals(5000.0, ((Number) due.get("hoursSinceService")).doubleValue(), 1e-9);
        assertEquals(4125.0, ((Number) due.get("hoursLeft")).doubleValue(), 1e-9);
        assertEquals(TODAY.plusDays(825).toString(), due.get("dueOn"));
        assertEquals("LATER", due.get("state"));
        assertEquals(true, due.get("serviceOnRecord"));
        assertNull(due.get("lastServiceOn"));

        // A reading of 10 h a day holds from its day on and, as the forecasts count it, before the first reading too.
        as("mechanic5").contentType("application/json").body(Map.of("readOn", TODAY.minusDays(100).toString(),
                "hoursPerDay", 10, "source", "MEASURED")).post("/api/pumps/" + asset + "/usage").then().statusCode(201);
        due = dueOf("mechanic5", asset);
        assertEquals(10000.0, ((Number) due.get("hoursSinceService")).doubleValue(), 1e-9);
        assertEquals(10.0, ((Number) due.get("hoursPerDay")).doubleValue(), 1e-9);
        assertEquals("OVERDUE", due.get("state"));
        assertEquals(TODAY.minusDays(88).toString(), due.get("dueOn"), "875 hours past the interval at 10 h a day");

        String ref = TestData.unique("svc");
        as("mechanic5").contentType("application/json").body(Map.of("repairRef", ref, "assetId", asset,
                "kind", "PREVENTIVE", "reportedOn", TODAY.minusDays(10).toString(),
                "fixedOn", TODAY.minusDays(10).toString())).post("/api/repairs").then().statusCode(201);
        due = dueOf("mechanic5", asset);
        assertEquals(TODAY.minusDays(10).toString(), due.get("lastServiceOn"));
        assertEquals(100.0, ((Number) due.get("hoursSinceService")).doubleValue(), 1e-9);
        assertEquals("LATER", due.get("state"));
    }

    @Test
    void aPumpPastItsIntervalIsOverdueSinceTheDayItCrossedAtTodaysLoadAndOthersDoNotSeeIt() {
        String asset = newPump(TODAY.minusDays(2000));
        Map<String, Object> due = dueOf("mechanic5", asset);
        assertEquals("OVERDUE", due.get("state"));
        assertEquals(-875.0, ((Number) due.get("hoursLeft")).doubleValue(), 1e-9);
        assertEquals(TODAY.minusDays(175).toString(), due.get("dueOn"));
        List<Map<String, Object>> all = as("mechanic5").get("/api/pumps/service-due").then().statusCode(200)
                .extract().jsonPath().getList("$");
        assertEquals("OVERDUE", all.get(0).get("state"), "overdue pumps come first");
        assertTrue(dueOf("mechanic6", asset) == null, "another mechanic's pump is not listed");
        assertFalse(all.isEmpty());
        as("officer").get("/api/pumps/service-due?depot=NO-SUCH-DEPOT").then().statusCode(422).contentType(PROBLEM)
                .body("errors[0].field", equalTo("depot"));
    }

    @Test
    void openRepairsAreListedWithoutTheFixedOnesAndABadFlagIsRefused() {
        String asset = newPump(TODAY.minusDays(300));
        String open = TestData.unique("open"), fixed = TestData.unique("fixed");
        as("mechanic5").contentType("application/json").body(Map.of("repairRef", fixed, "assetId", asset,
                "kind", "BREAKDOWN", "reportedOn", TODAY.minusDays(20).toString(), "fixedOn", TODAY.minusDays(19).toString()))
                .post("/api/repairs").then().statusCode(201);
        as("mechanic5").contentType("application/json").body(Map.of("repairRef", open, "assetId", asset,
                "kind", "BREAKDOWN", "reportedOn", TODAY.minusDays(2).toString(), "fault", "handle loose"))
                .post("/api/repairs").then().statusCode(201);
        List<String> refs = as("mechanic5").queryParam("open", "true").get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("repairRef");
        assertTrue(refs.contains(open), refs.toString());
        assertFalse(refs.contains(fixed));
        assertEquals(List.of(open), as("mechanic5").queryParam("open", "true").queryParam("asset", asset)
                .get("/api/repairs").then().statusCode(200).extract().jsonPath().getList("repairRef"));
        assertFalse(as("mechanic6").queryParam("open", "true").get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("repairRef").contains(open));
        as("mechanic5").queryParam("open", "maybe").get("/api/repairs").then().statusCode(400).contentType(PROBLEM)
                .body("type", equalTo("/problems/invalid-input")).body("errors[0].field", equalTo("open"));
    }
}
