package org.depotcast;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;

/** The demo programme loads whole on first start: fleet, history, stock and open orders, and the books balance. */
@QuarkusTest
class DemoProgrammeTest {
    @Test
    void demoProgrammeIsLoaded() {
        as("lead").get("/api/locations").then().statusCode(200).body("size()", greaterThanOrEqualTo(16));
        as("lead").get("/api/pumps").then().statusCode(200).body("size()", greaterThanOrEqualTo(1200));
        as("lead").get("/api/pump-models").then().statusCode(200).body("size()", greaterThanOrEqualTo(3));
        as("lead").queryParam("asset", "OB-00010").get("/api/repairs").then().statusCode(200);
        as("lead").queryParam("status", "OPEN").get("/api/purchase-orders").then().body("size()", greaterThanOrEqualTo(3));
        as("lead").get("/api/stock/reconcile").then().statusCode(200).body("consistent", equalTo(true));
        for (String user : new String[]{"officer", "lead", "admin", "mechanic1", "mechanic12"}) {
            as(user).get("/api/parts").then().statusCode(200);
        }
    }
}
