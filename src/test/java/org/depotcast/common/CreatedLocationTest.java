package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.ExtractableResponse;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;

/**
 * A 201 says where the new thing can be read (RFC 9110 §15.3.2): the four creations that answered without a Location
 * (an account, an alert action, a planned purchase, a usage reading) now carry one, and reading it shows the thing.
 */
@QuarkusTest
class CreatedLocationTest {
    @Inject
    ForecastRunService runs;
    @Inject
    TestData data;

    /** The Location of a 201, as a path the same caller can read. */
    private static String location(ExtractableResponse<Response> created) {
        assertEquals(201, created.statusCode());
        String header = created.header("Location");
        assertNotNull(header, "a 201 carries a Location");
        URI uri = URI.create(header);
        return uri.getRawPath() + (uri.getRawQuery() == null ? "" : "?" + uri.getRawQuery());
    }

    @Test
    void aNewAccountIsReadAtItsLocation() {
        String name = TestData.unique("acct").toLowerCase(java.util.Locale.ROOT);
        String at = location(as("admin").contentType("application/json").body(Map.of("username", name,
                "password", "long-enough-1", "roles", List.of("stores-officer"), "locationCodes", List.of("DEP-TESHVALE")))
                .post("/api/accounts").then().extract());
        as("admin").get(at).then().statusCode(200).body("username", equalTo(name))
                .body("locationCodes", hasItem("DEP-TESHVALE"));
        as("admin").get("/api/accounts/no-such-account").then().statusCode(404);
    }

    @Test
    void anAlertActionIsReadAtItsLocation() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        List<Map<String, Object>> alerts = as("officer").queryParam("location", "DEP-TESHVALE")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
        assertFalse(alerts.isEmpty(), "the demo depot has alerts after a forecast run");
        Map<String, Object> target = alerts.get(0);
        Map<String, Object> body = new HashMap<>();
        body.put("partNumber", target.get("partNumber"));
        body.put("location", "DEP-TESHVALE");
        body.put("action", "ACKNOWLEDGE");
        String at = location(as("officer").contentType("application/json").body(body)
                .post("/api/planning/alerts/actions").then().extract());
        as("officer").get(at).then().statusCode(200).body("action", equalTo("ACKNOWLEDGE"))
                .body("actor", equalTo("officer"));
        // officer2 keeps DEP-PELLOWDENE only, so may not read it.
        as("officer2").get(at).then().statusCode(403);
    }

    @Test
    void aPlannedPurchaseIsReadInTheStoresPlan() {
        String depot = data.depot();
        String part = data.part(org.depotcast.catalogue.UnitOfIssue.EACH);
        String at = location(as("officer").contentType("application/json").body(Map.of("quantity", 4))
                .put("/api/planning/planned-purchases/" + depot + "/" + part).then().extract());
        as("officer").get(at).then().statusCode(200).body("partNumber", hasItem(part));
    }

    @Test
    void aUsageReadingIsReadInThePumpsHistory() {
        String asset = TestData.unique("PUMP");
        as("officer").contentType("application/json").body(Map.of("assetId", asset, "modelCode", "RB-2", "depthM", 30,
                "installedOn", "2024-05-01", "depotCode", "DEP-TESHVALE", "assignedMechanic", "mechanic1"))
                .post("/api/pumps").then().statusCode(201);
        String at = location(as("mechanic1").contentType("application/json")
                .body(Map.of("readOn", "2026-11-01", "hoursPerDay", 6.5, "source", "MEASURED"))
                .post("/api/pumps/" + asset + "/usage").then().extract());
        as("mechanic1").get(at).then().statusCode(200).body("readOn", hasItem("2026-11-01"));
    }
}
