package org.depotcast.core.forecast;

/**
 * A fitted Poisson regression. Index 0 is the intercept, then the covariates in the order given.
 *
 * @param coefficients     β on the log scale
 * @param standardErrors   model-based standard errors (as R's summary.glm for family = poisson)
 * @param deviance         residual deviance
 * @param dfResidual       rows − coefficients
 * @param dispersion       Pearson χ² / df; about 1 when the Poisson model fits
 * @param iterations       IRLS iterations used
 * @param converged        whether the deviance settled within 25 iterations
 * @param covariance       model-based covariance of the coefficients, (X'WX)⁻¹ at the last step (R's
 *                         {@code vcov()} of a Poisson glm); its diagonal squared-rooted is {@code standardErrors}
 */
public record PoissonFit(double[] coefficients, double[] standardErrors, double deviance, int dfResidual,
                         double dispersion, int iterations, boolean converged, double[][] covariance) {

    /** Overdispersed when the Pearson dispersion exceeds {@link PoissonRegression#OVERDISPERSION_THRESHOLD}. */
    public boolean overdispersed() {
        return dfResidual > 0 && dispersion > PoissonRegression.OVERDISPERSION_THRESHOLD;
    }

    /**
     * The variance factor to use for predictions and intervals: the dispersion when overdispersed (quasi-Poisson,
     * McCullagh &amp; Nelder 1989 §6.2), else 1.
     */
    public double varianceFactor() {
        return overdispersed() ? dispersion : 1.0;
    }

    /** Standard errors inflated by √(variance factor). */
    public double[] adjustedStandardErrors() {
        double scale = Math.sqrt(varianceFactor());
        double[] adjusted = new double[standardErrors.length];
        for (int i = 0; i < adjusted.length; i++) {
            adjusted[i] = standardErrors[i] * scale;
        }
        return adjusted;
    }

    /**
     * Variance of a linear combination g'β of the coefficients under the inflated covariance (variance factor ×
     * (X'WX)⁻¹): the delta method's variance of a sum of expectations whose gradient in β is g (Oehlert 1992, "A note
     * on the delta method", The American Statistician 46(1):27–29).
     */
    public double linearVariance(double[] gradient) {
        if (gradient.length != coefficients.length) {
            throw new IllegalArgumentException("gradient must have " + coefficients.length + " values, had " + gradient.length);
        }
        double sum = 0;
        for (int a = 0; a < gradient.length; a++) {
            for (int b = 0; b < gradient.length; b++) {
                sum += gradient[a] * covariance[a][b] * gradient[b];
            }
        }
        return sum * varianceFactor();
    }

    /** Expected events for one row: exposure × exp(β₀ + x'β). */
    public double expected(double[] covariates, double exposure) {
        double eta = coefficients[0];
        for (int i = 0; i < covariates.length; i++) {
            eta += coefficients[i + 1] * covariates[i];
        }
        return exposure * Math.exp(eta);
    }
}
