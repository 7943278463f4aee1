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

    /**
     * What a pump's sensor read from the day its hours are counted from up to today, today not included (the span
     * the estimate covers and {@link #project(LocalDate, PumpUsage)} divides by): hours read on the days read, how
     * many days were read, and its last days read (oldest first).
     */
    public record Measured(double hoursRead, int daysRead, double[] lastDaysRead) {
        public Measured {
            if (!(hoursRead >= 0) || daysRead < 0) {
                throw new IllegalArgumentException("hoursRead and daysRead must not be negative: " + hoursRead + ", "
                        + daysRead);
            }
        }
    }

    /**
     * A pump's use since its last service.
     *
     * @param countedFrom          the day the hours are counted from (the last service, else installation, else the
     *                             first day on record)
     * @param estimatedHoursSince  the recorded estimate of the hours from {@code countedFrom} to today
     * @param estimatedHoursPerDay the recorded load in force today
     * @param measured             what its sensor read since {@code countedFrom}; null for a pump without one
     */
    public record PumpUsage(LocalDate countedFrom, int intervalHours, double estimatedHoursSince,
                            double estimatedHoursPerDay, Measured measured) {
    }

    private ServiceByHours() {
    }

    /**
     * The one projection every reader uses. Without a sensor: the recorded estimate and load. With one: the hours read,
     * plus the estimate's share of the days not read (the estimate taken as even over the span from {@code
     * countedFrom} to today, today not included, at least one day; the days read count the same span), projected at
     * the mean of the last days read.
     */
    public static Projection project(LocalDate today, PumpUsage usage) {
        Measured m = usage.measured();
        if (m == null) {
            return project(today, usage.intervalHours(), 0, usage.estimatedHoursSince(), new double[0],
                    usage.estimatedHoursPerDay());
        }
        long spanDays = Math.max(1, today.toEpochDay() - usage.countedFrom().toEpochDay());
        double unreadShare = Math.max(0, 1 - (double) m.daysRead() / spanDays);
        return project(today, usage.intervalHours(), m.hoursRead(), usage.estimatedHoursSince() * unreadShare,
                m.lastDaysRead(), usage.estimatedHoursPerDay());
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
