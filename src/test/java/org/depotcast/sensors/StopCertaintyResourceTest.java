package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The certainty a "probably down" flag needs is a programme setting: 0.5 until the lead changes it, 0.5 to 0.99,
 * refused outside naming the field, audited, changed only by the lead or an admin. Each test puts 0.5 back.
 */
@QuarkusTest
class StopCertaintyResourceTest {
    private static final String PATH = "/api/sensors/stop-certainty";
    private static final String PROBLEM = "application/problem+json";

    private static double inForce() {
        return as("officer").get(PATH).then().statusCode(200).body("defaultLeastProbability", equalTo(0.5f))
                .extract().jsonPath().getDouble("leastProbability");
    }

    private static io.restassured.response.ValidatableResponse set(String user, Object value) {
        return as(user).contentType("application/json").body(java.util.Collections.singletonMap("leastProbability", value))
                .put(PATH).then();
    }

    @Test
    void theDefaultIsAHalfAndTheLeadChangesItWithTheChangeAudited() {
        assertEquals(0.5, inForce(), 1e-12);
        try {
            set("lead", 0.8).statusCode(200).body("leastProbability", equalTo(0.8f));
            assertEquals(0.8, inForce(), 1e-12);
            as("mechanic1").get(PATH).then().statusCode(200).body("leastProbability", equalTo(0.8f));
            JsonPath audit = as("lead").queryParam("entityType", "programme_setting").get("/api/audit").then()
                    .statusCode(200).extract().jsonPath();
            Map<String, Object> last = audit.getMap("find { it.action == 'STOP_CERTAINTY_SET' }");
            assertEquals("lead", last.get("actor"));
            assertEquals(StopCertaintyService.SETTING, last.get("entityKey"));
            assertEquals("{\"leastProbability\":0.5}", last.get("beforeJson"));
            assertEquals("{\"leastProbability\":0.8}", last.get("afterJson"));
            set("admin", 0.99).statusCode(200);
            assertEquals(0.99, inForce(), 1e-12);
        } finally {
            set("lead", 0.5).statusCode(200);
        }
        assertEquals(0.5, inForce(), 1e-12);
    }

    @Test
    void aCertaintyOutsideAHalfTo99PerCentIsRefusedNamingTheFieldAndChangesNothing() {
        int audited = changesAudited();
        // 80 % typed as 80, or 0.49, or nothing: each a 400 problem naming the field, and the setting stays 0.5.
        for (Object wrong : new Object[]{80, 0.49, 0.995, 1, null}) {
            set("lead", wrong).statusCode(400).contentType(PROBLEM)
                    .body("errors[0].field", equalTo("leastProbability"))
                    .body("errors[0].message", equalTo(wrong == null ? "is required"
                            : "must be a fraction from 0.5 to 0.99 (50 % to 99 %)"));
        }
        as("lead").contentType("application/json").body("{\"leastProbability\": \"high\"}").put(PATH).then()
                .statusCode(400).contentType(PROBLEM);
        assertEquals(0.5, inForce(), 1e-12);
        assertEquals(audited, changesAudited(), "a refusal is no change");
    }

    private static int changesAudited() {
        List<Object> changes = as("lead").queryParam("entityType", "programme_setting").queryParam("limit", 10000)
                .get("/api/audit").then().statusCode(200).extract().jsonPath()
                .getList("findAll { it.action == 'STOP_CERTAINTY_SET' }");
        return changes.size();
    }

    @Test
    void onlyTheLeadOrAnAdminChangesIt() {
        set("officer", 0.9).statusCode(403);
        set("officer2", 0.9).statusCode(403);
        set("mechanic1", 0.9).statusCode(403);
        given().contentType("application/json").body(Map.of("leastProbability", 0.9)).put(PATH).then().statusCode(401);
        given().get(PATH).then().statusCode(401);
        assertEquals(0.5, inForce(), 1e-12);
    }
}
