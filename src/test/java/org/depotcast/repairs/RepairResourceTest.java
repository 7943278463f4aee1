package org.depotcast.repairs;

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
import static org.junit.jupiter.api.Assertions.assertEquals;

@QuarkusTest
class RepairResourceTest {
    @Inject
    TestData data;
    @Inject
    StockQueryService stock;

    /** Demo pumps assigned to mechanic5 and mechanic6 (seed-data/pumps.csv). */
    private static final Map<String, String> PUMP_OF = Map.of("mechanic5", "OB-00006", "mechanic6", "OB-00005");

    private static Map<String, Object> repair(String ref, String part, int quantity) {
        return repair(ref, part, quantity, "mechanic5");
    }

    private static Map<String, Object> repair(String ref, String part, int quantity, String mechanic) {
        Map<String, Object> body = new HashMap<>();
        body.put("repairRef", ref);
        body.put("assetId", PUMP_OF.get(mechanic));
        body.put("kind", "BREAKDOWN");
        body.put("reportedOn", "2026-11-20");
        body.put("diagnosedOn", "2026-11-21");
        body.put("partsAvailableOn", "2026-11-25");
        body.put("fixedOn", "2026-11-26");
        body.put("fault", "no water at 20 strokes");
        body.put("lines", List.of(Map.of("partNumber", part, "quantity", quantity)));
        return body;
    }

    @Test
    void fixedRepairConsumesFromTheMechanicsKitOnce() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "KIT-M05", 4);
        String ref = TestData.unique("phone-rep");
        as("mechanic5").contentType("application/json").body(repair(ref, part, 3)).post("/api/repairs")
                .then().statusCode(201).body("mechanic", equalTo("mechanic5")).body("ledgerPosted", equalTo(true))
                .body("daysWaitingForParts", equalTo(4)).body("downtimeDays", equalTo(6));
        // the phone resends after losing the connection
        as("mechanic5").contentType("application/json").body(repair(ref, part, 3)).post("/api/repairs")
                .then().statusCode(200);
        assertEquals(0, BigDecimal.ONE.compareTo(stock.onHand(part, "KIT-M05")));
    }

    @Test
    void repairNeedingMoreThanTheKitHoldsIsRefusedWhole() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "KIT-M06", 1);
        String ref = TestData.unique("phone-rep");
        as("mechanic6").contentType("application/json").body(repair(ref, part, 2, "mechanic6")).post("/api/repairs")
                .then().statusCode(422).contentType("application/problem+json");
        as("mechanic6").get("/api/repairs/" + ref).then().statusCode(404);
        assertEquals(0, BigDecimal.ONE.compareTo(stock.onHand(part, "KIT-M06")));
    }

    @Test
    void aMechanicCannotRecordOnAnotherMechanicsPump() {
        as("mechanic6").contentType("application/json").body(repair(TestData.unique("rep"), "OB-CS-50", 1, "mechanic5"))
                .post("/api/repairs").then().statusCode(403).contentType("application/problem+json");
    }

    @Test
    void datesOutOfOrderAreRefused() {
        Map<String, Object> body = repair(TestData.unique("rep"), "OB-CS-50", 1);
        body.put("fixedOn", "2026-11-19");
        as("mechanic5").contentType("application/json").body(body).post("/api/repairs")
                .then().statusCode(400).contentType("application/problem+json").body("errors[0].field", equalTo("fixedOn"));
    }
}
