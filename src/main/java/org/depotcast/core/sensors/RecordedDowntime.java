package org.depotcast.core.sensors;

import java.util.Arrays;
import java.util.List;

/**
 * Takes a pump's recorded breakdowns out of the days the {@link StopDetector} judges, so that downtime already
 * explained by a repair is not read as the pump idling.
 *
 * <p>Why: the detector's probability that a stopped pump is down rests on how often that pump had near-nothing days
 * in its baseline (Laplace's rule). Days the pump stood broken before an earlier repair was fixed are near nothing
 * too; counted as idle days, they make the next stop look ordinary for that pump for weeks after the fix. The
 * repair records say those days were a breakdown, not idling, so they are left out as if not read: the days from the
 * repair's report to its fix, and the run of near-nothing days read just before the report (the stop that led to
 * it; days with no reading neither break nor lengthen the run). Near nothing here is as in the detector: at most
 * {@code stopFraction} of the mean of the days read in the window before the report, or 0.25 h.
 */
public final class RecordedDowntime {
    /**
     * A recorded breakdown as day indices of the window (negative or past its end where it falls outside).
     *
     * @param reportedIndex the day it was reported
     * @param fixedIndex    the day it was fixed (exclusive end of the downtime); use any index past the window's end
     *                      for a repair not fixed
     */
    public record Breakdown(int reportedIndex, int fixedIndex) {
    }

    private static final double NEAR_NOTHING_HOURS = 0.25;

    private RecordedDowntime() {
    }

    /** A copy of {@code hours} with the recorded breakdowns' downtime set to NaN (not read). */
    public static double[] leaveOut(double[] hours, List<Breakdown> breakdowns, double stopFraction) {
        double[] kept = Arrays.copyOf(hours, hours.length);
        for (Breakdown b : breakdowns) {
            if (b.fixedIndex() <= 0 || b.reportedIndex() >= hours.length) {
                continue;
            }
            double nearNothing = Math.max(NEAR_NOTHING_HOURS, stopFraction * meanRead(hours, b.reportedIndex()));
            int from = Math.max(0, b.reportedIndex());
            for (int d = Math.min(hours.length, b.reportedIndex()) - 1; d >= 0; d--) {
                if (!Double.isNaN(hours[d]) && hours[d] > nearNothing) {
                    break;
                }
                from = d;
            }
            Arrays.fill(kept, from, Math.min(hours.length, b.fixedIndex()), Double.NaN);
        }
        return kept;
    }

    private static double meanRead(double[] hours, int before) {
        double sum = 0;
        int read = 0;
        for (int d = 0; d < Math.min(hours.length, before); d++) {
            if (!Double.isNaN(hours[d])) {
                sum += hours[d];
                read++;
            }
        }
        return read == 0 ? 0 : sum / read;
    }
}
