package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

class FleetMathTest {
    @Test
    void hoursFollowTheReadingsInForce() {
        // 5 h/day from day 0, 2 h/day from day 10: days 5..15 give 5×5 + 5×2 = 35 h.
        UsageTimeline timeline = new UsageTimeline(new long[]{0, 10}, new double[]{5, 2}, 5);
        assertEquals(35, timeline.hoursBetween(5, 15), 1e-12);
        assertEquals(50, timeline.hoursBetween(-10, 0), 1e-12);    // before the first reading, its value holds
        assertEquals(2, timeline.hoursPerDayOn(400), 1e-12);
        assertEquals(0, timeline.hoursBetween(20, 20), 1e-12);
        assertEquals(1825, new UsageTimeline(new long[0], new double[0], 5).hoursBetween(0, 365), 1e-12);
    }

    @Test
    void servicesFallDueWhenHoursCrossTheInterval() {
        // 9,125 h interval (common practice), 9,000 h accumulated, 150 h a month (5 h/day): due in month 1.
        double[] months = {150, 150, 150};
        assertArrayEquals(new int[]{1, 0, 0}, PreventiveSchedule.servicesDue(9_000, months, 9_125));
        assertArrayEquals(new int[]{0, 0, 0}, PreventiveSchedule.servicesDue(0, months, 9_125));
        // overdue pumps are serviced at once
        assertArrayEquals(new int[]{1, 0, 0}, PreventiveSchedule.servicesDue(9_500, months, 9_125));
    }

    @Test
    void unknownLastServiceUsesTheRenewalRate() {
        // 1,825 h a year (5 h/day) against 9,125 h: 0.2 services a year, 1/60 a month of 152.08 h.
        double[] months = new double[12];
        java.util.Arrays.fill(months, 1825.0 / 12);
        double[] expected = PreventiveSchedule.expectedServices(months, 9_125, 0);
        assertEquals(0.2, java.util.Arrays.stream(expected).sum(), 1e-12);
        // No service in the last 5,475 h on record: the next falls within the remaining 3,650 h, so a year of
        // 1,825 h expects 1,825 / 3,650 = 0.5 services (hand-worked).
        assertEquals(0.5, java.util.Arrays.stream(PreventiveSchedule.expectedServices(months, 9_125, 5_475)).sum(), 1e-12);
        // Overdue: serviced in the first month.
        assertEquals(1.0, PreventiveSchedule.expectedServices(months, 9_125, 9_500)[0], 1e-12);
    }
}
