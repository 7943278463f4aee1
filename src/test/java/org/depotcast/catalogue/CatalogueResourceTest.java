package org.depotcast.catalogue;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasSize;

@QuarkusTest
public class CatalogueResourceTest {
    private static final String PROBLEM = "application/problem+json";

    public static Map<String, Object> part(String number) {
        Map<String, Object> body = new HashMap<>();
        body.put("partNumber", number);
        body.put("description", "Cup seal for tests");
        body.put("family", "CUP_SEAL");
        body.put("unitOfIssue", "EACH");
        body.put("packSize", 10);
        body.put("minOrderQty", 20);
        body.put("unitCost", 1.25);
        body.put("currency", "USD");
        body.put("supplier", "Test Supplier");
        body.put("leadTimeDays", 30);
        body.put("critical", true);
        return body;
    }

    @Test
    void createReadUpdatePart() {
        String number = TestData.unique("CP").toUpperCase();
        as("officer").contentType("application/json").body(part(number)).post("/api/parts")
                .then().statusCode(201).header("Location", containsString("/api/parts/" + number))
                .body("version", equalTo(0));
        as("mechanic1").get("/api/parts/" + number).then().statusCode(200).body("critical", equalTo(true));
        Map<String, Object> changed = part(number);
        changed.put("unitCost", 1.40);
        changed.put("version", 0);
        as("officer").contentType("application/json").body(changed).put("/api/parts/" + number)
                .then().statusCode(200).body("unitCost", equalTo(1.40f)).body("version", equalTo(1));
        // a second edit from the same stale copy is refused
        as("officer").contentType("application/json").body(changed).put("/api/parts/" + number)
                .then().statusCode(409).contentType(PROBLEM).body("errors.field", hasItem("version"));
        as("officer").contentType("application/json").body(part(number)).post("/api/parts")
                .then().statusCode(409).contentType(PROBLEM);
        as("officer").queryParam("family", "CUP_SEAL").get("/api/parts")
                .then().statusCode(200).body("partNumber", hasItems(number, "OB-CS-50"));
    }

    @Test
    void invalidPartsAreRefusedWithEveryField() {
        Map<String, Object> bad = part("BAD PART NUMBER");
        bad.put("packSize", 0);
        bad.put("currency", "dollars");
        bad.put("unitCost", -1);
        as("officer").contentType("application/json").body(bad).post("/api/parts")
                .then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItems("partNumber", "packSize", "currency", "unitCost"));
        as("officer").queryParam("family", "WIDGET").get("/api/parts")
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("family"));
        as("officer").get("/api/parts/NOT-A-PART").then().statusCode(404).contentType(PROBLEM);
        as("mechanic1").contentType("application/json").body(part("MECH-1")).post("/api/parts")
                .then().statusCode(403).contentType(PROBLEM);
    }

    @Test
    void pumpModelsCarryTheirBillOfMaterials() {
        as("officer").get("/api/pump-models/DR-3").then().statusCode(200)
                .body("serviceIntervalHours", equalTo(9125))
                .body("bom.find { it.partNumber == 'OB-ROD-16' }.basis", equalTo("PER_METRE"));
        String code = TestData.unique("PM");
        as("admin").contentType("application/json").body(Map.of("code", code, "name", "Test model",
                        "serviceIntervalHours", 9125, "bom", List.of(
                                Map.of("partNumber", "OB-CS-50", "basis", "PER_PUMP", "quantity", 2, "serviceKitQuantity", 2),
                                Map.of("partNumber", "OB-ROD-12", "basis", "PER_METRE", "quantity", 0.3334))))
                .post("/api/pump-models").then().statusCode(201).body("bom", hasSize(2));
        as("admin").contentType("application/json").body(Map.of("code", TestData.unique("PM"), "name", "Broken",
                        "serviceIntervalHours", 9125, "bom", List.of(Map.of("partNumber", "NOPE", "basis", "PER_PUMP", "quantity", 1))))
                .post("/api/pump-models").then().statusCode(422).contentType(PROBLEM)
                .body("errors[0].field", equalTo("bom[0].partNumber"));
    }

    @Test
    void partsExportReadsBackThroughImport() {
        String csv = as("officer").get("/api/parts/export").then().statusCode(200).extract().asString();
        as("officer").contentType("text/csv").body(csv).post("/api/parts/import")
                .then().statusCode(200).body("rowsImported", equalTo(csv.strip().split("\n").length - 1));
    }
}
