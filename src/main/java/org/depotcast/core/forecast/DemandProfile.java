package org.depotcast.core.forecast;

/**
 * Diagnostics of one demand series. Conventions (stated because libraries differ):
 * <ul>
 *   <li>ADI is the mean interval between demands, the first interval counting leading zeros (the 1-based position
 *   of the first demand), as in R forecast's Croston initialisation.</li>
 *   <li>CV² uses the sample (n−1) standard deviation of the non-zero sizes; NaN with fewer than two demands.</li>
 * </ul>
 *
 * @param adi             average inter-demand interval, periods
 * @param cv2             squared coefficient of variation of non-zero demand sizes
 * @param demandClass     Syntetos–Boylan–Croston class
 * @param periods         length of the series
 * @param demands         number of periods with demand
 * @param zeroShare       share of periods without demand
 * @param leadingZeros    zeros before the first demand (a sign of phase-in)
 * @param trailingZeros   zeros after the last demand (a sign of phase-out or obsolescence)
 */
public record DemandProfile(double adi, double cv2, DemandClass demandClass, int periods, int demands,
                            double zeroShare, int leadingZeros, int trailingZeros) {

    public static DemandProfile of(double[] history) {
        Series.requireValid(history);
        int n = history.length;
        int demands = 0, first = -1, last = -1;
        double sum = 0, sumSq = 0;
        for (int t = 0; t < n; t++) {
            double y = history[t];
            if (y > 0) {
                demands++;
                sum += y;
                sumSq += y * y;
                if (first < 0) {
                    first = t;
                }
                last = t;
            }
        }
        if (demands == 0) {
            return new DemandProfile(Double.NaN, Double.NaN, DemandClass.TOO_LITTLE_HISTORY, n, 0, 1.0, n, n);
        }
        // Intervals sum to the position of the last demand (1-based) when the first counts its leading zeros.
        double adi = (last + 1.0) / demands;
        double cv2 = Double.NaN;
        if (demands >= 2) {
            double mean = sum / demands;
            double variance = (sumSq - demands * mean * mean) / (demands - 1);
            cv2 = Math.max(0, variance) / (mean * mean);
        }
        DemandClass cls = demands < 2 ? DemandClass.TOO_LITTLE_HISTORY : DemandClass.of(adi, cv2);
        return new DemandProfile(adi, cv2, cls, n, demands, 1.0 - (double) demands / n, first, n - 1 - last);
    }
}
