package org.depotcast.fleet;

import java.util.List;

/**
 * Daily load measured by pump sensors, one point per pump and month (hours per day over the days read), implemented
 * by the sensors feature, which depends on fleet. {@link UsageService#allReadings()} puts these points in place of the
 * typed-in quarterly estimates for the months they cover, so every reader of the usage history (the forecasting
 * snapshot, the service-due list) uses measured hours where a pump has them.
 */
public interface MeasuredLoads {
    /** Points dated the first day of each month with enough days read, oldest first per pump. */
    List<UsageReadingRow> monthlyLoads();
}
