package org.depotcast.stock;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Idempotency keys belong to their sender: one account's key is not another's, and no client can write the keys the
 * services use for repairs and request issues. Concurrent resends are answered like any resend.
 */
@QuarkusTest
class IdempotencyKeyOwnershipTest {
    @Inject
    TestData data;
    @Inject
    StockQueryService stock;
    @Inject
    EntityManager em;

    private static Map<String, Object> consumption(String part, String kit, int quantity, String key) {
        Map<String, Object> body = new HashMap<>();
        body.put("kind", "CONSUMPTION");
        body.put("partNumber", part);
        body.put("from", kit);
        body.put("quantity", quantity);
        body.put("idempotencyKey", key);
        return body;
    }

    private BigDecimal onHand(String part, String location) {
        return stock.onHand(part, location);
    }

    @Test
    void aKeyReusedByAnotherMechanicIsTheirOwnMovement() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "KIT-M03", 5);
        data.stock(part, "KIT-M04", 5);
        String key = TestData.unique("phone-key");
        as("mechanic3").contentType("application/json").body(consumption(part, "KIT-M03", 2, key))
                .post("/api/stock/movements").then().statusCode(201).body("actor", equalTo("mechanic3"));
        // Same text from another account: a new movement of their own, not the first mechanic's movement back.
        as("mechanic4").contentType("application/json").body(consumption(part, "KIT-M04", 1, key))
                .post("/api/stock/movements").then().statusCode(201).body("actor", equalTo("mechanic4"))
                .body("from", equalTo("KIT-M04")).body("idempotencyKey", equalTo(key));
        // And each one's resend still finds their own.
        as("mechanic4").contentType("application/json").body(consumption(part, "KIT-M04", 1, key))
                .post("/api/stock/movements").then().statusCode(200).body("actor", equalTo("mechanic4"));
        assertEquals(0, new BigDecimal(3).compareTo(onHand(part, "KIT-M03")));
        assertEquals(0, new BigDecimal(4).compareTo(onHand(part, "KIT-M04")));
    }

    @Test
    void keysShapedLikeARepairsOwnDoNotStopItsConsumption() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "KIT-M04", 10);
        String ref = TestData.unique("rep");
        // The mechanic posts small consumptions under every shape the repair's own keys have had.
        for (String shaped : List.of("repair:" + ref + ":" + part, ref + ":" + part, "internal/repair")) {
            as("mechanic4").contentType("application/json").body(consumption(part, "KIT-M04", 1, shaped))
                    .post("/api/stock/movements").then().statusCode(201);
        }
        Map<String, Object> repair = new HashMap<>();
        repair.put("repairRef", ref);
        repair.put("assetId", "OB-00004");
        repair.put("kind", "BREAKDOWN");
        repair.put("reportedOn", "2026-11-20");
        repair.put("fixedOn", "2026-11-21");
        repair.put("lines", List.of(Map.of("partNumber", part, "quantity", 4)));
        as("mechanic4").contentType("application/json").body(repair).post("/api/repairs").then().statusCode(201)
                .body("ledgerPosted", equalTo(true));
        assertEquals(0, new BigDecimal(3).compareTo(onHand(part, "KIT-M04")), "10 - 3 shaped keys - 4 used in the repair");
        assertTrue(data.asSystem(stock::reconcile).consistent());
    }

    @Test
    void keysShapedLikeARequestIssueDoNotStopTheOfficersIssue() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "DEP-TESHVALE", 6);
        data.stock(part, "KIT-M03", 3);
        long id = as("mechanic3").contentType("application/json")
                .body(Map.of("clientRef", TestData.unique("req"), "urgency", "ROUTINE",
                        "lines", List.of(Map.of("partNumber", part, "quantity", 2))))
                .post("/api/requests").then().statusCode(201).extract().jsonPath().getLong("id");
        long lineId = QuarkusTransaction.requiringNew().call(() -> ((Number) em.createNativeQuery(
                "select id from parts_request_line where parts_request_id = ?1").setParameter(1, id)
                .getSingleResult()).longValue());
        for (String shaped : List.of("request:" + id + ":" + lineId, id + ":" + lineId)) {
            as("mechanic3").contentType("application/json").body(consumption(part, "KIT-M03", 1, shaped))
                    .post("/api/stock/movements").then().statusCode(201);
        }
        as("officer").contentType("application/json")
                .body(Map.of("lines", List.of(Map.of("partNumber", part, "quantity", 2))))
                .post("/api/requests/" + id + "/approve").then().statusCode(200);
        as("officer").post("/api/requests/" + id + "/issue").then().statusCode(200).body("status", equalTo("ISSUED"));
        assertEquals(0, new BigDecimal(4).compareTo(onHand(part, "DEP-TESHVALE")));
        assertEquals(0, new BigDecimal(3).compareTo(onHand(part, "KIT-M03")), "3 - 2 shaped keys + 2 issued");
    }

    @Test
    void eightySimultaneousSameKeyPostsWriteOneMovement() throws Exception {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        data.stock(part, depot, 1);
        String key = TestData.unique("race");
        Map<String, Object> body = Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", part, "to", depot, "quantity", 3,
                "idempotencyKey", key);
        List<Integer> statuses = race(80, i -> body);
        assertEquals(1, statuses.stream().filter(s -> s == 201).count(), statuses.toString());
        assertEquals(79, statuses.stream().filter(s -> s == 200).count(), statuses.toString());
        assertEquals(0, new BigDecimal(4).compareTo(onHand(part, depot)), "one movement of 3 on top of the 1");
        assertTrue(data.asSystem(stock::reconcile).consistent());
    }

    @Test
    void sixteenSimultaneousDifferentBodiesUnderOneKeyAre409sButOne() throws Exception {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String key = TestData.unique("race");
        List<Integer> statuses = race(16, i -> Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", part, "to", depot,
                "quantity", i + 1, "idempotencyKey", key));
        assertEquals(1, statuses.stream().filter(s -> s == 201).count(), statuses.toString());
        assertEquals(15, statuses.stream().filter(s -> s == 409).count(), statuses.toString());
        BigDecimal held = onHand(part, depot);
        assertTrue(held.signum() > 0 && held.compareTo(new BigDecimal(16)) <= 0, "exactly one of the bodies: " + held);
        assertTrue(data.asSystem(stock::reconcile).consistent());
    }

    private static List<Integer> race(int clients, java.util.function.IntFunction<Map<String, Object>> bodies)
            throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(clients);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<Integer>> answers = new ArrayList<>();
        for (int i = 0; i < clients; i++) {
            Map<String, Object> body = bodies.apply(i);
            Callable<Integer> post = () -> {
                start.await();
                Response response = as("officer").contentType("application/json").body(body).post("/api/stock/movements");
                return response.statusCode();
            };
            answers.add(pool.submit(post));
        }
        start.countDown();
        List<Integer> statuses = new ArrayList<>();
        for (Future<Integer> answer : answers) {
            statuses.add(answer.get(180, TimeUnit.SECONDS));
        }
        pool.shutdown();
        return statuses;
    }
}
