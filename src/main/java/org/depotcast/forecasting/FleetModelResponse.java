package org.depotcast.forecasting;

import org.depotcast.core.forecast.RateCovariate;

import java.util.Map;

/**
 * A family's fitted fleet model. Coefficients are on the log scale per operating hour; {@code eventsPer1000Hours}
 * is exp(intercept) × 1000, the rate of a new pump at 30 m (all covariates zero).
 */
public record FleetModelResponse(String family, long runId, String source, Map<String, Double> coefficients,
                                 Map<String, Double> standardErrors, Double deviance, Integer dfResidual,
                                 Double dispersion, boolean overdispersed, int events, double exposureHours,
                                 double unitsPerEvent, double eventsPer1000Hours) {
    /**
     * The fitted breakdown rate per operating hour of one pump: exp(intercept + Σ coefficient × covariate), each
     * term computed as the fit made it ({@link RateCovariate#value}). Depot ratios are not applied.
     */
    public double eventsPerHour(double depthM, double ageYears, double hoursPerDay) {
        double eta = coefficients.getOrDefault("intercept", 0.0);
        for (Map.Entry<String, Double> term : coefficients.entrySet()) {
            if (!term.getKey().equals("intercept")) {
                eta += term.getValue() * RateCovariate.valueOf(term.getKey().toUpperCase(java.util.Locale.ROOT))
                        .value(depthM, ageYears, hoursPerDay);
            }
        }
        return Math.exp(eta);
    }
}
