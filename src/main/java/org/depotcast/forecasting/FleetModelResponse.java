package org.depotcast.forecasting;

import java.util.Map;

/**
 * A family's fitted fleet model as the API shows it. Coefficients are on the log scale per operating hour;
 * {@code eventsPer1000Hours} is exp(intercept) × 1000, the rate of a new pump at 30 m (all covariates zero). Code
 * that computes rates reads the typed model instead ({@link ForecastQueryService#fleetRates}).
 */
public record FleetModelResponse(String family, long runId, String source, Map<String, Double> coefficients,
                                 Map<String, Double> standardErrors, Double deviance, Integer dfResidual,
                                 Double dispersion, boolean overdispersed, int events, double exposureHours,
                                 double unitsPerEvent, double eventsPer1000Hours) {
}
