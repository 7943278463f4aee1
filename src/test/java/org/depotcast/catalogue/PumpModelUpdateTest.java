package org.depotcast.catalogue;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.equalTo;

/** A pump model sent again with its bill of materials unchanged, or with lines changed, added and removed. */
@QuarkusTest
class PumpModelUpdateTest {
    @Inject
    TestData data;

    private static Map<String, Object> model(String code, List<Map<String, Object>> bom) {
        return Map.of("code", code, "name", "test model " + code, "serviceIntervalHours", 2000, "bom", bom);
    }

    private static Map<String, Object> line(String part, String basis, int quantity, int kit) {
        return Map.of("partNumber", part, "basis", basis, "quantity", quantity, "serviceKitQuantity", kit);
    }

    @Test
    void theUnchangedBodyPutAgainAnswersTheSameModel() {
        String seal = data.part(UnitOfIssue.EACH);
        String rod = data.part(UnitOfIssue.EACH);
        String code = TestData.unique("PM").toUpperCase();
        Map<String, Object> body = model(code, List.of(line(seal, "PER_PUMP", 2, 2), line(rod, "PER_METRE", 1, 0)));
        as("officer").contentType("application/json").body(body).post("/api/pump-models").then().statusCode(201);
        as("officer").contentType("application/json").body(body).put("/api/pump-models/" + code)
                .then().statusCode(200).body("bom.partNumber", contains(seal, rod));
        as("officer").get("/api/pump-models/" + code).then().body("bom.quantity", contains(2.0f, 1.0f));
    }

    @Test
    void linesChangedAddedAndRemovedInOneUpdate() {
        String seal = data.part(UnitOfIssue.EACH);
        String rod = data.part(UnitOfIssue.EACH);
        String valve = data.part(UnitOfIssue.EACH);
        String code = TestData.unique("PM").toUpperCase();
        as("officer").contentType("application/json")
                .body(model(code, List.of(line(seal, "PER_PUMP", 2, 2), line(rod, "PER_METRE", 1, 0))))
                .post("/api/pump-models").then().statusCode(201);
        as("officer").contentType("application/json")
                .body(model(code, List.of(line(valve, "PER_PUMP", 1, 1), line(seal, "PER_PUMP", 3, 1))))
                .put("/api/pump-models/" + code).then().statusCode(200);
        as("officer").get("/api/pump-models/" + code).then().statusCode(200)
                .body("bom.size()", equalTo(2))
                .body("bom.find { it.partNumber == '" + seal + "' }.quantity", equalTo(3.0f))
                .body("bom.find { it.partNumber == '" + seal + "' }.serviceKitQuantity", equalTo(1.0f))
                .body("bom.find { it.partNumber == '" + valve + "' }.basis", equalTo("PER_PUMP"))
                .body("bom.find { it.partNumber == '" + rod + "' }", equalTo(null));
    }
}
