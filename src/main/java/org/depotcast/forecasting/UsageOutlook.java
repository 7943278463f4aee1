package org.depotcast.forecasting;

/**
 * A pump's daily load over the horizon and how uncertain it is. The load forecast is its last reading before the
 * origin (the mean over its last 12 months was tried: on four generated programmes it forecast no better, so the
 * plainer rule stays; see {@link #meanOverYear}). The uncertainty is measured
 * on the fleet's own records: the same estimate made a quarter before the origin is compared with the hours then
 * run, and σ² = mean of ln(run / forecast)² over the pumps in service all that quarter (so a drift of the whole
 * fleet counts too). That σ is the usage multiplier's log-scale spread used by
 * {@link org.depotcast.core.forecast.ServiceTiming}; a quarter because a service about to fall due is decided by the
 * next few months' load, which strays further from a yearly mean than a whole year's does.
 */
final class UsageOutlook {
    /** Used when fewer than {@link #MIN_PUMPS} pumps can be checked: a reading a quarter, about ±25 % a year. */
    static final double DEFAULT_LOG_SD = 0.25;
    static final int MIN_PUMPS = 20;
    private static final int YEAR_DAYS = 365;
    private static final int CHECK_DAYS = 91;
    private static final int MIN_DAYS = 30;

    private final long origin;
    private final double logSd;
    private final int pumpsChecked;

    UsageOutlook(FleetSnapshot snapshot) {
        this.origin = snapshot.historyEnd().toEpochDay();
        long checkFrom = origin - CHECK_DAYS;
        double sumSquares = 0;
        int n = 0;
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            if (pump.installedDay() > checkFrom - MIN_DAYS || pump.endDay() < origin) {
                continue;
            }
            double forecast = hoursPerDay(pump, checkFrom) * (origin - checkFrom);
            double run = pump.usage().hoursBetween(checkFrom, origin);
            if (forecast > 0 && run > 0) {
                double log = Math.log(run / forecast);
                sumSquares += log * log;
                n++;
            }
        }
        this.pumpsChecked = n;
        this.logSd = n >= MIN_PUMPS ? Math.sqrt(sumSquares / n) : DEFAULT_LOG_SD;
    }

    /** The daily load expected over the horizon from the origin. */
    double hoursPerDay(FleetSnapshot.PumpRecord pump) {
        return hoursPerDay(pump, origin);
    }

    /** The load in force the day before {@code day}: the last reading before it, or the registered load. */
    static double hoursPerDay(FleetSnapshot.PumpRecord pump, long day) {
        return pump.usage().hoursPerDayOn(day - 1);
    }

    /** Mean daily load over the year before {@code day} (or since installation, if at least 30 days). */
    static double meanOverYear(FleetSnapshot.PumpRecord pump, long day) {
        long from = Math.max(day - YEAR_DAYS, pump.installedDay());
        if (day - from < MIN_DAYS) {
            return pump.usage().hoursPerDayOn(day - 1);
        }
        return pump.usage().hoursBetween(from, day) / (day - from);
    }

    double logSd() {
        return logSd;
    }

    int pumpsChecked() {
        return pumpsChecked;
    }
}
