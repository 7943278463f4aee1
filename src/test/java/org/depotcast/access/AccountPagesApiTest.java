package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.UUID;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** What the accounts page relies on: the list with locations and kit, roles changed, nothing half-made. */
@QuarkusTest
class AccountPagesApiTest {
    private static final String PROBLEM = "application/problem+json";

    private static String name() {
        return "acct-" + UUID.randomUUID().toString().substring(0, 8);
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> listed(String username) {
        return as("admin").get("/api/accounts").then().statusCode(200).extract().jsonPath().<Map<String, Object>>getList("$")
                .stream().filter(a -> username.equals(a.get("username"))).findFirst().orElse(null);
    }

    @Test
    void theListCarriesAssignedLocationsAndTheKit() {
        String officer = name();
        as("admin").contentType("application/json").body(Map.of("username", officer, "password", "long-enough-1",
                "roles", List.of("stores-officer"), "locationCodes", List.of("DEP-TESHVALE", "DEP-PELLOWDENE")))
                .post("/api/accounts").then().statusCode(201).body("locationCodes", hasItem("DEP-TESHVALE"));
        Map<String, Object> row = listed(officer);
        assertEquals(List.of("DEP-PELLOWDENE", "DEP-TESHVALE"), ((List<?>) row.get("locationCodes")).stream().sorted().toList());
        assertEquals(List.of("stores-officer"), row.get("roles"));
        Map<String, Object> mechanic1 = listed("mechanic1");
        assertEquals("KIT-M01", mechanic1.get("kitCode"));
    }

    @Test
    void anUnknownLocationLeavesNoAccountBehind() {
        String username = name();
        as("admin").contentType("application/json").body(Map.of("username", username, "password", "long-enough-1",
                "roles", List.of("stores-officer"), "locationCodes", List.of("DEP-NOWHERE")))
                .post("/api/accounts").then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("locationCodes"));
        assertEquals(null, listed(username));
    }

    @Test
    void rolesAreReplacedButAnAdminKeepsTheirOwn() {
        String username = name();
        as("admin").contentType("application/json").body(Map.of("username", username, "password", "long-enough-1",
                "roles", List.of("mechanic"))).post("/api/accounts").then().statusCode(201);
        as("admin").contentType("application/json").body(Map.of("roles", List.of("stores-officer", "programme-lead")))
                .put("/api/accounts/" + username + "/roles").then().statusCode(200)
                .body("roles", equalTo(List.of("programme-lead", "stores-officer")));
        assertTrue(((List<?>) listed(username).get("roles")).contains("programme-lead"));
        as("admin").contentType("application/json").body(Map.of("roles", List.of("wizard")))
                .put("/api/accounts/" + username + "/roles").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("roles"));
        as("admin").contentType("application/json").body(Map.of("roles", List.of()))
                .put("/api/accounts/" + username + "/roles").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("roles"));
        as("admin").contentType("application/json").body(Map.of("roles", List.of("mechanic")))
                .put("/api/accounts/admin/roles").then().statusCode(422).contentType(PROBLEM)
                .body("errors[0].field", equalTo("roles"));
        as("admin").contentType("application/json").body(Map.of("roles", List.of("mechanic")))
                .put("/api/accounts/no-such-account/roles").then().statusCode(404).contentType(PROBLEM);
        as("lead").contentType("application/json").body(Map.of("roles", List.of("admin")))
                .put("/api/accounts/" + username + "/roles").then().statusCode(403).contentType(PROBLEM);
    }
}
