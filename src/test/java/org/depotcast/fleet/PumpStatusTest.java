package org.depotcast.fleet;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A pump's status follows its repairs and its mechanic's reports; officers change only the fields they send. */
@QuarkusTest
class PumpStatusTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;
    @Inject
    StockQueryService stock;

    /** A new pump at Teshvale assigned to mechanic5 (kit KIT-M05), working, with coordinates. */
    private static String newPump() {
        String asset = TestData.unique("PS");
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", asset);
        body.put("modelCode", "RB-2");
        body.put("depthM", 38);
        body.put("installedOn", "2020-03-01");
        body.put("latitude", 0.41);
        body.put("longitude", 1.22);
        body.put("depotCode", "DEP-TESHVALE");
        body.put("assignedMechanic", "mechanic5");
        as("officer").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
        return asset;
    }

    private static Map<String, Object> openBreakdown(String ref, String asset, String reportedOn, String part) {
        Map<String, Object> body = new HashMap<>();
        body.put("repairRef", ref);
        body.put("assetId", asset);
        body.put("kind", "BREAKDOWN");
        body.put("reportedOn", reportedOn);
        body.put("fault", "no water at 30 strokes");
        body.put("lines", List.of(Map.of("partNumber", part, "quantity", 2)));
        return body;
    }

    @Test
    void aReportedBreakdownBreaksThePumpAndTheLastFixMendsIt() {
        String asset = newPump();
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "KIT-M05", 5);
        String first = TestData.unique("rep"), second = TestData.unique("rep");
        as("mechanic5").contentType("application/json").body(openBreakdown(first, asset, "2026-11-20", part))
                .post("/api/repairs").then().statusCode(201).body("ledgerPosted", equalTo(false));
        as("mechanic5").get("/api/pumps/" + asset).then().body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo("2026-11-20"));
        as("mechanic5").contentType("application/json").body(openBreakdown(second, asset, "2026-11-22", part))
                .post("/api/repairs").then().statusCode(201);

        // The first repair is fixed, but the second is still open: the pump stays broken since the first report.
        as("mechanic5").contentType("application/json").body(Map.of("diagnosedOn", "2026-11-21", "fixedOn", "2026-11-24"))
                .patch("/api/repairs/" + first).then().statusCode(200).body("fixedOn", equalTo("2026-11-24"))
                .body("ledgerPosted", equalTo(true));
        as("mechanic5").get("/api/pumps/" + asset).then().body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo("2026-11-20"));
        assertEquals(0, BigDecimal.valueOf(3).compareTo(stock.onHand(part, "KIT-M05")));

        as("mechanic5").contentType("application/json").body(Map.of("fixedOn", "2026-11-26"))
                .patch("/api/repairs/" + second).then().statusCode(200);
        as("mechanic5").get("/api/pumps/" + asset).then().body("status", equalTo("WORKING"))
                .body("statusSince", equalTo("2026-11-26"));
        assertEquals(0, BigDecimal.ONE.compareTo(stock.onHand(part, "KIT-M05")));

        // The phone sends the same progress again: nothing changes, nothing is consumed twice.
        as("mechanic5").contentType("application/json").body(Map.of("fixedOn", "2026-11-26"))
                .patch("/api/repairs/" + second).then().statusCode(200);
        assertEquals(0, BigDecimal.ONE.compareTo(stock.onHand(part, "KIT-M05")));
        as("mechanic5").contentType("application/json").body(Map.of("fixedOn", "2026-11-27"))
                .patch("/api/repairs/" + second).then().statusCode(409).contentType(PROBLEM)
                .body("type", equalTo("/problems/conflict")).body("errors[0].field", equalTo("fixedOn"));
        as("mechanic5").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", part, "quantity", 1))))
                .patch("/api/repairs/" + second).then().statusCode(409).body("errors[0].field", equalTo("lines"));
        as("mechanic6").contentType("application/json").body(Map.of("fixedOn", "2026-11-26"))
                .patch("/api/repairs/" + second).then().statusCode(403).contentType(PROBLEM);
        as("mechanic5").contentType("application/json").body(Map.of("fixedOn", "2026-11-26"))
                .patch("/api/repairs/NO-SUCH-REPAIR").then().statusCode(404).contentType(PROBLEM);
        as("lead").get("/api/stock/reconcile").then().body("consistent", equalTo(true));
    }

    @Test
    void aResentRepairWithOtherContentIsAConflictNamingTheField() {
        String asset = newPump();
        String ref = TestData.unique("rep");
        Map<String, Object> body = openBreakdown(ref, asset, "2026-11-18", "OB-CS-50");
        as("mechanic5").contentType("application/json").body(body).post("/api/repairs").then().statusCode(201);
        as("mechanic5").contentType("application/json").body(body).post("/api/repairs").then().statusCode(200)
                .body("repairRef", equalTo(ref)).body("reportedOn", equalTo("2026-11-18"));
        Map<String, Object> other = new HashMap<>(body);
        other.put("fault", "handle loose");
        as("mechanic5").contentType("application/json").body(other).post("/api/repairs").then().statusCode(409)
                .contentType(PROBLEM).body("type", equalTo("/problems/conflict")).body("errors[0].field", equalTo("fault"));
        other = new HashMap<>(body);
        other.put("lines", List.of(Map.of("partNumber", "OB-CS-50", "quantity", 4)));
        as("mechanic5").contentType("application/json").body(other).post("/api/repairs").then().statusCode(409)
                .body("errors[0].field", equalTo("lines"));
        // After progress was recorded, the original report sent again still matches: it carries no fix date.
        as("mechanic5").contentType("application/json").body(Map.of("diagnosedOn", "2026-11-19"))
                .patch("/api/repairs/" + ref).then().statusCode(200);
        as("mechanic5").contentType("application/json").body(body).post("/api/repairs").then().statusCode(200)
                .body("diagnosedOn", equalTo("2026-11-19"));
        assertEquals(1, as("mechanic5").queryParam("asset", asset).get("/api/repairs").then().extract().jsonPath()
                .getList("repairRef").size());
    }

    @Test
    void aMechanicReportsTheStatusOfAnAssignedPump() {
        String asset = newPump();
        as("mechanic5").contentType("application/json")
                .body(Map.of("status", "BROKEN", "since", "2026-11-28", "note", "handle jammed"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(200).body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo("2026-11-28")).body("statusNote", equalTo("handle jammed"))
                .body("latitude", equalTo(0.41f));
        // The same report again changes nothing; a report on someone else's pump is refused.
        as("mechanic5").contentType("application/json").body(Map.of("status", "BROKEN", "since", "2026-11-28"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(200).body("statusSince", equalTo("2026-11-28"));
        as("mechanic6").contentType("application/json").body(Map.of("status", "WORKING", "since", "2026-11-29"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(403).contentType(PROBLEM);
        // A working report dated before the breakdown on record comes from an old queue: conflict.
        as("mechanic5").contentType("application/json").body(Map.of("status", "WORKING", "since", "2026-11-27"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(409).contentType(PROBLEM)
                .body("errors[0].field", equalTo("since"));
        as("mechanic5").contentType("application/json").body(Map.of("status", "DECOMMISSIONED", "since", "2026-11-29"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(422).body("errors[0].field", equalTo("status"));
        as("mechanic5").contentType("application/json").body(Map.of("status", "WORKING", "since", "2026-11-30"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(200).body("status", equalTo("WORKING"))
                .body("statusSince", equalTo("2026-11-30"));

        // While a breakdown repair is open the pump cannot be reported working: its fix says so.
        String ref = TestData.unique("rep");
        as("mechanic5").contentType("application/json").body(openBreakdown(ref, asset, "2026-12-01", "OB-CS-50"))
                .post("/api/repairs").then().statusCode(201);
        as("mechanic5").contentType("application/json").body(Map.of("status", "WORKING", "since", "2026-12-01"))
                .post("/api/pumps/" + asset + "/status").then().statusCode(422).contentType(PROBLEM)
                .body("type", equalTo("/problems/rule-violated")).body("errors[0].field", equalTo("status"));
        as("officer").contentType("application/json").body(Map.of("status", "WORKING"))
                .patch("/api/pumps/" + asset).then().statusCode(422).body("errors[0].field", equalTo("status"));
        as("officer").get("/api/pumps/" + asset).then().body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo("2026-12-01"));
    }

    @Test
    void anOfficersUpdateChangesOnlyTheFieldsSent() {
        String asset = newPump();
        as("officer").contentType("application/json").body(Map.of("usageHoursPerDay", 6.5))
                .put("/api/pumps/" + asset).then().statusCode(200).body("usageHoursPerDay", equalTo(6.5f))
                .body("usageSource", equalTo("SURVEYED")).body("latitude", equalTo(0.41f))
                .body("longitude", equalTo(1.22f)).body("assignedMechanic", equalTo("mechanic5"))
                .body("depthM", equalTo(38.0f));
        as("officer").contentType("application/merge-patch+json").body("{\"assignedMechanic\": \"\"}")
                .patch("/api/pumps/" + asset).then().statusCode(200).body("assignedMechanic", nullValue())
                .body("latitude", equalTo(0.41f));
        as("officer").contentType("application/json").body(Map.of("assetId", "SOMETHING-ELSE"))
                .patch("/api/pumps/" + asset).then().statusCode(409).body("errors[0].field", equalTo("assetId"));
        as("officer").contentType("application/json").body(Map.of("status", "DECOMMISSIONED"))
                .patch("/api/pumps/" + asset).then().statusCode(422).body("errors[0].field", equalTo("statusSince"));
        as("officer").contentType("application/json").body(Map.of("depthM", -1))
                .patch("/api/pumps/" + asset).then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("depthM"));
        as("officer2").contentType("application/json").body(Map.of("depthM", 40))
                .patch("/api/pumps/" + asset).then().statusCode(403);
        as("officer").get("/api/pumps/" + asset).then().body("depthM", equalTo(38.0f)).body("status", equalTo("WORKING"));
    }

    @Test
    void importedHistorySetsTheStatusItsLastRepairImplies() {
        String fixedPump = newPump(), openPump = newPump();
        String a = TestData.unique("H"), b = TestData.unique("H"), c = TestData.unique("H");
        String csv = "repair_ref,asset_id,mechanic,kind,reported_on,diagnosed_on,parts_available_on,fixed_on,fault,part_number,quantity\n"
                + a + "," + fixedPump + ",mechanic5,BREAKDOWN,2025-03-02,2025-03-03,2025-03-03,2025-03-04,seal,OB-CS-50,2\n"
                + b + "," + openPump + ",mechanic5,BREAKDOWN,2025-06-10,2025-06-11,2025-06-11,2025-06-12,seal,OB-CS-50,2\n"
                + c + "," + openPump + ",mechanic5,BREAKDOWN,2026-11-15,2026-11-16,,,rod broken,OB-ROD-12,1\n";
        as("officer").contentType("text/csv").body(csv).post("/api/repairs/import").then().statusCode(200);
        as("officer").get("/api/pumps/" + fixedPump).then().body("status", equalTo("WORKING"))
                .body("statusSince", equalTo("2025-03-04"));
        as("officer").get("/api/pumps/" + openPump).then().body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo("2026-11-15"));
        // The demo's open breakdowns (refs R000001 …, loaded from seed-data) left their pumps broken.
        List<Map<String, Object>> open = as("officer").get("/api/repairs?open=true&limit=10000").then().statusCode(200)
                .extract().jsonPath().getList("findAll { it.kind == 'BREAKDOWN' && it.repairRef ==~ /R[0-9]{6}/ }");
        org.junit.jupiter.api.Assertions.assertFalse(open.isEmpty(), "the demo has open breakdowns");
        as("officer").get("/api/pumps/" + open.get(open.size() - 1).get("assetId")).then().body("status", equalTo("BROKEN"));
        String export = as("officer").get("/api/pumps/export").then().statusCode(200).extract().asString();
        assertTrue(export.lines().anyMatch(l -> l.startsWith(openPump + ",") && l.contains(",BROKEN,2026-11-15,")));
    }
}
