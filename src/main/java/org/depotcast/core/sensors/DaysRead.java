package org.depotcast.core.sensors;

/** Small questions about a pump's days, NaN for a day with no reading, for {@link StopDetector}. */
final class DaysRead {
    private DaysRead() {
    }

    /** The index of the last day read when it is near nothing and in the watched days, else −1. */
    static int lastNearNothing(double[] hours, int from, double nearNothing) {
        for (int i = hours.length - 1; i >= from; i--) {
            if (!Double.isNaN(hours[i])) {
                return hours[i] <= nearNothing ? i : -1;
            }
        }
        return -1;
    }

    static double last(double[] hours) {
        for (int i = hours.length - 1; i >= 0; i--) {
            if (!Double.isNaN(hours[i])) {
                return hours[i];
            }
        }
        return Double.NaN;
    }

    /** Days read in [from, to). */
    static int count(double[] hours, int from, int to) {
        int read = 0;
        for (int i = Math.max(0, from); i < to; i++) {
            read += Double.isNaN(hours[i]) ? 0 : 1;
        }
        return read;
    }

    static boolean none(double[] hours, int from, int to) {
        for (int i = Math.max(0, from); i < to; i++) {
            if (!Double.isNaN(hours[i])) {
                return false;
            }
        }
        return true;
    }
}
