package org.depotcast.core.forecast;

/**
 * One pump's coming months from an origin: the operating hours it runs in each and its age at each month's middle.
 * Months are calendar months (February's exposure is 28 days, not a twelfth of a year), cut at the pump's
 * installation and end of service. A {@code survivalPerYear} below 1 thins the hours by the share of such pumps
 * expected still in service, counted from the origin or the installation, whichever is later.
 *
 * @param hoursPerDay the daily load the months assume
 * @param hours       operating hours in each month
 * @param ageYears    years since installation at the middle of each month (0 before it)
 */
public record PumpMonths(double hoursPerDay, double[] hours, double[] ageYears) {
    private static final double DAYS_PER_YEAR = 365.25;

    public PumpMonths {
        if (!(hoursPerDay >= 0) || hours.length != ageYears.length) {
            throw new IllegalArgumentException("hoursPerDay must be ≥ 0 and one age per month; were " + hoursPerDay
                    + ", " + hours.length + " months and " + ageYears.length + " ages");
        }
    }

    /**
     * @param monthStart     epoch day each month starts, then the day after the last (length = months + 1)
     * @param installedDay   epoch day of installation
     * @param endDay         epoch day the pump leaves service (exclusive)
     * @param hoursPerDay    expected daily load
     * @param survivalPerYear share of pumps still in service after a year (1 for none leaving)
     */
    public static PumpMonths of(long[] monthStart, long installedDay, long endDay, double hoursPerDay,
                                double survivalPerYear) {
        if (monthStart.length < 1 || !(survivalPerYear >= 0 && survivalPerYear <= 1)) {
            throw new IllegalArgumentException("monthStart must hold at least one day and survivalPerYear be in [0, 1]; were "
                    + monthStart.length + " days and " + survivalPerYear);
        }
        int months = monthStart.length - 1;
        double[] hours = new double[months], ages = new double[months];
        long origin = monthStart[0];
        long survivalFrom = Math.max(origin, installedDay);
        double ageAtOrigin = (origin - installedDay) / DAYS_PER_YEAR;
        for (int m = 0; m < months; m++) {
            long from = monthStart[m], to = monthStart[m + 1];
            double length = to - from;
            double inService = Math.min(to, endDay) - Math.max(from, installedDay);
            double serviceDays = length * Math.max(0, Math.min(1, inService / length));
            hours[m] = hoursPerDay * serviceDays;
            if (survivalPerYear < 1) {
                double middle = (from + to) / 2.0;
                hours[m] *= Math.pow(survivalPerYear, Math.max(0, middle - survivalFrom) / DAYS_PER_YEAR);
            }
            ages[m] = Math.max(0, ageAtOrigin + (m + 0.5) / 12);
        }
        return new PumpMonths(hoursPerDay, hours, ages);
    }

    public int months() {
        return hours.length;
    }
}
