package org.depotcast.fleet;

import org.depotcast.core.sensors.ServiceByHours;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * Daily load measured by pump sensors, implemented by the sensors feature, which depends on fleet. {@link
 * UsageService#allReadings()} puts the monthly points in place of the typed-in quarterly estimates for the months
 * they cover, so every reader of the usage history (the forecasting snapshot, the service-due list) uses measured
 * hours where a pump has them; {@link UsageService#measuredSince} gives the days read, for service by hours.
 */
public interface MeasuredLoads {
    /** Points dated the first day of each month with enough days read, oldest first per pump. */
    List<UsageReadingRow> monthlyLoads();

    /**
     * Per pump, its readings on the days from its own first day (inclusive) to {@code until} (exclusive: the span
     * {@link ServiceByHours#project} divides by, as the recorded estimate counts it), the last {@code lastDaysKept}
     * days read kept, oldest first; pumps with no month read in the span's months are absent.
     */
    Map<Long, ServiceByHours.Measured> measuredSince(Map<Long, LocalDate> firstDays, LocalDate until,
                                                     int lastDaysKept);
}
