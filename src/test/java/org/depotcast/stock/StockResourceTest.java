package org.depotcast.stock;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;

@QuarkusTest
class StockResourceTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;

    private Map<String, Object> move(String kind, String part, String from, String to, Object quantity) {
        java.util.HashMap<String, Object> body = new java.util.HashMap<>();
        body.put("kind", kind);
        body.put("partNumber", part);
        body.put("from", from);
        body.put("to", to);
        body.put("quantity", quantity);
        return body;
    }

    @Test
    void issueToKitMovesStockAndBalancesShowIt() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String kit = data.kit(depot, "mechanic1");
        data.stock(part, depot, 10);
        as("officer").contentType("application/json").body(move("ISSUE_TO_KIT", part, depot, kit, 3))
                .post("/api/stock/movements")
                .then().statusCode(201).body("kind", equalTo("ISSUE_TO_KIT")).body("actor", equalTo("officer"));
        as("officer").queryParam("location", depot).get("/api/stock/balances")
                .then().statusCode(200).body("find { it.partNumber == '" + part + "' }.onHand", equalTo(7.0f));
        as("officer").queryParam("location", kit).get("/api/stock/balances")
                .then().statusCode(200).body("find { it.partNumber == '" + part + "' }.onHand", equalTo(3.0f));
        as("officer").queryParam("part", part).queryParam("location", kit).get("/api/stock/movements")
                .then().statusCode(200).body("$", hasSize(1));
    }

    @Test
    void resendingWithTheSameKeyPostsOnce() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        data.stock(part, depot, 5);
        Map<String, Object> body = move("WRITE_OFF", part, depot, null, 2);
        body.put("idempotencyKey", TestData.unique("phone"));
        as("officer").contentType("application/json").body(body).post("/api/stock/movements").then().statusCode(201);
        as("officer").contentType("application/json").body(body).post("/api/stock/movements").then().statusCode(200);
        as("officer").queryParam("part", part).get("/api/stock/movements").then().body("$", hasSize(2)); // count + one write-off
        as("officer").queryParam("location", depot).get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onHand", equalTo(3.0f));
        body.put("quantity", 1);
        as("officer").contentType("application/json").body(body).post("/api/stock/movements")
                .then().statusCode(409).contentType(PROBLEM).body("errors.field", hasItem("idempotencyKey"));
    }

    @Test
    void badInputGetsProblemDetailsNamingTheField() {
        String part = data.part(UnitOfIssue.EACH);
        String metrePart = data.part(UnitOfIssue.METRE);
        String depot = data.depot();
        String other = data.depot();
        data.stock(part, depot, 2);
        data.stock(metrePart, depot, 2);
        expectProblem(move("TRANSFER", "NO-SUCH-PART", depot, other, 1), 422, "/problems/unknown-reference", "partNumber");
        expectProblem(move("TRANSFER", part, depot, "NO-SUCH-DEPOT", 1), 422, "/problems/unknown-reference", "to");
        expectProblem(move("TRANSFER", part, depot, other, -1), 400, "/problems/invalid-input", "quantity");
        expectProblem(move("TRANSFER", part, depot, other, 1.5), 400, "/problems/invalid-input", "quantity");
        expectProblem(move("TRANSFER", part, depot, other, 3), 422, "/problems/not-enough-stock", "quantity");
        expectProblem(move("TRANSFER", part, depot, depot, 1), 422, "/problems/rule-violated", "to");
        expectProblem(move("TRANSFER", part, depot, other, "three"), 400, "/problems/invalid-input", "quantity");
        expectProblem(move("SPIRIT_AWAY", part, depot, other, 1), 400, "/problems/invalid-input", "kind");
        expectProblem(move(null, part, depot, other, 1), 400, "/problems/invalid-input", "kind");
        // a measured part may move in fractions
        as("officer").contentType("application/json").body(move("TRANSFER", metrePart, depot, other, 1.25))
                .post("/api/stock/movements").then().statusCode(201);
        as("officer").contentType("application/json").body("{\"kind\": \"TRANSFER\", ")
                .post("/api/stock/movements")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("body"));
        as("officer").queryParam("limit", "many").get("/api/stock/movements")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("limit"));
        as("officer").queryParam("location", "NOWHERE").get("/api/stock/balances")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("location"));
        // nothing of the refused movements reached the books
        as("officer").queryParam("location", depot).get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onHand", equalTo(2.0f));
    }

    private void expectProblem(Map<String, Object> body, int status, String type, String field) {
        as("officer").contentType("application/json").body(body).post("/api/stock/movements")
                .then().statusCode(status).contentType(PROBLEM).body("type", equalTo(type))
                .body("errors.field", hasItem(field));
    }

    @Test
    void purchaseOrderReceiptsFeedStockAndCloseTheOrder() {
        String part = data.part(UnitOfIssue.EACH);
        String order = TestData.unique("PO");
        as("officer").contentType("application/json").body(Map.of("orderNumber", order, "supplier", "Test Supplier",
                        "destination", "CENTRAL", "orderedOn", "2026-11-01",
                        "lines", java.util.List.of(Map.of("partNumber", part, "quantity", 20))))
                .post("/api/purchase-orders").then().statusCode(201).body("status", equalTo("OPEN"));
        as("officer").queryParam("location", "CENTRAL").get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onOrder", equalTo(20.0f));
        as("officer").contentType("application/json").body(Map.of("partNumber", part, "quantity", 25))
                .post("/api/purchase-orders/" + order + "/receipts")
                .then().statusCode(422).contentType(PROBLEM);
        as("officer").contentType("application/json").body(Map.of("partNumber", part, "quantity", 20))
                .post("/api/purchase-orders/" + order + "/receipts").then().statusCode(201);
        as("officer").get("/api/purchase-orders/" + order).then().body("status", equalTo("CLOSED"));
        as("officer").queryParam("location", "CENTRAL").get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onHand", equalTo(20.0f));
    }

    @Test
    void signInIsRequiredAndRolesAreEnforced() {
        given().get("/api/stock/balances").then().statusCode(401);
        given().auth().preemptive().basic("officer", "wrong").get("/api/stock/balances").then().statusCode(401);
        as("lead").contentType("application/json").body(move("WRITE_OFF", "OB-CS-50", "CENTRAL", null, 1))
                .post("/api/stock/movements").then().statusCode(403).contentType(PROBLEM);
        given().get("/q/health").then().statusCode(200);
        given().get("/q/openapi").then().statusCode(200);
    }
}
