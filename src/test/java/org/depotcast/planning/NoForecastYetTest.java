package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;

/** Before the first forecast run, planning says to run the forecasts first instead of planning from no demand. */
@QuarkusTest
@TestProfile(EmptyProgrammeProfile.class)
class NoForecastYetTest {
    private static final String PROBLEM = "application/problem+json";

    private static RequestSpecification admin() {
        return given().auth().preemptive().basic("admin", EmptyProgrammeProfile.ADMIN_PASSWORD);
    }

    @Test
    void alertsPoliciesPurchasePlansAndSpendAskForAForecastRunFirst() {
        admin().contentType("text/csv").body("code,name,kind,parent_code,latitude,longitude,mechanic_username\n"
                + "CENTRAL,Central store,CENTRAL_STORE,,,,\nDEP-ONE,Depot one,DEPOT,CENTRAL,,,\n")
                .post("/api/locations/import").then().statusCode(200);
        for (String path : new String[]{"/api/planning/alerts", "/api/planning/alerts?location=DEP-ONE",
                "/api/planning/policies?location=DEP-ONE", "/api/planning/policies", "/api/planning/transfers/suggestions"}) {
            admin().get(path).then().statusCode(409).contentType(PROBLEM).body("type", equalTo("/problems/no-forecast-yet"))
                    .body("detail", containsString("run the forecasts first"));
        }
        admin().contentType("application/json").body(Map.of("budget", 1000)).post("/api/planning/purchase-plans")
                .then().statusCode(409).contentType(PROBLEM).body("type", equalTo("/problems/no-forecast-yet"));
        admin().contentType("application/json").body(Map.of("partNumber", "ANY", "location", "DEP-ONE",
                "action", "ACKNOWLEDGE")).post("/api/planning/alerts/actions").then().statusCode(409)
                .body("type", equalTo("/problems/no-forecast-yet"));
        long scenario = admin().contentType("application/json").body(Map.of("name", "baseline", "horizonYears", 2))
                .post("/api/spend/scenarios").then().statusCode(201).extract().jsonPath().getLong("id");
        admin().post("/api/spend/scenarios/" + scenario + "/runs").then().statusCode(409).contentType(PROBLEM)
                .body("type", equalTo("/problems/no-forecast-yet"));
        // Nothing was written: no plan, no run.
        admin().get("/api/planning/purchase-plans/1").then().statusCode(404);
        admin().get("/api/spend/runs/1").then().statusCode(404);
    }
}
