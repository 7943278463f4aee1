package org.depotcast.core.forecast;

/**
 * A pump's daily load over time: each reading holds from its day until the next; before the first reading the first
 * value holds. Days are epoch days. Operating hours over [from, to) = Σ days × hours/day.
 */
public final class UsageTimeline {
    private final long[] days;
    private final double[] hoursPerDay;

    /**
     * @param readingDays  epoch days of the readings, ascending
     * @param hoursPerDay  hours of use a day from each reading on
     * @param fallbackHours used when there is no reading at all (the 5 h/day design load is common practice)
     */
    public UsageTimeline(long[] readingDays, double[] hoursPerDay, double fallbackHours) {
        if (readingDays.length != hoursPerDay.length) {
            throw new IllegalArgumentException("readingDays and hoursPerDay must have the same length");
        }
        for (int i = 1; i < readingDays.length; i++) {
            if (readingDays[i] < readingDays[i - 1]) {
                throw new IllegalArgumentException("readingDays must be ascending at index " + i);
            }
        }
        if (readingDays.length == 0) {
            this.days = new long[]{Long.MIN_VALUE / 2};
            this.hoursPerDay = new double[]{fallbackHours};
        } else {
            this.days = readingDays.clone();
            this.hoursPerDay = hoursPerDay.clone();
            this.days[0] = Long.MIN_VALUE / 2;
        }
    }

    /** Operating hours on days from (inclusive) to (exclusive). */
    public double hoursBetween(long from, long to) {
        if (to <= from) {
            return 0;
        }
        double hours = 0;
        for (int i = 0; i < days.length; i++) {
            long segmentStart = Math.max(from, days[i]);
            long segmentEnd = Math.min(to, i + 1 < days.length ? days[i + 1] : Long.MAX_VALUE / 2);
            if (segmentEnd > segmentStart) {
                hours += (segmentEnd - segmentStart) * hoursPerDay[i];
            }
        }
        return hours;
    }

    /** The daily load in force on a day. */
    public double hoursPerDayOn(long day) {
        int i = days.length - 1;
        while (i > 0 && days[i] > day) {
            i--;
        }
        return hoursPerDay[i];
    }
}
