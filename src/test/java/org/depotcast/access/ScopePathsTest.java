package org.depotcast.access;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.security.ForbiddenException;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.anyOf;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Scopes hold on every path: imports and the raw ledger as well as the single-record endpoints; the scope fails
 * closed; no account name carries power. officer2 runs DEP-PELLOWDENE only; officer runs everything.
 */
@QuarkusTest
class ScopePathsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    TestData data;
    @Inject
    AccessScope scope;
    @Inject
    SystemWork system;
    @Inject
    StockQueryService stock;
    @Inject
    ForecastRunService runs;
    @Inject
    EntityManager em;

    @Test
    void aPumpImportCannotMoveAnotherDepotsPumpIntoOnesOwn() {
        String csv = as("lead").get("/api/pumps/export").asString();
        List<String> lines = Arrays.asList(csv.split("\r?\n"));
        String header = lines.get(0);
        String theirs = lines.stream().filter(l -> l.contains(",DEP-TESHVALE,")).findFirst().orElseThrow();
        String assetId = theirs.substring(0, theirs.indexOf(','));
        as("officer2").get("/api/pumps/" + assetId).then().statusCode(403);
        String moved = header + "\n" + theirs.replace(",DEP-TESHVALE,", ",DEP-PELLOWDENE,") + "\n";
        // Refused as a whole (403, or 400 naming the row when the import lists every row's problem); nothing moves.
        as("officer2").contentType("text/csv").body(moved).post("/api/pumps/import").then()
                .statusCode(anyOf(is(400), is(403))).contentType(PROBLEM).body("detail", containsString("outside"));
        as("lead").get("/api/pumps/" + assetId).then().statusCode(200).body("depotCode", equalTo("DEP-TESHVALE"));
        // Nor the other way: officer2's own pump may not be sent to a depot outside their scope.
        String own = lines.stream().filter(l -> l.contains(",DEP-PELLOWDENE,")).findFirst().orElseThrow();
        String ownId = own.substring(0, own.indexOf(','));
        as("officer2").contentType("text/csv").body(header + "\n" + own.replace(",DEP-PELLOWDENE,", ",DEP-TESHVALE,") + "\n")
                .post("/api/pumps/import").then().statusCode(anyOf(is(400), is(403))).contentType(PROBLEM);
        as("officer2").contentType("application/json").body(Map.of("depotCode", "DEP-TESHVALE"))
                .put("/api/pumps/" + ownId).then().statusCode(403);
        as("lead").get("/api/pumps/" + ownId).then().statusCode(200).body("depotCode", equalTo("DEP-PELLOWDENE"));
    }

    @Test
    void stockInTransitCannotBeRePointedToAnotherDepot() {
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, "DEP-TESHVALE", 5);
        long id = as("officer").contentType("application/json")
                .body(Map.of("partNumber", part, "from", "DEP-TESHVALE", "to", "DEP-MARROWFORD", "quantity", 3))
                .post("/api/planning/transfers").then().statusCode(201).extract().jsonPath().getLong("id");
        // officer2 takes the stock out of transit into their own depot with a plain movement: refused.
        as("officer2").contentType("application/json")
                .body(Map.of("kind", "TRANSFER", "partNumber", part, "from", "IN-TRANSIT", "to", "DEP-PELLOWDENE",
                        "quantity", 3)).post("/api/stock/movements")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("from"));
        // Not even an officer of both ends may move transit stock outside a transfer.
        as("officer").contentType("application/json")
                .body(Map.of("kind", "TRANSFER", "partNumber", part, "from", "IN-TRANSIT", "to", "DEP-MARROWFORD",
                        "quantity", 3)).post("/api/stock/movements").then().statusCode(422);
        as("officer").contentType("application/json")
                .body(Map.of("kind", "TRANSFER", "partNumber", part, "from", "DEP-TESHVALE", "to", "IN-TRANSIT",
                        "quantity", 1)).post("/api/stock/movements").then().statusCode(422).body("errors[0].field", equalTo("to"));
        assertEquals(0, new BigDecimal(3).compareTo(stock.onHand(part, "IN-TRANSIT")));
        // The real transfer still arrives where it was sent.
        as("officer").post("/api/planning/transfers/" + id + "/receive").then().statusCode(200);
        assertEquals(0, new BigDecimal(3).compareTo(stock.onHand(part, "DEP-MARROWFORD")));
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(part, "DEP-PELLOWDENE")));
    }

    @Test
    void anOfficerOfSomeDepotsGetsTheTransferSuggestionsTouchingThem() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        JsonPath all = as("lead").get("/api/planning/transfers/suggestions").then().statusCode(200).extract().jsonPath();
        JsonPath mine = as("officer2").get("/api/planning/transfers/suggestions").then().statusCode(200)
                .extract().jsonPath();
        List<Map<String, Object>> allMoves = all.getList("$");
        List<Map<String, Object>> myMoves = mine.getList("$");
        List<Map<String, Object>> expected = allMoves.stream()
                .filter(m -> "DEP-PELLOWDENE".equals(m.get("from")) || "DEP-PELLOWDENE".equals(m.get("to")))
                .collect(Collectors.toList());
        assertEquals(expected, myMoves, "officer2 sees exactly the programme's moves that touch DEP-PELLOWDENE");
        as("mechanic1").get("/api/planning/transfers/suggestions").then().statusCode(403);
    }

    @Test
    void withNoOneSignedInTheScopeGrantsNothing() {
        AccessScope.Scope none = scope.current();
        assertFalse(none.everything());
        assertTrue(none.locationIds().isEmpty());
        assertFalse(none.programme());
        assertThrows(ForbiddenException.class, () -> stock.balances("DEP-TESHVALE"));
        assertTrue(stock.balances(null).isEmpty());
        assertThrows(ForbiddenException.class, () -> scope.requireProgramme());
        // Background work says so explicitly.
        AccessScope.Scope systemScope = system.call("test", scope::current);
        assertTrue(systemScope.everything() && systemScope.programme());
        assertFalse(scope.current().everything(), "the system scope ends with its work");
    }

    @Test
    void anAccountNamedSystemHasNoPower() {
        // An account of that name can no longer be created, but one may exist from before: it is an ordinary account.
        as("admin").contentType("application/json")
                .body(Map.of("username", "system", "password", "system-demo", "roles", List.of("mechanic")))
                .post("/api/accounts").then().statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("username"));
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "insert into user_account (username, password_hash, roles, enabled, version) values ('system', ?1, 'mechanic', true, 0)")
                .setParameter(1, PasswordHasher.hash("system-demo")).executeUpdate());
        try {
            given().auth().preemptive().basic("system", "system-demo").get("/api/stock/balances?location=DEP-TESHVALE")
                    .then().statusCode(403).contentType(PROBLEM);
            given().auth().preemptive().basic("system", "system-demo").get("/api/audit").then().statusCode(403);
            given().auth().preemptive().basic("system", "system-demo").contentType("application/json")
                    .body(Map.of("kind", "CONSUMPTION", "partNumber", "OB-CS-50", "from", "KIT-M01", "quantity", 1))
                    .post("/api/stock/movements").then().statusCode(403);
            given().auth().preemptive().basic("system", "system-demo").get("/api/stock/balances").then().statusCode(200)
                    .body("size()", equalTo(0));
        } finally {
            QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery("delete from user_account where username = 'system'")
                    .executeUpdate());
        }
    }

    @Test
    void backgroundWorkIsRecordedUnderANameNoAccountCanHave() {
        String part = data.part(UnitOfIssue.EACH);
        String actor = as("lead").get("/api/audit?entityType=part").then().statusCode(200).extract().jsonPath()
                .getString("find { it.entityKey == '" + part + "' }.actor");
        assertEquals("system:test", actor);
        as("admin").contentType("application/json")
                .body(Map.of("username", "system:test", "password", "long-enough", "roles", List.of("mechanic")))
                .post("/api/accounts").then().statusCode(400).body("detail", containsString("username"));
        assertNull(QuarkusTransaction.requiringNew().call(() -> em.createNativeQuery(
                "select id from user_account where username like 'system%'").getResultStream().findFirst().orElse(null)));
    }
}
