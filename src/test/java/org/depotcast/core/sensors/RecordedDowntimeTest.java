package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A recorded breakdown's downtime left out of the days judged, on hand-made series. */
class RecordedDowntimeTest {
    private static final StopDetector DETECTOR = new StopDetector(StopSettings.DEFAULT);

    /** 6 h a day; stood broken days 5–12 (stopped day 5, reported day 8, fixed day 13); stopped again days 40–41. */
    private static double[] series() {
        double[] hours = new double[42];
        Arrays.fill(hours, 6);
        Arrays.fill(hours, 5, 13, 0);
        Arrays.fill(hours, 40, 42, 0);
        return hours;
    }

    @Test
    void theDaysFromTheStopBeforeTheReportToTheFixAreLeftOut() {
        double[] hours = series();
        hours[6] = Double.NaN; // a day with no reading neither breaks nor lengthens the run before the report
        double[] kept = RecordedDowntime.leaveOut(hours, List.of(new RecordedDowntime.Breakdown(8, 13)), 0.1);
        assertEquals(6, kept[4]);
        for (int d = 5; d < 13; d++) {
            assertTrue(Double.isNaN(kept[d]), "day " + d);
        }
        assertEquals(6, kept[13]);
        assertEquals(0, kept[41], "the stop not on record is kept");
        assertEquals(0, hours[5], "the input is not changed");
    }

    @Test
    void anEarlierBreakdownOnRecordNoLongerMakesTheNextStopLookLikeIdling() {
        double[] hours = series();
        // Counted as idle, the 8 broken days give q = 9/30: two days of nothing leave, by Shiryaev's posterior
        // (StopPosteriorTest), down π + π(1 − π)q against idle (1 − π)²q², P = 0.0382.
        StopDetector.Verdict counted = DETECTOR.judge(hours);
        assertEquals(StopDetector.State.STOPPED, counted.state());
        assertEquals(twoDaysDown(0.3), counted.probabilityDown(), 1e-9);
        assertEquals(0.038246, counted.probabilityDown(), 1e-6);
        // Left out: 20 days read, none idle, q = 1/22; P = 0.582, over the flag's 0.5.
        StopDetector.Verdict leftOut = DETECTOR.judge(RecordedDowntime.leaveOut(hours,
                List.of(new RecordedDowntime.Breakdown(8, 13)), StopSettings.DEFAULT.stopFraction()));
        assertEquals(StopDetector.State.STOPPED, leftOut.state());
        assertEquals(twoDaysDown(1.0 / 22), leftOut.probabilityDown(), 1e-9);
        assertEquals(0.582248, leftOut.probabilityDown(), 1e-6);
    }

    /** Two near-nothing days at a pump judged alone with share q of near-nothing days, π = 1/365. */
    private static double twoDaysDown(double q) {
        double pi = 1.0 / 365, down = pi + pi * (1 - pi) * q;
        return down / (down + (1 - pi) * (1 - pi) * q * q);
    }

    @Test
    void anOpenRepairRunsToTheEndAndOnesOutsideTheWindowChangeNothing() {
        double[] hours = series();
        double[] open = RecordedDowntime.leaveOut(hours, List.of(new RecordedDowntime.Breakdown(41, 99)), 0.1);
        assertTrue(Double.isNaN(open[40]) && Double.isNaN(open[41]) && open[39] == 6);
        assertTrue(Arrays.equals(hours, RecordedDowntime.leaveOut(hours, List.of(
                new RecordedDowntime.Breakdown(-30, -2), new RecordedDowntime.Breakdown(42, 50)), 0.1)));
    }
}
