package org.depotcast.requests;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;

/**
 * Role × endpoint group × own/other depot. officer2 runs DEP-PELLOWDENE only; mechanic1 carries KIT-M01 at
 * DEP-TESHVALE; officer runs the central store and all three depots. Every refusal is a 403 problem.
 */
@QuarkusTest
class AccessMatrixTest {

    @ParameterizedTest(name = "{0} {1} {2} -> {3}")
    @CsvSource({
            // stock, own and other depot
            "officer2, GET, /api/stock/balances?location=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/stock/balances?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/stock/movements?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/stock/counts/export?location=DEP-TESHVALE, 403",
            "mechanic1, GET, /api/stock/balances?location=KIT-M01, 200",
            "mechanic1, GET, /api/stock/balances?location=KIT-M02, 403",
            "mechanic1, GET, /api/stock/balances?location=DEP-TESHVALE, 403",
            "lead, GET, /api/stock/balances?location=DEP-TESHVALE, 200",
            // fleet and repairs
            "officer2, GET, /api/pumps?depot=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/pumps?depot=DEP-MARROWFORD, 403",
            "mechanic1, GET, /api/pumps?depot=DEP-TESHVALE, 403",
            // catalogue: everyone reads, mechanics and leads do not edit
            "mechanic1, GET, /api/parts, 200",
            "mechanic1, POST, /api/parts, 403",
            "lead, POST, /api/parts, 403",
            // purchase orders and plans
            "mechanic1, POST, /api/purchase-orders, 403",
            "officer2, GET, /api/planning/purchase-plans/1, 403",
            "officer2, GET, /api/planning/policies, 403",
            "officer2, GET, /api/planning/policies?location=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/planning/policies?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/planning/alerts?location=DEP-TESHVALE, 403",
            // forecasts: programme-wide only for the lead and the central store
            "officer2, GET, /api/forecast/parts/OB-CS-50, 403",
            "mechanic1, GET, /api/forecast/locations/DEP-TESHVALE, 403",
            // requests
            "officer, POST, /api/requests, 403",
            "mechanic1, POST, /api/requests/1/approve, 403",
            "mechanic1, POST, /api/requests/1/issue, 403",
            // accounts and audit
            "officer, GET, /api/accounts, 403",
            "lead, GET, /api/accounts, 403",
            "admin, GET, /api/accounts, 200",
            "officer, GET, /api/audit, 403",
            "mechanic1, GET, /api/audit, 403",
            "lead, GET, /api/audit, 200",
            "lead, GET, /api/audit/export, 200",
    })
    void accessIsScoped(String user, String method, String path, int status) {
        var request = as(user).contentType("application/json").body("{}");
        var response = method.equals("GET") ? request.get(path) : request.post(path);
        response.then().statusCode(status);
        if (status == 403) {
            response.then().contentType("application/problem+json");
        }
    }

    @ParameterizedTest(name = "anonymous {0} -> 401")
    @CsvSource({"/api/parts", "/api/stock/balances", "/api/requests", "/api/audit", "/api/accounts"})
    void everyApiNeedsSignIn(String path) {
        given().get(path).then().statusCode(401);
    }
}
