package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledIfEnvironmentVariable;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/**
 * With depotcast.clock.fixed set, date rules follow the fixed instant, not the machine's date: the default forecast
 * origin, the latest origin a run may have, the dates Bean Validation calls "today", and a snooze's expiry. Each
 * assertion would come out the other way on the real clock, which is earlier than the fixed one. Skipped on the
 * PostgreSQL run, where the profile could not have a database of its own.
 */
@QuarkusTest
@TestProfile(FixedClockProfile.class)
@DisabledIfEnvironmentVariable(named = "DEPOTCAST_TEST_JDBC_URL", matches = ".+")
class FixedClockTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    Clock clock;
    @Inject
    ForecastRunService runs;

    @Test
    void theForecastOriginAndTodayFollowTheFixedClock() {
        assertEquals(Instant.parse(FixedClockProfile.FIXED), clock.instant());
        assertEquals(LocalDate.of(2027, 6, 1), runs.currentOrigin());
        assertEquals(LocalDate.of(2027, 6, 15), DateBounds.today(), "the static date rules read the same clock");
        // After the real current month, before the fixed one's: the real clock would accept it as a past origin.
        as("lead").queryParam("origin", "2027-08-01").post("/api/forecast/runs").then().statusCode(400)
                .contentType(PROBLEM).body("errors[0].field", equalTo("origin"))
                .body("errors[0].message", containsString("2027-06-01"));
    }

    @Test
    void aSnoozeMustEndAfterTheFixedToday() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        List<Map<String, Object>> alerts = as("officer").queryParam("location", "DEP-PELLOWDENE")
                .get("/api/planning/alerts").then().statusCode(200).extract().jsonPath().getList("$");
        assertFalse(alerts.isEmpty(), "the demo depot has alerts to snooze");
        Map<String, Object> target = alerts.get(0);
        Map<String, Object> body = Map.of("partNumber", target.get("partNumber"), "location", "DEP-PELLOWDENE",
                "kind", target.get("kind"), "action", "SNOOZE", "snoozeUntil", "2027-01-10");
        // 2027-01-10 is after the real today but before the fixed one: refused because the fixed clock is read.
        as("officer").contentType("application/json").body(body).post("/api/planning/alerts/actions")
                .then().statusCode(422).contentType(PROBLEM).body("errors[0].field", equalTo("snoozeUntil"));
    }
}
