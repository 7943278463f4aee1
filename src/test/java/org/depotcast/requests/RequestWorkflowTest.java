package org.depotcast.requests;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The request workflow end to end through the API, on the demo programme (mechanic1's kit is KIT-M01 at DEP-TESHVALE). */
@QuarkusTest
class RequestWorkflowTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    StockQueryService stock;
    @Inject
    RequestService requests;

    private static Map<String, Object> raise(String ref, String part, int quantity) {
        return Map.of("clientRef", ref, "assetId", "OB-00010", "urgency", "PUMP_DOWN", "fault", "handle loose, no water",
                "lines", List.of(Map.of("partNumber", part, "quantity", quantity)));
    }

    private static long raiseAs(String mechanic, Map<String, Object> body) {
        return as(mechanic).contentType("application/json").body(body).post("/api/requests")
                .then().statusCode(201).extract().jsonPath().getLong("id");
    }

    @Test
    void raiseApproveIssueRepairReturnClose() {
        String asset = pumpOf("mechanic1");
        BigDecimal depotBefore = stock.onHand("OB-CS-63", "DEP-TESHVALE");
        BigDecimal kitBefore = stock.onHand("OB-CS-63", "KIT-M01");
        BigDecimal committedBefore = requests.committed().getOrDefault("DEP-TESHVALE|OB-CS-63", BigDecimal.ZERO);
        String ref = TestData.unique("phone");
        Map<String, Object> body = Map.of("clientRef", ref, "assetId", asset, "urgency", "PUMP_DOWN",
                "lines", List.of(Map.of("partNumber", "OB-CS-63", "quantity", 3)));
        long id = raiseAs("mechanic1", body);
        as("officer").contentType("application/json")
                .body(Map.of("lines", List.of(Map.of("partNumber", "OB-CS-63", "quantity", 2)), "note", "two in stock for you"))
                .post("/api/requests/" + id + "/approve").then().statusCode(200).body("status", equalTo("PARTLY_APPROVED"));
        assertEquals(0, committedBefore.add(new BigDecimal(2)).compareTo(requests.committed().get("DEP-TESHVALE|OB-CS-63")));
        as("officer").post("/api/requests/" + id + "/issue").then().statusCode(200).body("status", equalTo("ISSUED"))
                .body("lines[0].issued", equalTo(2.0f));
        assertEquals(0, depotBefore.subtract(new BigDecimal(2)).compareTo(stock.onHand("OB-CS-63", "DEP-TESHVALE")));
        assertEquals(0, kitBefore.add(new BigDecimal(2)).compareTo(stock.onHand("OB-CS-63", "KIT-M01")));
        // The repair consumes from the kit, and the mechanic returns what was not used.
        as("mechanic1").contentType("application/json").body(Map.of("repairRef", TestData.unique("rep"), "assetId", asset,
                "kind", "BREAKDOWN", "reportedOn", "2026-11-28", "diagnosedOn", "2026-11-28", "fixedOn", "2026-11-29",
                "lines", List.of(Map.of("partNumber", "OB-CS-63", "quantity", 1)))).post("/api/repairs").then().statusCode(201);
        as("mechanic1").contentType("application/json").body(Map.of("kind", "RETURN", "partNumber", "OB-CS-63",
                "from", "KIT-M01", "to", "DEP-TESHVALE", "quantity", 1)).post("/api/stock/movements").then().statusCode(201);
        as("mechanic1").post("/api/requests/" + id + "/close").then().statusCode(200).body("status", equalTo("CLOSED"))
                .body("history.status", hasItem("ISSUED"));
        assertEquals(0, kitBefore.compareTo(stock.onHand("OB-CS-63", "KIT-M01")));
        as("lead").get("/api/requests/report").then().statusCode(200).body("depot", hasItem("DEP-TESHVALE"));
        as("lead").queryParam("entityType", "parts_request").get("/api/audit").then().statusCode(200)
                .body("action", hasItem("REQUEST_ISSUED"));
    }

    @Test
    void resendingAnOfflineRequestFiveTimesCreatesOne() {
        String ref = TestData.unique("offline");
        Map<String, Object> body = raise(ref, "OB-OR-SET", 1);
        Map<String, Object> withPump = new java.util.HashMap<>(body);
        withPump.put("assetId", pumpOf("mechanic2"));
        as("mechanic2").contentType("application/json").body(withPump).post("/api/requests").then().statusCode(201);
        for (int i = 0; i < 4; i++) {
            as("mechanic2").contentType("application/json").body(withPump).post("/api/requests").then().statusCode(200);
        }
        long count = as("mechanic2").get("/api/requests").then().extract().jsonPath().getList("clientRef").stream()
                .filter(ref::equals).count();
        assertEquals(1, count);
    }

    @Test
    void twoOfficersApprovingAndIssuingAtOnceIssueOnce() throws Exception {
        BigDecimal kitBefore = stock.onHand("OB-BR-20", "KIT-M03");
        long id = raiseAs("mechanic3", Map.of("clientRef", TestData.unique("race"), "urgency", "ROUTINE",
                "lines", List.of(Map.of("partNumber", "OB-BR-20", "quantity", 1))));
        ExecutorService pool = Executors.newFixedThreadPool(2);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<Integer>> statuses = new ArrayList<>();
        for (String officer : new String[]{"officer", "admin"}) {
            Callable<Integer> approveAndIssue = () -> {
                start.await();
                int approved = as(officer).contentType("application/json")
                        .body(Map.of("lines", List.of(Map.of("partNumber", "OB-BR-20", "quantity", 1))))
                        .post("/api/requests/" + id + "/approve").statusCode();
                int issued = as(officer).post("/api/requests/" + id + "/issue").statusCode();
                return approved * 1000 + issued;
            };
            statuses.add(pool.submit(approveAndIssue));
        }
        start.countDown();
        List<Integer> results = new ArrayList<>();
        for (Future<Integer> f : statuses) {
            results.add(f.get());
        }
        pool.shutdown();
        assertEquals(1, results.stream().filter(r -> r / 1000 == 200).count(), "exactly one approval: " + results);
        assertEquals(0, kitBefore.add(BigDecimal.ONE).compareTo(stock.onHand("OB-BR-20", "KIT-M03")), "issued once");
    }

    @Test
    void refusedAndCancelledRequestsReleaseCommittedStock() {
        long refused = raiseAs("mechanic4", Map.of("clientRef", TestData.unique("r"), "urgency", "ROUTINE",
                "lines", List.of(Map.of("partNumber", "OB-HD-STD", "quantity", 1))));
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-HD-STD", "quantity", 1))))
                .post("/api/requests/" + refused + "/approve").then().statusCode(200);
        BigDecimal committed = requests.committed().getOrDefault("DEP-TESHVALE|OB-HD-STD", BigDecimal.ZERO);
        assertTrue(committed.signum() > 0);
        as("officer").contentType("application/json").body(Map.of("reason", "handle can be straightened on site"))
                .post("/api/requests/" + refused + "/refuse").then().statusCode(200).body("status", equalTo("REFUSED"));
        assertEquals(0, committed.subtract(BigDecimal.ONE).compareTo(
                requests.committed().getOrDefault("DEP-TESHVALE|OB-HD-STD", BigDecimal.ZERO)));
        long cancelled = raiseAs("mechanic4", Map.of("clientRef", TestData.unique("c"), "urgency", "ROUTINE",
                "lines", List.of(Map.of("partNumber", "OB-HD-STD", "quantity", 1))));
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-HD-STD", "quantity", 1))))
                .post("/api/requests/" + cancelled + "/approve").then().statusCode(200);
        as("mechanic1").contentType("application/json").body(Map.of("reason", "not mine"))
                .post("/api/requests/" + cancelled + "/cancel").then().statusCode(403).contentType(PROBLEM);
        as("mechanic4").contentType("application/json").body(Map.of("reason", "fixed with a spare"))
                .post("/api/requests/" + cancelled + "/cancel").then().statusCode(200).body("status", equalTo("CANCELLED"));
        assertEquals(0, committed.subtract(BigDecimal.ONE).compareTo(
                requests.committed().getOrDefault("DEP-TESHVALE|OB-HD-STD", BigDecimal.ZERO)));
        as("officer").post("/api/requests/" + cancelled + "/issue").then().statusCode(409).contentType(PROBLEM);
    }

    @Test
    void substitutesMustBeOnTheCompatibilityList() {
        long id = raiseAs("mechanic1", Map.of("clientRef", TestData.unique("s"), "urgency", "ROUTINE",
                "lines", List.of(Map.of("partNumber", "OB-CS-50", "quantity", 2))));
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-CS-50",
                "quantity", 2, "substitutePartNumber", "OB-HD-STD")))).post("/api/requests/" + id + "/approve")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("lines[0].substitutePartNumber"));
        as("officer").contentType("application/json").body(Map.of("partNumber", "OB-CS-63"))
                .post("/api/parts/OB-CS-50/substitutes").then().statusCode(200).body("$", hasItem("OB-CS-63"));
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-CS-50",
                "quantity", 2, "substitutePartNumber", "OB-CS-63")))).post("/api/requests/" + id + "/approve")
                .then().statusCode(200).body("lines[0].substitute", equalTo("OB-CS-63"));
        as("mechanic1").contentType("application/json").body(Map.of("clientRef", TestData.unique("x"), "urgency", "SOMEDAY",
                "lines", List.of())).post("/api/requests").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("urgency"));
    }

    @Test
    void aPumpDownRequestMustNameThePump() {
        String ref = TestData.unique("down");
        as("mechanic1").contentType("application/json").body(Map.of("clientRef", ref, "urgency", "PUMP_DOWN",
                "lines", List.of(Map.of("partNumber", "OB-CS-63", "quantity", 1)))).post("/api/requests")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("assetId"));
        // Nothing was kept under the reference: sent again with the pump, it is raised.
        raiseAs("mechanic1", Map.of("clientRef", ref, "assetId", pumpOf("mechanic1"), "urgency", "PUMP_DOWN",
                "lines", List.of(Map.of("partNumber", "OB-CS-63", "quantity", 1))));
    }

    @Test
    void approvingMoreThanAskedIsRefusedNamingTheLine() {
        long id = raiseAs("mechanic1", Map.of("clientRef", TestData.unique("over"), "urgency", "ROUTINE",
                "lines", List.of(Map.of("partNumber", "OB-OR-SET", "quantity", 2))));
        as("officer").contentType("application/json").body(Map.of("lines", List.of(Map.of("partNumber", "OB-OR-SET",
                "quantity", 3)))).post("/api/requests/" + id + "/approve")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("lines[0].quantity"));
        as("officer").get("/api/requests/" + id).then().statusCode(200).body("status", equalTo("RAISED"));
    }

    /** A working demo pump assigned to the mechanic (seed-data/pumps.csv). */
    static String pumpOf(String mechanic) {
        return as(mechanic).get("/api/pumps").then().extract().jsonPath().getString("find { it.status == 'WORKING' }.assetId");
    }
}
