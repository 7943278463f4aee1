package org.depotcast.planning;

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
import static org.hamcrest.Matchers.endsWith;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** Transfers: dispatch safe to resend, listed and read, received in part, losses written off through the ledger. */
@QuarkusTest
class TransferLoopsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;
    @Inject
    StockQueryService stock;

    private void assertOnHand(int expected, String part, String location) {
        assertEquals(0, BigDecimal.valueOf(expected).compareTo(stock.onHand(part, location)),
                part + " at " + location + " is " + stock.onHand(part, location));
    }

    private static Map<String, Object> dispatch(String part, String from, String to, int quantity, String key) {
        Map<String, Object> body = new HashMap<>(Map.of("partNumber", part, "from", from, "to", to, "quantity", quantity));
        if (key != null) {
            body.put("idempotencyKey", key);
        }
        return body;
    }

    @Test
    void aDispatchSentAgainUnderItsKeyMovesStockOnce() {
        String part = data.part(UnitOfIssue.EACH), from = data.depot(), to = data.depot();
        data.stock(part, from, 10);
        String key = TestData.unique("dispatch");
        long id = as("officer").contentType("application/json").body(dispatch(part, from, to, 4, key))
                .post("/api/planning/transfers").then().statusCode(201)
                .header("Location", endsWith("/api/planning/transfers/" + as("officer").get("/api/planning/transfers")
                        .then().extract().jsonPath().getLong("find { it.idempotencyKey == '" + key + "' }.id")))
                .extract().jsonPath().getLong("id");
        as("officer").contentType("application/json").body(dispatch(part, from, to, 4, key))
                .post("/api/planning/transfers").then().statusCode(200).body("id", equalTo((int) id));
        as("officer").contentType("application/json").body(dispatch(part, from, to, 5, key))
                .post("/api/planning/transfers").then().statusCode(409).contentType(PROBLEM)
                .body("type", equalTo("/problems/conflict")).body("errors[0].field", equalTo("quantity"));
        as("officer").contentType("application/json").body(dispatch(part, from, "DEP-TESHVALE", 4, key))
                .post("/api/planning/transfers").then().statusCode(409).body("errors[0].field", equalTo("to"));
        assertOnHand(6, part, from);
        assertOnHand(4, part, "IN-TRANSIT");
        // The key is the sending account's: another account's same key is its own dispatch.
        as("admin").contentType("application/json").body(dispatch(part, from, to, 1, key))
                .post("/api/planning/transfers").then().statusCode(201).body("id", not(equalTo((int) id)));
        assertOnHand(5, part, from);
        as("lead").get("/api/stock/reconcile").then().body("consistent", equalTo(true));
    }

    @Test
    void transfersAreListedInTransitFirstAndReadOneByOne() {
        String part = data.part(UnitOfIssue.EACH), from = data.depot(), to = data.depot();
        data.stock(part, from, 10);
        long received = as("officer").contentType("application/json").body(dispatch(part, from, to, 2, null))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        as("officer").post("/api/planning/transfers/" + received + "/receive").then().statusCode(200);
        long moving = as("officer").contentType("application/json").body(dispatch(part, from, to, 3, null))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        List<Map<String, Object>> listed = as("officer").queryParam("from", from).queryParam("to", to)
                .get("/api/planning/transfers").then().statusCode(200).extract().jsonPath().getList("$");
        assertEquals(List.of((int) moving, (int) received), listed.stream().map(t -> t.get("id")).toList());
        assertEquals(List.of("IN_TRANSIT", "RECEIVED"), listed.stream().map(t -> t.get("status")).toList());
        as("officer").queryParam("to", to).queryParam("state", "RECEIVED").get("/api/planning/transfers").then()
                .body("id", equalTo(List.of((int) received)));
        as("officer").get("/api/planning/transfers/" + moving).then().statusCode(200).body("quantity", equalTo(3.0f))
                .body("outstanding", equalTo(3.0f)).body("from", equalTo(from));
        as("officer").get("/api/planning/transfers/99999999").then().statusCode(404).contentType(PROBLEM);
        as("officer2").get("/api/planning/transfers/" + moving).then().statusCode(403).contentType(PROBLEM);
        as("officer2").get("/api/planning/transfers").then().statusCode(200).body("id", not(hasItem((int) moving)));
        as("officer").queryParam("state", "LOST").get("/api/planning/transfers").then().statusCode(400).contentType(PROBLEM);
    }

    @Test
    void aReceiptSentAsPlainTextIsRefusedNotBookedAsEverythingArrived() {
        String part = data.part(UnitOfIssue.EACH), from = data.depot(), to = data.depot();
        data.stock(part, from, 10);
        long id = as("officer").contentType("application/json").body(dispatch(part, from, to, 6, null))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        // Two arrived; the client forgot the JSON type. Taking it for "no body" booked all six.
        as("officer").contentType("text/plain").body("{\"receivedQuantity\": 2}")
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(415).contentType(PROBLEM);
        as("officer").get("/api/planning/transfers/" + id).then().statusCode(200)
                .body("status", equalTo("IN_TRANSIT")).body("outstanding", equalTo(6.0f));
        assertOnHand(0, part, to);
    }

    @Test
    void aTransferIsReceivedInPartAndItsLossesWrittenOffThroughTheLedger() {
        String part = data.part(UnitOfIssue.EACH), from = data.depot(), to = data.depot();
        data.stock(part, from, 10);
        long id = as("officer").contentType("application/json").body(dispatch(part, from, to, 6, null))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 4, "idempotencyKey", "first-box"))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(200)
                .body("status", equalTo("IN_TRANSIT")).body("receivedQuantity", equalTo(4.0f))
                .body("outstanding", equalTo(2.0f));
        // The phone sends the same receipt again: nothing more is booked.
        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 4, "idempotencyKey", "first-box"))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(200).body("receivedQuantity", equalTo(4.0f));
        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 3, "idempotencyKey", "first-box"))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(409)
                .body("errors[0].field", equalTo("receivedQuantity"));
        assertOnHand(4, part, to);
        assertOnHand(2, part, "IN-TRANSIT");

        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 3))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(422).contentType(PROBLEM)
                .body("type", equalTo("/problems/rule-violated")).body("errors[0].field", equalTo("receivedQuantity"));
        as("officer").contentType("application/json").body(Map.of("writtenOffQuantity", 2))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(422)
                .body("errors[0].field", equalTo("writeOffReason"));
        as("officer2").contentType("application/json").body(Map.of("writtenOffQuantity", 2, "writeOffReason", "lost"))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(403);
        as("officer").contentType("application/json").body(Map.of("receivedQuantity", 1, "writtenOffQuantity", 1,
                        "writeOffReason", "box crushed on the road"))
                .post("/api/planning/transfers/" + id + "/receive").then().statusCode(200)
                .body("status", equalTo("RECEIVED")).body("receivedQuantity", equalTo(5.0f))
                .body("writtenOffQuantity", equalTo(1.0f)).body("outstanding", equalTo(0.0f))
                .body("receipts.size()", equalTo(2)).body("receipts[1].writeOffReason", equalTo("box crushed on the road"));
        assertOnHand(5, part, to);
        assertOnHand(0, part, "IN-TRANSIT");
        as("lead").queryParam("part", part).queryParam("location", "IN-TRANSIT").get("/api/stock/movements")
                .then().statusCode(200).body("find { it.kind == 'WRITE_OFF' }.quantity", equalTo(1.0f))
                .body("find { it.kind == 'WRITE_OFF' }.reason", org.hamcrest.Matchers.containsString("box crushed"));

        // Receiving a transfer that has ended answers it as it is.
        as("officer").post("/api/planning/transfers/" + id + "/receive").then().statusCode(200)
                .body("status", equalTo("RECEIVED")).body("receivedQuantity", equalTo(5.0f));
        assertOnHand(5, part, to);
        // Transit stock cannot be written off around its transfer.
        as("officer").contentType("application/json").body(Map.of("kind", "WRITE_OFF", "partNumber", part,
                "from", "IN-TRANSIT", "quantity", 1, "reason", "x")).post("/api/stock/movements").then().statusCode(422);
        as("lead").get("/api/stock/reconcile").then().body("consistent", equalTo(true));
    }
}
