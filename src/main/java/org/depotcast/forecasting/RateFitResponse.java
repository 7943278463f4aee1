package org.depotcast.forecasting;

import java.util.Map;

/**
 * A fitted Poisson regression. {@code standardErrors} are model-based (as R's glm); when the Pearson dispersion
 * shows overdispersion, {@code adjustedStandardErrors} are inflated by its square root (quasi-Poisson).
 */
public record RateFitResponse(Map<String, Double> coefficients, Map<String, Double> standardErrors, double deviance,
                              int dfResidual, Double dispersion, boolean overdispersed,
                              Map<String, Double> adjustedStandardErrors, int iterations) {
}
