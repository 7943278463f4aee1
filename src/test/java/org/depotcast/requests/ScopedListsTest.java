package org.depotcast.requests;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.oneOf;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Lists, searches and exports leak nothing from depots outside the caller's scope. */
@QuarkusTest
class ScopedListsTest {
    @Test
    void officerListsShowOnlyTheirDepot() {
        as("officer2").get("/api/stock/balances").then().statusCode(200)
                .body("locationCode", everyItem(oneOf("DEP-PELLOWDENE", "KIT-M09", "KIT-M10", "KIT-M11", "KIT-M12")));
        String counts = as("officer2").get("/api/stock/counts/export").then().statusCode(200).extract().asString();
        assertFalse(counts.contains("DEP-TESHVALE") || counts.contains("CENTRAL,"));
        List<String> repairDepots = as("officer2").get("/api/repairs?limit=500").then().statusCode(200)
                .extract().jsonPath().getList("depotCode");
        assertTrue(repairDepots.stream().allMatch("DEP-PELLOWDENE"::equals));
        String repairs = as("officer2").get("/api/repairs/export").then().statusCode(200).extract().asString();
        assertFalse(repairs.isBlank());
        as("officer2").get("/api/planning/alerts").then().statusCode(200).body("locationCode", everyItem(equalTo("DEP-PELLOWDENE")));
        as("officer2").get("/api/purchase-orders").then().statusCode(200).body("destination", everyItem(equalTo("DEP-PELLOWDENE")));
    }

    @Test
    void mechanicListsShowOnlyTheirKitAndPumps() {
        as("mechanic1").get("/api/stock/balances").then().statusCode(200).body("locationCode", everyItem(equalTo("KIT-M01")));
        as("mechanic1").get("/api/stock/movements").then().statusCode(200);
        as("mechanic1").get("/api/requests").then().statusCode(200).body("mechanic", everyItem(equalTo("mechanic1")));
        as("mechanic1").get("/api/repairs?limit=100").then().statusCode(200).body("assetId.size()", org.hamcrest.Matchers.greaterThan(0));
    }
}
