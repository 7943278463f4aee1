package org.depotcast.sensors;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * A pump's measured operating hours in one calendar month: the sum of its daily readings, and on how many of the
 * month's days a reading came in (a partial month shows as {@code daysCovered < daysInMonth}; missing days are
 * missing, not zero).
 */
public record MonthlyOperatingHours(long pumpId, LocalDate monthStart, BigDecimal hours, int daysCovered,
                                    int daysInMonth) {
    /** Hours per day over the days read; null when no day was read. */
    public Double hoursPerDayRead() {
        return daysCovered == 0 ? null : hours.doubleValue() / daysCovered;
    }
}
