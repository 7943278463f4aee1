package org.depotcast.core.forecast;

/**
 * Preventive-maintenance demand, deterministic: a pump is serviced each time its operating hours since the last
 * service (days × hours/day) reach the model's service interval (common practice: 9,125 h, five years at the
 * 5 h/day design load). Returns, for each of the coming months, how many services fall due.
 */
public final class PreventiveSchedule {
    private PreventiveSchedule() {
    }

    /**
     * Expected services per month when the date of the last service is not known, only that none happened in the
     * last {@code hoursWithoutService} operating hours on record. With the pump's place in its service cycle
     * otherwise uniform, the next service falls uniformly within the remaining (interval − W) hours and every
     * interval after it: E[services by H] = Σ_k clamp((H − k·interval) / (interval − W), 0, 1). With W = 0 this is
     * the long-run renewal rate H / interval; a pump with W ≥ interval is overdue and serviced in the first month.
     */
    public static double[] expectedServices(double[] hoursPerMonth, double intervalHours, double hoursWithoutService) {
        if (!(intervalHours > 0) || hoursWithoutService < 0) {
            throw new IllegalArgumentException("intervalHours must be > 0 and hoursWithoutService ≥ 0");
        }
        double[] expected = new double[hoursPerMonth.length];
        if (hoursWithoutService >= intervalHours) {
            return servicesDuePerMonth(hoursWithoutService, hoursPerMonth, intervalHours);
        }
        double window = intervalHours - hoursWithoutService;
        double cumulative = 0, before = 0;
        for (int m = 0; m < expected.length; m++) {
            cumulative += hoursPerMonth[m];
            double count = 0;
            for (int k = 0; k * intervalHours <= cumulative; k++) {
                count += Math.min(1, Math.max(0, (cumulative - k * intervalHours) / window));
            }
            expected[m] = count - before;
            before = count;
        }
        return expected;
    }

    /** {@link #servicesDue} as numbers, the form in which expected and known services are added up. */
    public static double[] servicesDuePerMonth(double hoursSinceService, double[] hoursPerMonth, double intervalHours) {
        int[] due = servicesDue(hoursSinceService, hoursPerMonth, intervalHours);
        double[] out = new double[due.length];
        for (int m = 0; m < due.length; m++) {
            out[m] = due[m];
        }
        return out;
    }

    /**
     * @param hoursSinceService operating hours accumulated since the last service (or installation)
     * @param hoursPerMonth     expected operating hours in each coming month
     * @param intervalHours     service interval in operating hours (&gt; 0)
     * @return services due in each month (0, 1, rarely more)
     */
    public static int[] servicesDue(double hoursSinceService, double[] hoursPerMonth, double intervalHours) {
        if (!(intervalHours > 0)) {
            throw new IllegalArgumentException("intervalHours must be > 0, was " + intervalHours);
        }
        if (hoursSinceService < 0) {
            throw new IllegalArgumentException("hoursSinceService must be ≥ 0, was " + hoursSinceService);
        }
        int[] due = new int[hoursPerMonth.length];
        double accumulated = hoursSinceService;
        // An overdue pump is serviced in the first month.
        while (accumulated >= intervalHours) {
            due[0]++;
            accumulated -= intervalHours;
        }
        for (int m = 0; m < hoursPerMonth.length; m++) {
            accumulated += hoursPerMonth[m];
            while (accumulated >= intervalHours) {
                due[m]++;
                accumulated -= intervalHours;
            }
        }
        return due;
    }
}
