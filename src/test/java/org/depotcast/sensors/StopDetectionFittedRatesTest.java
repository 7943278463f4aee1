package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.forecasting.FleetOutlooks;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The stop replay of {@link StopDetectionEvidenceTest} with each sensor pump's breakdown rate as the service takes it
 * ({@link BreakdownHazards}: the fleet models of a forecast, the pump's depth, age, load and depot ratio), fitted on the
 * demo's records before the replayed year (as of 2025-12-01, so the year being judged is not in the fit), instead of
 * the generator's planted rates: the figures in the README must not rest on the detector knowing the true rates.
 */
@QuarkusTest
class StopDetectionFittedRatesTest {
    @Inject
    FleetOutlooks outlooks;
    @Inject
    PumpQueryService pumps;
    @Inject
    SystemWork system;

    @Test
    void fittedRatesFlagAsThePlantedRatesDo() throws IOException {
        LocalDate origin = DemoSensorYear.FIRST.withDayOfMonth(1);
        Map<ComponentFamily, FleetRateModel> models = system.call("replay-rates",
                () -> outlooks.fittedAsOf(origin, 12).models());
        List<PumpSummary> all = system.call("replay-pumps", pumps::all);
        LocalDate midYear = DemoSensorYear.FIRST.plusDays(DemoSensorYear.DAYS / 2);
        Map<String, Double> rates = new HashMap<>();
        for (PumpSummary pump : all) {
            rates.put(pump.assetId(), BreakdownHazards.perHour(pump, models, midYear));
        }
        DemoSensorSeries.ReportDelay delay = DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC;
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            double[] planted = StopDetectionEvidenceTest.statistics(DemoSensorYear.replay(seed, delay));
            double[] fitted = StopDetectionEvidenceTest.statistics(DemoSensorYear.replayWithRates(seed, delay, rates));
            System.out.printf("EVIDENCE %s, seed %d, rates fitted as of %s (the service's own models) against the "
                            + "planted rates: median %.1f / %.1f days, %.1f / %.1f %% flagged before the report, "
                            + "%.2f / %.2f false alarms per 1,000 pump-months%n", delay, seed, origin, fitted[1],
                    planted[1], 100 * fitted[2], 100 * planted[2], fitted[3], planted[3]);
            assertTrue(fitted[0] == planted[0] && fitted[0] >= 30, "the same planted breakdowns judged");
            // A fitted rate differs from the planted one by its sampling error (a few per cent a family), and the
            // flat prior of one breakdown a pump-year moves the figures by under a point (README), so the
            // detector's figures must barely move; a wide gap would mean the evidence leaned on the true rates.
            assertTrue(Math.abs(fitted[2] - planted[2]) <= 0.03, "flagged before the report: planted "
                    + planted[2] + ", fitted " + fitted[2]);
            assertTrue(Math.abs(fitted[3] - planted[3]) <= 2, "false alarms: planted " + planted[3] + ", fitted "
                    + fitted[3]);
        }
    }
}
