package org.depotcast.forecasting;

/**
 * A pump's days in service, operating hours and mid-period age in each of a run of periods: the same for every
 * component family, so worked out once per pump and read by each family's model.
 *
 * @param days     days in service in period m (0 when none)
 * @param hours    operating hours in period m
 * @param ageYears age at the middle of the days in service in period m
 */
record PumpExposure(long[] days, double[] hours, double[] ageYears) {
    private static final double DAYS_PER_YEAR = 365.25;

    /**
     * @param periodStart the periods' first days as epoch days, one more than there are periods (the last closes
     *                    the last period)
     * @param notBefore   no exposure before this epoch day (the fit leaves out the days before the first repair on
     *                    record); {@link Long#MIN_VALUE} for none
     */
    static PumpExposure of(FleetSnapshot.PumpRecord pump, long[] periodStart, long notBefore) {
        int periods = periodStart.length - 1;
        PumpExposure exposure = new PumpExposure(new long[periods], new double[periods], new double[periods]);
        for (int m = 0; m < periods; m++) {
            long from = Math.max(Math.max(periodStart[m], pump.installedDay()), notBefore);
            long to = Math.min(periodStart[m + 1], pump.endDay());
            if (to > from) {
                exposure.days[m] = to - from;
                exposure.hours[m] = pump.usage().hoursBetween(from, to);
                exposure.ageYears[m] = ((from + to) / 2.0 - pump.installedDay()) / DAYS_PER_YEAR;
            }
        }
        return exposure;
    }
}
