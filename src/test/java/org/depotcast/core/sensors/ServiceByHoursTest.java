package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Service-due dates on hand-worked pumps. */
class ServiceByHoursTest {
    private static final LocalDate TODAY = LocalDate.of(2026, 12, 2);

    @Test
    void measuredAndEstimatedHoursAddAndTheRecentLoadProjectsTheDay() {
        // 8,000 h read plus 600 h estimated for unread days = 8,600 h; 525 h left of 9,125.
        // Last 28 days read: 14 at 6 h and 14 at 8 h = 7 h a day (older days beyond 28 are not used).
        double[] recent = new double[30];
        Arrays.fill(recent, 0, 2, 20);
        Arrays.fill(recent, 2, 16, 6);
        Arrays.fill(recent, 16, 30, 8);
        ServiceByHours.Projection p = ServiceByHours.project(TODAY, ServiceByHours.DEFAULT_INTERVAL_HOURS, 8_000, 600,
                recent, 5);
        assertEquals(8_600, p.hoursSinceService(), 1e-9);
        assertEquals(7.0, p.recentHoursPerDay(), 1e-12);
        assertEquals(525, p.hoursLeft(), 1e-9);
        // 525 / 7 = 75 days exactly: due on 2027-02-15.
        assertEquals(LocalDate.of(2027, 2, 15), p.dueOn());
    }

    @Test
    void aPartDayRoundsUpAndAnOverduePumpIsDatedInThePast() {
        // 100 h left at 6 h a day = 16.7 days → due in 17 days.
        assertEquals(TODAY.plusDays(17), ServiceByHours.project(TODAY, 1000, 900, 0, new double[]{6}, 5).dueOn());
        // 60 h past the interval at 5 h a day (no day read: the recorded load) → reached 12 days ago.
        assertEquals(TODAY.minusDays(12), ServiceByHours.project(TODAY, 1000, 0, 1060, new double[0], 5).dueOn());
    }

    @Test
    void aPumpNotInUseIsNeverDueAndBadInputIsRefused() {
        assertNull(ServiceByHours.project(TODAY, 1000, 10, 0, new double[]{0, 0}, 5).dueOn());
        assertThrows(IllegalArgumentException.class, () -> ServiceByHours.project(TODAY, 0, 0, 0, new double[0], 5));
    }

    @Test
    void aPumpUsageTakesTheEstimateWithoutASensorAndTheDaysReadWithOne() {
        // No sensor: 5,000 h estimated since the service at 5 h a day; 4,125 h left = 825 days.
        ServiceByHours.Projection estimate = ServiceByHours.project(TODAY, new ServiceByHours.PumpUsage(
                TODAY.minusDays(1000), 9_125, 5_000, 5, null));
        assertEquals(5_000, estimate.hoursSinceService(), 1e-9);
        assertEquals(TODAY.plusDays(825), estimate.dueOn());
        // A sensor read 70 of the 100 days since the service, 560 h; the estimate of 500 h keeps 30 % for the days
        // not read: 560 + 150 = 710 h; 290 h left at the last days' 8 h a day = 36.25 → 37 days.
        double[] last = new double[28];
        Arrays.fill(last, 8);
        ServiceByHours.Projection measured = ServiceByHours.project(TODAY, new ServiceByHours.PumpUsage(
                TODAY.minusDays(100), 1_000, 500, 5, new ServiceByHours.Measured(560, 70, last)));
        assertEquals(710, measured.hoursSinceService(), 1e-9);
        assertEquals(8, measured.recentHoursPerDay(), 1e-12);
        assertEquals(TODAY.plusDays(37), measured.dueOn());
        assertThrows(IllegalArgumentException.class, () -> new ServiceByHours.Measured(-1, 0, new double[0]));
    }
}
