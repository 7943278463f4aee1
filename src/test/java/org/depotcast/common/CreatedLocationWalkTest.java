package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.ExtractableResponse;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

/**
 * Every endpoint that answers 201 says where the new thing is read (RFC 9110 §15.3.2), and the same caller reads it
 * there: this walks the creations on the demo programme one by one (an account, an alert action, a planned purchase
 * and a usage reading are walked in {@link CreatedLocationTest}), and each read must show the thing just made.
 */
@QuarkusTest
class CreatedLocationWalkTest {
    private static final String JSON = "application/json";

    @Inject
    TestData data;
    @Inject
    ForecastRunService runs;

    /** The Location of a 201, as a path the same caller can read. */
    private static String location(ExtractableResponse<Response> created) {
        assertEquals(201, created.statusCode(), () -> "expected 201, got " + created.body().asString());
        String header = created.header("Location");
        assertNotNull(header, "a 201 carries a Location");
        URI uri = URI.create(header);
        return uri.getRawPath() + (uri.getRawQuery() == null ? "" : "?" + uri.getRawQuery());
    }

    @Test
    void catalogueAndLocationCreationsAreReadAtTheirLocations() {
        String partNumber = TestData.unique("WP").toUpperCase(Locale.ROOT);
        String part = location(as("officer").contentType(JSON).body(Map.ofEntries(Map.entry("partNumber", partNumber),
                Map.entry("description", "walked part"), Map.entry("family", "CUP_SEAL"), Map.entry("unitOfIssue", "EACH"),
                Map.entry("packSize", 1), Map.entry("minOrderQty", 1), Map.entry("unitCost", 3), Map.entry("currency", "USD"),
                Map.entry("supplier", "Test Supplier"), Map.entry("leadTimeDays", 20), Map.entry("critical", false)))
                .post("/api/parts").then().extract());
        as("officer").get(part).then().statusCode(200).body("partNumber", equalTo(partNumber));

        String modelCode = TestData.unique("WM").toUpperCase(Locale.ROOT);
        String model = location(as("officer").contentType(JSON).body(Map.of("code", modelCode, "name", "walked model",
                        "serviceIntervalHours", 1500, "bom", List.of(Map.of("partNumber", partNumber, "basis", "PER_PUMP",
                                "quantity", 1))))
                .post("/api/pump-models").then().extract());
        as("officer").get(model).then().statusCode(200).body("code", equalTo(modelCode));

        String code = TestData.unique("WDEP").toUpperCase(Locale.ROOT);
        String depot = location(as("admin").contentType(JSON).body(Map.of("code", code, "name", "walked depot",
                "kind", "DEPOT", "parentCode", "CENTRAL")).post("/api/locations").then().extract());
        as("admin").get(depot).then().statusCode(200).body("code", equalTo(code));
    }

    @Test
    void fleetRepairAndRequestCreationsAreReadAtTheirLocations() {
        String asset = TestData.unique("WPUMP");
        String pump = location(as("officer").contentType(JSON).body(Map.of("assetId", asset, "modelCode", "RB-2",
                "depthM", 30, "installedOn", "2024-05-01", "depotCode", "DEP-TESHVALE", "assignedMechanic", "mechanic1"))
                .post("/api/pumps").then().extract());
        as("officer").get(pump).then().statusCode(200).body("assetId", equalTo(asset));

        String ref = TestData.unique("WREP");
        String repair = location(as("mechanic1").contentType(JSON).body(Map.of("repairRef", ref, "assetId", asset,
                "kind", "BREAKDOWN", "reportedOn", "2026-11-01")).post("/api/repairs").then().extract());
        as("mechanic1").get(repair).then().statusCode(200).body("repairRef", equalTo(ref));

        String part = data.part(UnitOfIssue.EACH);
        String clientRef = TestData.unique("WREQ");
        String request = location(as("mechanic1").contentType(JSON).body(Map.of("clientRef", clientRef,
                "urgency", "ROUTINE", "lines", List.of(Map.of("partNumber", part, "quantity", 1))))
                .post("/api/requests").then().extract());
        as("mechanic1").get(request).then().statusCode(200).body("clientRef", equalTo(clientRef));
    }

    @Test
    void stockCreationsAreReadAtTheirLocations() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String other = data.depot();
        data.stock(part, depot, 5);
        String movement = location(as("officer").contentType(JSON).body(Map.of("kind", "WRITE_OFF", "partNumber", part,
                "from", depot, "quantity", 1, "reason", "walked")).post("/api/stock/movements").then().extract());
        as("officer").get(movement).then().statusCode(200).body("partNumber", equalTo(part))
                .body("kind", equalTo("WRITE_OFF"));

        String transfer = location(as("officer").contentType(JSON).body(Map.of("partNumber", part, "from", depot,
                "to", other, "quantity", 2)).post("/api/planning/transfers").then().extract());
        as("officer").get(transfer).then().statusCode(200).body("partNumber", equalTo(part)).body("to", equalTo(other));

        String number = TestData.unique("WPO").toUpperCase(Locale.ROOT);
        String order = location(as("officer").contentType(JSON).body(Map.of("orderNumber", number,
                "supplier", "Test Supplier", "destination", depot, "orderedOn", "2026-11-01",
                "lines", List.of(Map.of("partNumber", part, "quantity", 10)))).post("/api/purchase-orders").then().extract());
        as("officer").get(order).then().statusCode(200).body("orderNumber", equalTo(number));

        as("officer").contentType(JSON).body(Map.of("quantity", 10))
                .put("/api/planning/planned-purchases/" + depot + "/" + part).then().statusCode(201);
        String planned = TestData.unique("WPP").toUpperCase(Locale.ROOT);
        String ordered = location(as("officer").contentType(JSON).body(Map.of("orderNumber", planned,
                "supplier", "Test Supplier")).post("/api/planning/planned-purchases/" + depot + "/orders").then().extract());
        as("officer").get(ordered).then().statusCode(200).body("orderNumber", equalTo(planned))
                .body("lines.partNumber", hasItem(part));
    }

    @Test
    void planningAndSpendCreationsAreReadAtTheirLocations() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        ExtractableResponse<Response> proposed = as("lead").contentType(JSON).body(Map.of("budget", 1000))
                .post("/api/planning/purchase-plans").then().extract();
        String plan = location(proposed);
        as("lead").get(plan).then().statusCode(200).body("id", equalTo(proposed.jsonPath().getInt("id")))
                .body("status", equalTo("PROPOSED"));

        String name = TestData.unique("walked scenario");
        String scenario = location(as("lead").contentType(JSON).body(Map.of("name", name, "horizonYears", 2))
                .post("/api/spend/scenarios").then().extract());
        as("lead").get(scenario).then().statusCode(200).body("name", equalTo(name));
    }
}
