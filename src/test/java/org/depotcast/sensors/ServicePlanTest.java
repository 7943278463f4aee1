package org.depotcast.sensors;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.core.forecast.UsageTimeline;
import org.depotcast.fleet.Pump;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.UsageReadingRow;
import org.depotcast.fleet.UsageService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Service by hours: a pump's measured days replace the recorded estimate for those days. */
@QuarkusTest
class ServicePlanTest {
    @Inject
    UsageService usage;
    @Inject
    PumpService pumps;

    /** The recorded estimate of the hours in the span: the pump's usage history as the forecasts count it. */
    private double recordedEstimate(String asset, LocalDate from, LocalDate today) {
        Pump pump = QuarkusTransaction.requiringNew().call(() -> pumps.find(asset).orElseThrow());
        List<UsageReadingRow> rows = usage.allReadings().stream().filter(r -> r.pumpId() == pump.id)
                .sorted(Comparator.comparing(UsageReadingRow::readOn)).toList();
        UsageTimeline timeline = new UsageTimeline(rows.stream().mapToLong(r -> r.readOn().toEpochDay()).toArray(),
                rows.stream().mapToDouble(r -> r.hoursPerDay().doubleValue()).toArray(),
                pump.usageHoursPerDay.doubleValue());
        return timeline.hoursBetween(from.toEpochDay(), today.toEpochDay());
    }

    @Test
    void measuredDaysReplaceTheEstimateAndProjectTheDueDay() {
        String p = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        LocalDate today = LocalDate.now(ZoneOffset.UTC);
        StringBuilder csv = new StringBuilder("asset_id,day,hours\n");
        // The 28 days before today: the span counted runs from the service up to today, today not included.
        for (int d = 28; d >= 1; d--) {
            csv.append(p).append(',').append(today.minusDays(d)).append(",8\n");
        }
        SensorIntakeTest.csv("officer", csv.toString()).then().statusCode(200).body("added", equalTo(28));
        Map<String, Object> listed = as("officer").get("/api/pumps/service-due").then().statusCode(200).extract()
                .jsonPath().getMap("find { it.assetId == '" + p + "' }");
        LocalDate countedFrom = LocalDate.parse((String) listed.get("countedFrom"));
        double estimated = recordedEstimate(p, countedFrom, today);
        int interval = ((Number) listed.get("serviceIntervalHours")).intValue();
        long span = ChronoUnit.DAYS.between(countedFrom, today);

        JsonPath plan = as("officer").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/service-plan").then()
                .statusCode(200).extract().jsonPath();
        Map<String, Object> row = plan.getMap("pumps.find { it.assetId == '" + p + "' }");
        assertEquals("measured by sensor", row.get("usageBasis"));
        assertEquals(224.0, ((Number) row.get("measuredHours")).doubleValue(), 1e-6);
        assertEquals(8.0, ((Number) row.get("recentHoursPerDay")).doubleValue(), 1e-9);
        // 28 days read at 8 h; the other span − 28 days keep their share of the estimate.
        double since = 224 + estimated * (1 - 28.0 / span);
        assertEquals(since, ((Number) row.get("hoursSinceService")).doubleValue(), 1e-3);
        double left = interval - since;
        LocalDate due = today.plusDays(left <= 0 ? (long) Math.floor(left / 8) : (long) Math.ceil(left / 8 - 1e-9));
        assertEquals(due.toString(), row.get("dueOn"));
        assertEquals(13, plan.getList("weeks").size());
        // The pump list counts the same hours the same way.
        assertEquals(since, ((Number) listed.get("hoursSinceService")).doubleValue(), 1e-3);
        assertEquals(due.toString(), listed.get("dueOn"));
        if (!due.isAfter(today.plusDays(89))) {
            int week = (int) Math.max(0, ChronoUnit.DAYS.between(today, due) / 7);
            assertTrue(plan.getList("weeks[" + week + "].pumpsDue").contains(p));
        }
    }
}
