package org.depotcast.core.stats;

/**
 * The sample quantile of sorted values by linear interpolation between order statistics: Hyndman & Fan's type 7
 * (R's default, "Sample quantiles in statistical packages", The American Statistician 50(4):361–365, 1996). At p = 0.5
 * it is the usual median: the middle value, or the mean of the two middle values.
 */
public final class SampleQuantile {
    private SampleQuantile() {
    }

    /** The type-7 quantile at {@code p} in [0, 1] of values already sorted ascending (at least one). */
    public static double of(double[] sorted, double p) {
        if (sorted.length == 0 || !(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("need at least one value and 0 ≤ p ≤ 1; had " + sorted.length
                    + " values, p = " + p);
        }
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }

    /** The median of values already sorted ascending. */
    public static double median(double[] sorted) {
        return of(sorted, 0.5);
    }
}
