package org.depotcast.core.forecast;

import java.util.List;
import java.util.Locale;

/**
 * Covariates a fleet rate model can use, each computed for one pump over one period. Rates are per operating hour,
 * so the daily load already acts through the exposure; {@link #USAGE_HOURS} tests for an extra effect of load.
 */
public enum RateCovariate {
    /** log(depth / 30 m): load on rods, pipes and seals grows with depth; 0 at the reference depth of 30 m. */
    LOG_DEPTH,
    /** Years since installation at the middle of the period. */
    AGE_YEARS,
    /** Mean hours of use a day over the period. */
    USAGE_HOURS;

    /** Depth at which {@link #LOG_DEPTH} is zero. */
    public static final double REFERENCE_DEPTH_M = 30.0;

    /** The covariate's value for a pump of this depth, age and daily load. */
    public double value(double depthM, double ageYears, double hoursPerDay) {
        return switch (this) {
            case LOG_DEPTH -> Math.log(depthM / REFERENCE_DEPTH_M);
            case AGE_YEARS -> ageYears;
            case USAGE_HOURS -> hoursPerDay;
        };
    }

    /** The term's name as files and answers spell it: {@code log_depth}, {@code age_years}, {@code usage_hours}. */
    public String term() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The values of several covariates, in their order (the design row of a fit, intercept not included). */
    public static double[] values(List<RateCovariate> covariates, double depthM, double ageYears, double hoursPerDay) {
        double[] values = new double[covariates.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = covariates.get(i).value(depthM, ageYears, hoursPerDay);
        }
        return values;
    }
}
