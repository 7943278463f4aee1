package org.depotcast.sensors;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The service's stop flags against {@link DemoSensorOracle}, a detector that knows how the demo drew each pump's year,
 * on the same series and with the same flag rules, at the certainties a programme may set: how much of what the
 * readings allow the service's rule leaves, and whether the targets (at least 80 % flagged before the report
 * with at most 2 false alarms per 1,000 pump-months) are within reach of any detector on the demo. Figures print as
 * EVIDENCE lines (README).
 */
class StopDetectionOracleTest {
    @Test
    void theServiceFlagsFewerStopsFirstThanADetectorThatKnowsTheDemosSettings() throws IOException {
        DemoSensorSeries.ReportDelay delay = DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC;
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            for (double least : new double[]{0.5, 0.8, 0.85, 0.9, 0.95, 0.99}) {
                double[] oracle = StopDetectionEvidenceTest.statistics(DemoSensorOracle.replay(seed, delay, least));
                double[] service = StopDetectionEvidenceTest.statistics(DemoSensorYear.replay(seed, delay, true,
                        DemoSensorYear.Rule.POOLED, least));
                System.out.printf("EVIDENCE %s, seed %d, flags opening at %.2f: the oracle flags %.1f %% of %d "
                                + "before the report (%.1f %% of the stops of their own), median %.1f days, %.2f false "
                                + "alarms per 1,000 pump-months; the service %.1f %% (%.1f %%), median %.1f, %.2f%n",
                        delay, seed, least, 100 * oracle[2], (int) oracle[0], 100 * oracle[8], oracle[1], oracle[3],
                        100 * service[2], 100 * service[8], service[1], service[3]);
                assertTrue(oracle[0] == service[0], "the same planted breakdowns judged");
                // Knowing the generator cannot make it worse: more stops flagged first, no more false alarms.
                assertTrue(oracle[2] >= service[2] && oracle[3] <= service[3] + 0.5, "at " + least + ": oracle "
                        + oracle[2] + " / " + oracle[3] + ", service " + service[2] + " / " + service[3]);
            }
        }
    }
}
