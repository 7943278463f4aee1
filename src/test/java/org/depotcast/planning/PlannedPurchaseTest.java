package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.comparesEqualTo;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;

/** A store's purchase plan: put, change, take out, order one supplier's lines; scope and bad input refused. */
@QuarkusTest
class PlannedPurchaseTest {
    private static final String PROBLEM = "application/problem+json";
    private static final String PLANS = "/api/planning/planned-purchases";

    @Inject
    TestData data;

    private static io.restassured.response.ValidatableResponse put(String who, String location, String part, Object quantity) {
        return as(who).contentType("application/json").body(Map.of("quantity", quantity, "note", "from the board"))
                .put(PLANS + "/" + location + "/" + part).then();
    }

    @Test
    void aPlannedPartIsSharedChangedAndOrderedIntoOnePurchaseOrder() {
        String depot = data.depot();
        String first = data.part(UnitOfIssue.EACH);
        String second = data.part(UnitOfIssue.EACH);
        put("officer", depot, first, 20).statusCode(201).contentType("application/json")
                .body("partNumber", equalTo(first)).body("supplier", equalTo("Test Supplier")).body("addedBy", equalTo("officer"));
        put("officer", depot, first, 30).statusCode(200).body("quantity", comparesEqualTo(30.0f));
        put("officer", depot, second, 10).statusCode(201);
        as("lead").queryParam("location", depot).get(PLANS).then().statusCode(200)
                .body("partNumber", hasItem(first)).body("size()", equalTo(2));

        String number = TestData.unique("PO").toUpperCase();
        as("officer").contentType("application/json").body(Map.of("orderNumber", number, "supplier", "Test Supplier"))
                .post(PLANS + "/" + depot + "/orders").then().statusCode(201)
                .header("Location", org.hamcrest.Matchers.endsWith("/api/purchase-orders/" + number))
                .body("lines.partNumber", hasItem(second));
        as("officer").get("/api/purchase-orders/" + number).then().statusCode(200).body("destination", equalTo(depot))
                .body("lines.find { it.partNumber == '" + first + "' }.quantityOrdered", comparesEqualTo(30.0f));
        as("officer").queryParam("location", depot).get(PLANS).then().statusCode(200).body("$", empty());
        as("lead").queryParam("entityType", "planned_purchase").get("/api/audit").then().statusCode(200)
                .body("action", hasItem("PURCHASE_PLAN_ORDERED"));
    }

    @Test
    void anOrderThatCannotBePlacedLeavesThePlanAsItWas() {
        String depot = data.depot();
        String part = data.part(UnitOfIssue.EACH);
        put("officer", depot, part, 10).statusCode(201);
        String number = TestData.unique("PO").toUpperCase();
        as("officer").contentType("application/json").body(Map.of("orderNumber", number, "supplier", "Test Supplier",
                "expectedOn", "2020-01-01")).post(PLANS + "/" + depot + "/orders").then().statusCode(400)
                .contentType(PROBLEM).body("errors.field", hasItem("expectedOn"));
        as("officer").contentType("application/json").body(Map.of("orderNumber", number, "supplier", "Nobody Ltd"))
                .post(PLANS + "/" + depot + "/orders").then().statusCode(422).contentType(PROBLEM)
                .body("errors.field", hasItem("supplier"));
        as("officer").queryParam("location", depot).get(PLANS).then().body("partNumber", hasItem(part));
        as("officer").get("/api/purchase-orders/" + number).then().statusCode(404);
    }

    @Test
    void badQuantitiesUnknownPartsKitsAndOtherDepotsAreRefusedNamingTheField() {
        String depot = data.depot();
        String part = data.part(UnitOfIssue.EACH);
        put("officer", depot, part, 2.5).statusCode(400).contentType(PROBLEM)
                .body("type", org.hamcrest.Matchers.endsWith("invalid-input")).body("errors.field", hasItem("quantity"));
        put("officer", depot, part, 0).statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("quantity"));
        put("officer", depot, part, 5_000_000).statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("quantity"));
        put("officer", depot, "NO-SUCH-PART", 1).statusCode(404).contentType(PROBLEM)
                .body("type", org.hamcrest.Matchers.endsWith("not-found")).body("detail", org.hamcrest.Matchers.containsString("NO-SUCH-PART"));
        put("officer", "NO-SUCH-STORE", part, 1).statusCode(404).contentType(PROBLEM);
        put("officer", "KIT-M01", part, 1).statusCode(422).contentType(PROBLEM).body("errors.field", hasItem("location"));
        put("officer2", "DEP-TESHVALE", part, 1).statusCode(403).contentType(PROBLEM);
        put("mechanic1", "DEP-TESHVALE", part, 1).statusCode(403).contentType(PROBLEM);
        as("officer").delete(PLANS + "/" + depot + "/" + part).then().statusCode(404).contentType(PROBLEM)
                .body("detail", org.hamcrest.Matchers.containsString("planned purchase"));
        put("officer", depot, part, 1).statusCode(201);
        as("officer2").queryParam("location", depot).get(PLANS).then().statusCode(403).contentType(PROBLEM);
        as("officer2").get(PLANS).then().statusCode(200).body("location", not(hasItem(depot)));
        as("officer").delete(PLANS + "/" + depot + "/" + part).then().statusCode(204);
        as("officer").queryParam("location", depot).get(PLANS).then().body("$", empty());
    }
}
