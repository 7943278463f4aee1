package org.depotcast.sensors;

import io.restassured.path.json.JsonPath;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.access.SystemWork;
import org.depotcast.core.sensors.StopPosterior;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpSummary;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Probably-down flags through the API: raised on a stop, closed as a false alarm when use returns, or by a repair. */
@QuarkusTest
class StopFlagTest {
    private static final LocalDate FIRST = LocalDate.of(2026, 9, 1);

    @Inject
    BreakdownHazards hazards;
    @Inject
    PumpQueryService pumps;
    @Inject
    SystemWork system;
    @Inject
    org.depotcast.forecasting.ForecastRunService runs;

    /**
     * Two near-nothing days at a pump judged alone (a one-pump file) with share q of near-nothing days, by Shiryaev's
     * posterior as StopDetectorTest works it: down π + π(1 − π)q against idle (1 − π)²q². π is one breakdown a
     * pump-year, or the pump's own rate at {@code hoursPerDay} when a forecast run has finished (other tests may
     * have made one).
     */
    private double twoDaysDown(String asset, LocalDate asOf, double q, double hoursPerDay) {
        double pi = system.call("test", () -> {
            PumpSummary pump = pumps.all().stream().filter(p -> p.assetId().equals(asset)).findFirst().orElseThrow();
            Double perHour = hazards.perHour(List.of(pump.id()), asOf).get(pump.id());
            return perHour == null ? 1.0 / 365 : StopPosterior.dailyChance(perHour, hoursPerDay);
        });
        double down = pi + pi * (1 - pi) * q;
        return down / (down + (1 - pi) * (1 - pi) * q * q);
    }

    /** The detector test's series: 28 days alternating 5 and 7 h, 12 days of 6 h, then two days of nothing. */
    private static String stoppedHistory(String asset) {
        StringBuilder csv = new StringBuilder("asset_id,day,hours\n");
        for (int d = 0; d < 42; d++) {
            double hours = d < 28 ? (d % 2 == 0 ? 5 : 7) : d < 40 ? 6 : 0;
            csv.append(asset).append(',').append(FIRST.plusDays(d)).append(',').append(hours).append('\n');
        }
        return csv.toString();
    }

    private static Map<String, Object> reportOf(String asset) {
        JsonPath report = as("officer").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down")
                .then().statusCode(200).extract().jsonPath();
        Map<String, Object> pump = report.getMap("pumps.find { it.assetId == '" + asset + "' }");
        return pump == null ? new HashMap<>() : pump;
    }

    @Test
    void aStopIsFlaggedWithItsProbabilityAndUseComingBackClosesItAsAFalseAlarm() {
        String p = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        SensorIntakeTest.csv("officer", stoppedHistory(p)).then().statusCode(200).body("added", equalTo(42));
        Map<String, Object> flagged = reportOf(p);
        assertEquals("probably down", flagged.get("state"));
        assertEquals("2026-10-11", flagged.get("stoppedFrom"));
        // As worked by hand in StopDetectorTest (q = 1/30, 0.7192 with no forecast run), to the flag's 4 decimals.
        assertEquals(twoDaysDown(p, LocalDate.of(2026, 10, 12), 1.0 / 30, 6.0),
                ((Number) flagged.get("probabilityDown")).doubleValue(), 5e-5);
        long falseAlarmsBefore = as("officer").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down")
                .then().extract().jsonPath().getLong("falseAlarms");

        SensorIntakeTest.csv("officer", "asset_id,day,hours\n" + p + ",2026-10-13,6\n" + p + ",2026-10-14,6.5\n")
                .then().statusCode(200);
        assertTrue(reportOf(p).isEmpty(), "the flag closed");
        as("officer").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down").then()
                .body("falseAlarms", equalTo((int) falseAlarmsBefore + 1));
    }

    /**
     * The lead's certainty applies to flags opened from then on: raised above a stop's probability, the same stop at
     * another pump is not flagged, while the flag opened before the change stays open through the next file.
     */
    @Test
    void aStopLessLikelyThanTheLeadsCertaintyIsNotFlaggedAndAFlagAlreadyOpenStays() {
        String flaggedBefore = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        SensorIntakeTest.csv("officer", stoppedHistory(flaggedBefore)).then().statusCode(200);
        double before = ((Number) reportOf(flaggedBefore).get("probabilityDown")).doubleValue();
        String after = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        double expected = twoDaysDown(after, LocalDate.of(2026, 10, 12), 1.0 / 30, 6.0);
        assertTrue(before >= 0.5 && expected >= 0.5 && Math.max(before, expected) < 0.985,
                "both stops flagged at the default of 0.5, below the highest certainty: " + before + ", " + expected);
        // The least whole per cent above both probabilities.
        double certainty = Math.floor(Math.max(before, expected) * 100 + 1) / 100;
        try {
            as("lead").contentType("application/json").body(Map.of("leastProbability", certainty))
                    .put("/api/sensors/stop-certainty").then().statusCode(200);
            SensorIntakeTest.csv("officer", stoppedHistory(after)).then().statusCode(200).body("added", equalTo(42));
            assertTrue(reportOf(after).isEmpty(), "a stop " + expected + " likely is not flagged at " + certainty);

            SensorIntakeTest.csv("officer", "asset_id,day,hours\n" + flaggedBefore + ",2026-10-13,0\n")
                    .then().statusCode(200);
            assertEquals("probably down", reportOf(flaggedBefore).get("state"), "a flag already open stays open");
        } finally {
            as("lead").contentType("application/json").body(Map.of("leastProbability", 0.5))
                    .put("/api/sensors/stop-certainty").then().statusCode(200);
        }
    }

    @Test
    void withAFinishedForecastRunAPumpsOwnBreakdownRateSetsItsPrior() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        String p = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        SensorIntakeTest.csv("officer", stoppedHistory(p)).then().statusCode(200);
        double perHour = system.call("test", () -> {
            PumpSummary pump = pumps.all().stream().filter(x -> x.assetId().equals(p)).findFirst().orElseThrow();
            return hazards.perHour(List.of(pump.id()), LocalDate.of(2026, 10, 12)).get(pump.id());
        });
        assertTrue(perHour > 0, "the run gives the pump a rate: " + perHour);
        double probability = ((Number) reportOf(p).get("probabilityDown")).doubleValue();
        assertEquals(twoDaysDown(p, LocalDate.of(2026, 10, 12), 1.0 / 30, 6.0), probability, 5e-5);
        assertTrue(Math.abs(probability - 0.7192) > 1e-3, "not the flat prior's 0.7192: " + probability);
    }

    @Test
    void aReportedRepairClosesTheFlagAndAPumpWithAnOpenRepairIsNotFlagged() {
        String p = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        SensorIntakeTest.csv("officer", stoppedHistory(p)).then().statusCode(200);
        assertFalse(reportOf(p).isEmpty());
        Map<String, Object> repair = new HashMap<>();
        repair.put("repairRef", "sensor-" + p);
        repair.put("assetId", p);
        repair.put("kind", "BREAKDOWN");
        repair.put("reportedOn", "2026-10-13");
        repair.put("lines", List.of());
        as("officer").contentType("application/json").body(repair).post("/api/repairs").then().statusCode(201);
        as("lead").queryParam("day", "2026-10-13").post("/api/sensors/stop-check").then().statusCode(200);
        assertTrue(reportOf(p).isEmpty(), "closed by the repair");

        String broken = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        repair.put("repairRef", "sensor-" + broken);
        repair.put("assetId", broken);
        repair.put("reportedOn", "2026-10-11");
        as("officer").contentType("application/json").body(repair).post("/api/repairs").then().statusCode(201);
        SensorIntakeTest.csv("officer", stoppedHistory(broken)).then().statusCode(200);
        assertTrue(reportOf(broken).isEmpty(), "already reported: nothing to flag");
    }

    @Test
    void theListNeedsADepotTheCallerMaySee() {
        as("officer").get("/api/sensors/probably-down").then().statusCode(400)
                .contentType("application/problem+json").body("errors[0].field", equalTo("depot"));
        as("officer2").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down").then().statusCode(403);
        as("officer").queryParam("day", "31/12/2026").post("/api/sensors/stop-check").then().statusCode(403);
        as("lead").queryParam("day", "31/12/2026").post("/api/sensors/stop-check").then().statusCode(400)
                .body("errors[0].field", equalTo("day"));
        // Judged as of a day not yet come, the days to it would read as a transmission gap or a stop.
        String ahead = java.time.LocalDate.now(java.time.ZoneOffset.UTC).plusDays(5).toString();
        as("lead").queryParam("day", ahead).post("/api/sensors/stop-check").then().statusCode(422)
                .contentType("application/problem+json").body("type", equalTo("/problems/dated-in-future"));
    }

    @Test
    void daysABreakdownOnRecordStoodBrokenAreNotTakenForThePumpIdling() {
        // 6 h a day from 2026-06-01; broken 06-06 to 06-13 (reported 06-09, fixed 06-14); stopped again 07-11 and 07-12.
        LocalDate first = LocalDate.of(2026, 6, 1);
        StringBuilder csv = new StringBuilder("asset_id,day,hours\n");
        String p = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        for (int d = 0; d < 42; d++) {
            double hours = (d >= 5 && d < 13) || d >= 40 ? 0 : 6;
            csv.append(p).append(',').append(first.plusDays(d)).append(',').append(hours).append('\n');
        }
        Map<String, Object> repair = new HashMap<>();
        repair.put("repairRef", "earlier-" + p);
        repair.put("assetId", p);
        repair.put("kind", "BREAKDOWN");
        repair.put("reportedOn", "2026-06-09");
        repair.put("fixedOn", "2026-06-14");
        repair.put("lines", List.of());
        as("officer").contentType("application/json").body(repair).post("/api/repairs").then().statusCode(201);
        SensorIntakeTest.csv("officer", csv.toString()).then().statusCode(200).body("added", equalTo(42));
        Map<String, Object> flagged = reportOf(p);
        assertEquals("probably down", flagged.get("state"));
        assertEquals("2026-07-11", flagged.get("stoppedFrom"));
        // RecordedDowntimeTest's case: 20 days read in the baseline, none idle, q = 1/22: 0.5822 with no forecast run.
        // Counted as idle, the 8 broken days would leave 0.0382, and no flag.
        assertEquals(twoDaysDown(p, LocalDate.of(2026, 7, 12), 1.0 / 22, 6.0),
                ((Number) flagged.get("probabilityDown")).doubleValue(), 5e-5);
    }
}
