package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** One alert per part and location, with its waiting pumps; acting on it; parts with no forecast. */
@QuarkusTest
class AlertLoopsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    ForecastRunService runs;
    @Inject
    TestData data;

    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    private static List<Map<String, Object>> alertsAt(String location) {
        return as("officer").queryParam("location", location).queryParam("includeSnoozed", "true")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
    }

    private static Map<String, Object> alertOf(String part, String location) {
        List<Map<String, Object>> matching = alertsAt(location).stream().filter(a -> part.equals(a.get("partNumber"))).toList();
        assertTrue(matching.size() <= 1, "one alert per part and location: " + matching);
        return matching.isEmpty() ? null : matching.get(0);
    }

    @Test
    void everyPartAndLocationHasOneAlertWithAllItsReasons() {
        List<Map<String, Object>> alerts = as("officer").get("/api/planning/alerts").then().statusCode(200)
                .extract().jsonPath().getList("$");
        Set<String> seen = new HashSet<>();
        boolean severalReasons = false;
        for (int i = 0; i < alerts.size(); i++) {
            Map<String, Object> a = alerts.get(i);
            assertTrue(seen.add(a.get("partNumber") + "@" + a.get("locationCode")), "twin alert " + a);
            List<Map<String, Object>> reasons = (List<Map<String, Object>>) a.get("reasons");
            assertFalse(reasons.isEmpty());
            assertEquals(reasons.get(0).get("kind"), a.get("kind"));
            severalReasons |= reasons.size() > 1;
            if (i > 0) {
                assertTrue(((Number) alerts.get(i - 1).get("pumpDaysAtRisk")).doubleValue()
                        >= ((Number) a.get("pumpDaysAtRisk")).doubleValue());
            }
        }
        assertTrue(severalReasons, "the demo has parts both below their reorder point and about to run out");
        // Filtering by a reason keeps the alerts that carry it.
        as("officer").queryParam("kind", "STOCKOUT_PROJECTED").get("/api/planning/alerts").then().statusCode(200)
                .body("reasons.kind.flatten().findAll { it == 'STOCKOUT_PROJECTED' }.size()",
                        org.hamcrest.Matchers.greaterThan(0));
    }

    @Test
    void outWithPumpsWaitingListsThePumpsAndAnAcknowledgementIsRaisedAgainByANewReason() {
        String depot = data.depot();
        String part = data.part(UnitOfIssue.EACH);
        data.stock(part, depot, 4);
        // Stocked after the forecast run: no forecast here, and said so.
        Map<String, Object> noForecast = alertOf(part, depot);
        assertEquals("NO_FORECAST", noForecast.get("kind"));
        as("officer").queryParam("location", depot).get("/api/planning/policies").then().statusCode(200)
                .body("find { it.partNumber == '" + part + "' }.forecastMethod", equalTo("no forecast"));
        as("officer").contentType("application/json").body(Map.of("partNumber", part, "location", depot,
                "action", "ACKNOWLEDGE")).post("/api/planning/alerts/actions").then().statusCode(201)
                .body("reasons", equalTo(List.of("NO_FORECAST")));
        assertEquals(true, alertOf(part, depot).get("acknowledged"));

        // The stock is written off, and a pump breaks down needing the part: a new reason raises the alert again.
        as("officer").contentType("application/json").body(Map.of("kind", "WRITE_OFF", "partNumber", part,
                "from", depot, "quantity", 4, "reason", "damaged by water")).post("/api/stock/movements").then().statusCode(201);
        String asset = TestData.unique("AW");
        as("officer").contentType("application/json").body(Map.of("assetId", asset, "modelCode", "RB-2", "depthM", 30,
                "installedOn", "2019-01-01", "depotCode", depot)).post("/api/pumps").then().statusCode(201);
        String ref = TestData.unique("rep");
        LocalDate today = LocalDate.now(ZoneOffset.UTC);
        as("officer").contentType("application/json").body(Map.of("repairRef", ref, "assetId", asset,
                "mechanic", "mechanic1", "kind", "BREAKDOWN", "reportedOn", today.minusDays(5).toString(),
                "diagnosedOn", today.minusDays(4).toString(), "lines", List.of(Map.of("partNumber", part, "quantity", 1))))
                .post("/api/repairs").then().statusCode(201);
        Map<String, Object> out = alertOf(part, depot);
        assertEquals("OUT_WITH_PUMPS_WAITING", out.get("kind"));
        assertEquals(false, out.get("acknowledged"));
        assertEquals(List.of("OUT_WITH_PUMPS_WAITING"), out.get("raisedAgainBy"));
        assertEquals(List.of(Map.of("assetId", asset, "daysWaiting", 4, "repairRef", ref)), out.get("waitingPumps"));
        assertEquals(1, ((Number) out.get("pumpsWaiting")).intValue());
        assertTrue(((Number) out.get("pumpDaysAtRisk")).doubleValue() >= ((Number) out.get("reorderPoint")).doubleValue());

        as("officer").contentType("application/json").body(Map.of("partNumber", part, "location", depot,
                "action", "ACKNOWLEDGE")).post("/api/planning/alerts/actions").then().statusCode(201);
        Map<String, Object> acknowledged = alertOf(part, depot);
        assertEquals(true, acknowledged.get("acknowledged"));
        assertEquals(List.of(), acknowledged.get("raisedAgainBy"));
        as("lead").get("/api/stock/reconcile").then().body("consistent", equalTo(true));
    }

    @Test
    void actingOnAnAlertThatDoesNotExistIsNotFound() {
        String depot = data.depot();
        String part = data.part(UnitOfIssue.EACH);
        Map<String, Object> body = new HashMap<>(Map.of("partNumber", part, "location", depot, "action", "ACKNOWLEDGE"));
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then()
                .statusCode(404).contentType(PROBLEM).body("type", equalTo("/problems/not-found"));
        body.put("action", "SNOOZE");
        body.put("snoozeUntil", LocalDate.now(ZoneOffset.UTC).plusDays(3).toString());
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then()
                .statusCode(404).contentType(PROBLEM);
        // An alert that exists, asked for by a reason it does not carry.
        data.stock(part, depot, 2);
        body.put("kind", "EXCESS");
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then()
                .statusCode(404).contentType(PROBLEM);
        body.put("kind", "NO_FORECAST");
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then()
                .statusCode(201).body("action", equalTo("SNOOZE"));
        body.put("partNumber", "NO-SUCH-PART");
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions").then()
                .statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("partNumber"));
        JsonPath audit = as("lead").queryParam("entityType", "alert").get("/api/audit").then().extract().jsonPath();
        assertEquals(1, audit.getList("entityKey").stream().filter((part + "@" + depot)::equals).count());
    }

    @Test
    void kitAlertsAreRankedByBreakdownRisk() {
        List<Map<String, Object>> alerts = alertsAt("KIT-M01");
        for (int i = 1; i < alerts.size(); i++) {
            assertTrue(((Number) alerts.get(i - 1).get("pumpDaysAtRisk")).doubleValue()
                    >= ((Number) alerts.get(i).get("pumpDaysAtRisk")).doubleValue());
        }
        alerts.forEach(a -> assertEquals("KIT", a.get("level")));
        // A mechanic's default list is their own kit.
        as("mechanic1").get("/api/planning/alerts").then().statusCode(200)
                .body("locationCode.unique()", org.hamcrest.Matchers.everyItem(equalTo("KIT-M01")));
    }
}
