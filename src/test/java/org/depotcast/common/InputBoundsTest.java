package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.ValidatableResponse;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

/** Numbers and dates past their documented bounds are refused before any work, with the field named. */
@QuarkusTest
class InputBoundsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;

    private ValidatableResponse postJson(String user, String path, String json) {
        return as(user).contentType("application/json").body(json).post(path).then();
    }

    private static void refused(ValidatableResponse answer, int status, String type, String field) {
        answer.statusCode(status).contentType(PROBLEM).body("type", equalTo(type)).body("errors.field", hasItem(field));
    }

    private String movement(String part, String depot, String quantity, String occurredAt) {
        return "{\"kind\": \"WRITE_OFF\", \"partNumber\": \"" + part + "\", \"from\": \"" + depot + "\", \"quantity\": "
                + quantity + (occurredAt == null ? "" : ", \"occurredAt\": \"" + occurredAt + "\"") + "}";
    }

    private void balanceIs(String part, String depot, float onHand) {
        as("officer").queryParam("location", depot).get("/api/stock/balances")
                .then().body("find { it.partNumber == '" + part + "' }.onHand", equalTo(onHand));
    }

    @Test
    void hugeAndTinyQuantitiesAreRefusedQuicklyNamingTheField() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        data.stock(part, depot, 5);
        assertTimeoutPreemptively(Duration.ofSeconds(30), () -> {
            for (String quantity : new String[]{"1e3000000", "-1e3000000", "1e-3000000", "\"1e3000000\"", "1e400",
                    "1e12", "1000001", "1e7", "9".repeat(5000)}) {
                refused(postJson("officer", "/api/stock/movements", movement(part, depot, quantity, null)),
                        400, "/problems/invalid-input", "quantity");
            }
        });
        balanceIs(part, depot, 5.0f);
    }

    @Test
    void infinityAndNanAreRefusedForNumbersTakenAsDoubles() {
        for (String mean : new String[]{"1e400", "-1e400", "\"NaN\"", "\"Infinity\"", "1e9", "true", "[1]"}) {
            refused(postJson("officer", "/api/policy/reorder-point",
                    "{\"leadTimeDemandMean\": " + mean + ", \"serviceLevel\": 0.95}"), 400, "/problems/invalid-input",
                    "leadTimeDemandMean");
        }
        refused(postJson("officer", "/api/policy/reorder-point",
                "{\"leadTimeDemandMean\": 4, \"serviceLevel\": 0.95, \"variance\": 1e400, \"distribution\": \"normal\"}"),
                400, "/problems/invalid-input", "variance");
        refused(postJson("officer", "/api/policy/reorder-point",
                "{\"leadTimeDemandMean\": 4, \"serviceLevel\": 1}"), 400, "/problems/invalid-input", "serviceLevel");
    }

    @Test
    void reorderPointsOfTheLargestAllowedMeanComeQuickly() {
        assertTimeoutPreemptively(Duration.ofSeconds(30), () -> {
            for (String body : new String[]{
                    "{\"leadTimeDemandMean\": 1000000, \"serviceLevel\": 0.99}",
                    "{\"leadTimeDemandMean\": 1000000, \"serviceLevel\": 0.99, \"target\": \"fill-rate\", \"orderQuantity\": 1}",
                    "{\"leadTimeDemandMean\": 1000000, \"variance\": 1000000000000, \"distribution\": \"negative-binomial\", \"serviceLevel\": 0.999, \"target\": \"fill-rate\", \"orderQuantity\": 1}",
                    "{\"leadTimeDemandMean\": 1000000, \"variance\": 1000000000000, \"distribution\": \"normal\", \"serviceLevel\": 0.999999, \"target\": \"fill-rate\", \"orderQuantity\": 0.001}"}) {
                postJson("officer", "/api/policy/reorder-point", body).statusCode(200);
            }
        });
    }

    @Test
    void wholeNumberFieldsRefuseOverflowNamingTheField() {
        for (String packSize : new String[]{"1e400", "99999999999", "2147483648", "100001", "1.5e10"}) {
            String body = "{\"partNumber\": \"" + TestData.unique("BND") + "\", \"description\": \"bound test\", "
                    + "\"family\": \"CUP_SEAL\", \"unitOfIssue\": \"EACH\", \"packSize\": " + packSize + ", \"minOrderQty\": 1, "
                    + "\"unitCost\": 1, \"currency\": \"XAF\", \"supplier\": \"Test\", \"leadTimeDays\": 10, \"critical\": false}";
            refused(postJson("officer", "/api/parts", body), 400, "/problems/invalid-input", "packSize");
        }
    }

    @Test
    void batchPeriodsAreBoundedAndCannotOverflow() {
        assertTimeoutPreemptively(Duration.ofSeconds(30), () -> {
            for (String rows : new String[]{"A,2147483647,1\nA,-2147483648,1\n", "A,2147483648,1\n", "A,0,1\nA,5000000,1\n",
                    "A,1,1\nA,2000000000,1\n", "A,-1,1\n"}) {
                refused(as("officer").contentType("text/csv").body("series_id,period,quantity\n" + rows)
                        .post("/api/forecast/batch").then(), 400, "/problems/invalid-input", rows.contains(",0,")
                        ? "row 3, column period" : rows.startsWith("A,1,") ? "row 3, column period" : "row 2, column period");
            }
        });
        refused(as("officer").contentType("text/csv").body("series_id,period,quantity\nA,1,1e400\n")
                .post("/api/forecast/batch").then(), 400, "/problems/invalid-input", "row 2, column quantity");
        refused(as("officer").queryParam("alpha", "NaN").contentType("text/csv").body("series_id,period,quantity\nA,1,1\n")
                .post("/api/forecast/batch").then(), 400, "/problems/invalid-input", "alpha");
    }

    @Test
    void datesOutsideTheRangeAreRefusedAndFutureEventsAreUnprocessable() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        data.stock(part, depot, 5);
        for (String at : new String[]{"0000-01-01T00:00:00Z", "-999999999-01-01T00:00:00Z", "1899-12-31T23:00:00Z"}) {
            refused(postJson("officer", "/api/stock/movements", movement(part, depot, "1", at)), 400,
                    "/problems/invalid-input", "occurredAt");
        }
        String ahead = OffsetDateTime.now(ZoneOffset.UTC).plusDays(3).toString();
        refused(postJson("officer", "/api/stock/movements", movement(part, depot, "1", ahead)), 422,
                "/problems/dated-in-future", "occurredAt");
        balanceIs(part, depot, 5.0f);
        // Tomorrow is still accepted: a phone a time zone ahead of UTC.
        postJson("officer", "/api/stock/movements", movement(part, depot, "1",
                OffsetDateTime.now(ZoneOffset.UTC).plusHours(20).toString())).statusCode(201);
        balanceIs(part, depot, 4.0f);

        String today = LocalDate.now(ZoneOffset.UTC).toString();
        refused(as("officer").contentType("text/csv").body("location_code,part_number,quantity,counted_on\n"
                        + depot + "," + part + ",9," + today + "\n" + depot + "," + data.part(UnitOfIssue.EACH) + ",1,"
                        + LocalDate.now(ZoneOffset.UTC).plusDays(5) + "\n").post("/api/stock/counts/import").then(),
                422, "/problems/dated-in-future", "row 3, column counted_on");
        refused(as("officer").contentType("text/csv").body("location_code,part_number,quantity,counted_on\n"
                + depot + "," + part + ",9,0000-01-01\n").post("/api/stock/counts/import").then(),
                400, "/problems/invalid-input", "row 2, column counted_on");
        balanceIs(part, depot, 4.0f);

        String order = TestData.unique("PO");
        postJson("officer", "/api/purchase-orders", "{\"orderNumber\": \"" + order + "\", \"supplier\": \"Test\", "
                + "\"destination\": \"CENTRAL\", \"orderedOn\": \"" + today + "\", \"lines\": [{\"partNumber\": \"" + part
                + "\", \"quantity\": 3}]}").statusCode(201);
        refused(postJson("officer", "/api/purchase-orders/" + order + "/receipts", "{\"partNumber\": \"" + part
                + "\", \"quantity\": 3, \"occurredAt\": \"" + ahead + "\"}"), 422, "/problems/dated-in-future", "occurredAt");
        refused(postJson("officer", "/api/purchase-orders", "{\"orderNumber\": \"" + TestData.unique("PO")
                + "\", \"supplier\": \"Test\", \"destination\": \"CENTRAL\", \"orderedOn\": \"0000-01-01\", \"lines\": "
                + "[{\"partNumber\": \"" + part + "\", \"quantity\": 3}]}"), 400, "/problems/invalid-input", "orderedOn");
        as("officer").get("/api/purchase-orders/" + order).then().body("lines[0].quantityReceived", equalTo(0.0f));

        refused(as("officer").queryParam("since", "0000-01-01").get("/api/repairs").then(), 400,
                "/problems/invalid-input", "since");
        refused(as("officer").queryParam("since", "-999999999-01-01").get("/api/stock/movements").then(), 400,
                "/problems/invalid-input", "since");
    }
}
