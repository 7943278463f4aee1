package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.access.SystemWork;
import org.depotcast.fleet.PumpService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The demo's first start gives about 40 % of its pumps a year of daily readings. */
@QuarkusTest
class DemoSensorReadingsTest {
    @Inject
    SensorUsageQuery usage;
    @Inject
    PumpService pumps;
    @Inject
    SystemWork system;

    @Test
    void aboutFortyPercentOfDemoPumpsHaveAYearOfReadings() {
        int all = system.call("test", () -> io.quarkus.narayana.jta.QuarkusTransaction.requiringNew()
                .call(() -> (int) pumps.all().stream().filter(p -> p.assetId.startsWith("OB-")).count()));
        int read = usage.pumpsReadSince(LocalDate.now().minusDays(400)).size();
        double share = (double) read / all;
        assertTrue(share > 0.30 && share < 0.50, read + " of " + all + " demo pumps read");
    }
}
