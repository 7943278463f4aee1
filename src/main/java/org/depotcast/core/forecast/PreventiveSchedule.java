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
