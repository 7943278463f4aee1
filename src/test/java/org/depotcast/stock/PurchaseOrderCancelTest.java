package org.depotcast.stock;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.nullValue;

/** Cancelling an order answers what was done: the cancelled order with its lines. */
@QuarkusTest
class PurchaseOrderCancelTest {
    @Inject
    TestData data;

    @Test
    void cancellingAnOpenOrderAnswersTheCancelledOrder() {
        String part = data.part(UnitOfIssue.EACH);
        String order = TestData.unique("PO");
        as("officer").contentType("application/json").body(Map.of("orderNumber", order, "supplier", "Test Supplier",
                        "destination", "CENTRAL", "orderedOn", "2026-11-01",
                        "lines", List.of(Map.of("partNumber", part, "quantity", 12))))
                .post("/api/purchase-orders").then().statusCode(201);
        as("officer").queryParam("location", "CENTRAL").get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onOrder", equalTo(12.0f));
        as("officer").post("/api/purchase-orders/" + order + "/cancel").then().statusCode(200)
                .body("status", equalTo("CANCELLED")).body("lines[0].partNumber", equalTo(part))
                .body("lines[0].outstanding", equalTo(12.0f));
        // a second cancel is refused, naming the order; nothing stays on order
        as("officer").post("/api/purchase-orders/" + order + "/cancel").then().statusCode(422)
                .contentType("application/problem+json").body("type", equalTo("/problems/rule-violated"))
                .body("errors[0].field", equalTo("orderNumber"));
        as("officer").queryParam("location", "CENTRAL").get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }", nullValue());
    }
}
