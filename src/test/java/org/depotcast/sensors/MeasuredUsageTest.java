package org.depotcast.sensors;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.UsageReadingRow;
import org.depotcast.fleet.UsageService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Measured hours take the place of the typed-in estimate in the one usage history every reader uses (the forecasting
 * snapshot, the service-due list): for the months a sensor measured, and only there; a pump without sensors keeps
 * its readings as typed.
 */
@QuarkusTest
class MeasuredUsageTest {
    @Inject
    UsageService usage;
    @Inject
    PumpService pumps;

    private List<String> history(String asset) {
        long id = QuarkusTransaction.requiringNew().call(() -> pumps.find(asset).orElseThrow().id);
        return usage.allReadings().stream().filter(r -> r.pumpId() == id)
                .map(r -> r.readOn() + "=" + r.hoursPerDay().stripTrailingZeros().toPlainString()).toList();
    }

    private static void typed(String asset, String day, double hours) {
        as("officer").contentType("application/json").body(Map.of("readOn", day, "hoursPerDay", hours, "source", "SURVEYED"))
                .post("/api/pumps/" + asset + "/usage").then().statusCode(201);
    }

    @Test
    void aMeasuredMonthReplacesTheEstimateTypedInThatMonthOnly() {
        String withSensor = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        String without = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        for (String asset : List.of(withSensor, without)) {
            typed(asset, "2026-08-01", 3);
            typed(asset, "2026-10-15", 5);
        }
        // October read on 20 days: 10 days at 8 h and 10 at 6 h → 7 h a day over the days read (missing days are
        // missing, not zero). September read on 5 days only: too few for a measured load, the estimate stands.
        StringBuilder file = new StringBuilder("asset_id,day,hours\n");
        for (int d = 1; d <= 20; d++) {
            file.append(withSensor).append(",2026-10-").append(String.format("%02d", d)).append(',').append(d <= 10 ? 8 : 6).append('\n');
        }
        for (int d = 1; d <= 5; d++) {
            file.append(withSensor).append(",2026-09-0").append(d).append(",9\n");
        }
        SensorIntakeTest.csv("officer", file.toString()).then().statusCode(200);

        assertEquals(List.of("2026-08-01=3", "2026-10-01=7"), history(withSensor));
        assertEquals(List.of("2026-08-01=3", "2026-10-15=5"), history(without));
        UsageReadingRow measured = usage.allReadings().stream()
                .filter(r -> r.readOn().equals(LocalDate.of(2026, 10, 1)) && r.hoursPerDay().doubleValue() == 7.0)
                .findFirst().orElseThrow();
        assertEquals(3, measured.hoursPerDay().scale());
    }
}
