package org.depotcast.forecasting;

import java.util.List;

/**
 * A family's fleet model as the explorer shows it: each term with its 95 % interval (quasi-Poisson where the fit is
 * overdispersed), and the expected breakdowns per pump-year against depth and against daily use, the other
 * covariates held at the stated reference pump.
 */
public record FleetModelView(FleetModelResponse fit, List<Term> terms, ReferencePump reference,
                             List<RatePoint> byDepth, List<RatePoint> byDailyUse, String note) {

    /**
     * One coefficient on the log scale with its interval, and the same as a rate ratio (exp) per unit of the
     * covariate; {@code words} says what one unit is.
     */
    public record Term(String name, String words, double estimate, Double standardError, Double low95, Double high95,
                       double rateRatio, Double rateRatioLow95, Double rateRatioHigh95) {
    }

    public record ReferencePump(double depthM, double hoursPerDay, double ageYears) {
    }

    /** Breakdowns expected per pump-year and units used per pump-year at one value of the varied covariate. */
    public record RatePoint(double value, double breakdownsPerPumpYear, double unitsPerPumpYear) {
    }
}
