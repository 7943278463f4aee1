package org.depotcast.core.sensors;

import java.time.LocalDate;

/**
 * When a pump reaches its service interval, counting its measured operating hours.
 *
 * <p>Hours since the last service = the hours its sensor read on the days it read since then, plus, for the days in
 * that span with no reading (before the sensor, or gaps), the recorded estimate of those days ({@code
 * estimatedHoursUnread}). Recent daily load = the mean of the last {@value #RECENT_DAYS} days read (missing days
 * left out, not counted as zero). The service falls due after (interval − hours since) ÷ load days, rounded up to
 * whole days: due on today + that many days (in the past when overdue, today when due now). A pump with no load is
 * never projected due.
 */
public final class ServiceByHours {
    /** Days of readings that make the recent daily load. */
    public static final int RECENT_DAYS = 28;
    /** Common practice for lever-action hand pumps when a programme sets no interval of its own. */
    public static final int DEFAULT_INTERVAL_HOURS = 9_125;

    /** Hours since the service, the load they are projected at, hours left and the day due (null: not in use). */
    public record Projection(double hoursSinceService, double recentHoursPerDay, double hoursLeft, LocalDate dueOn) {
    }

    private ServiceByHours() {
    }

    /**
     * @param measuredHours         hours read on days read since the service
     * @param estimatedHoursUnread  the recorded estimate for the days since the service with no reading
     * @param recentDaysRead        the last days read, oldest first (at most {@link #RECENT_DAYS} are used)
     * @param fallbackHoursPerDay   the load when no day was read (the recorded estimate)
     */
    public static Projection project(LocalDate today, int intervalHours, double measuredHours,
                                     double estimatedHoursUnread, double[] recentDaysRead, double fallbackHoursPerDay) {
        if (intervalHours <= 0) {
            throw new IllegalArgumentException("intervalHours must be positive: " + intervalHours);
        }
        if (measuredHours < 0 || estimatedHoursUnread < 0 || fallbackHoursPerDay < 0) {
            throw new IllegalArgumentException("hours must not be negative: " + measuredHours + ", "
                    + estimatedHoursUnread + ", " + fallbackHoursPerDay);
        }
        double since = measuredHours + estimatedHoursUnread;
        double load = fallbackHoursPerDay;
        int used = Math.min(RECENT_DAYS, recentDaysRead.length);
        if (used > 0) {
            double sum = 0;
            for (int i = recentDaysRead.length - used; i < recentDaysRead.length; i++) {
                sum += recentDaysRead[i];
            }
            load = sum / used;
        }
        double left = intervalHours - since;
        if (load <= 0) {
            return new Projection(since, load, left, null);
        }
        long days = left <= 0 ? (long) Math.floor(left / load) : (long) Math.ceil(left / load - 1e-9);
        return new Projection(since, load, left, today.plusDays(days));
    }
}
