package org.depotcast.core.forecast;

/**
 * Variance of a series' fleet breakdown demand, month by month and over its first 12 months together, with the
 * credibility ratio θ applied: Var = E[θ] × process + Var(θ) × mean² + (E[θ]² + Var(θ)) × g'Σg. The process part is
 * quasi-Poisson (units per event × variance factor × mean, summed over the series' pumps); g'Σg is the fitted rate's
 * uncertainty by the delta method, g = Σ over the series' pumps of mean × (1, x), so the months of a 12-month total
 * keep the correlation the shared coefficients give them (Oehlert 1992); Var(θ) is the ratio's posterior variance
 * ({@link CredibilityWeight}). θ and the coefficients are taken as independent.
 */
public final class FleetDemandVariance {
    private FleetDemandVariance() {
    }

    /**
     * @param process  per month, Σ units × φ over the series' pumps; null for a series with no pumps (all zeros)
     * @param gradient per month m the gradient at [m × p, (m + 1) × p), p = coefficients (one flat array)
     * @param mean     fleet-expected units per month (before the ratio)
     * @param fit      the fitted regression; null for a prior (no coefficient uncertainty counted)
     * @return variances of months 0..horizon−1, then of the first min(12, horizon) months' total at index horizon
     */
    public static double[] of(double[] process, double[] gradient, double[] mean, CredibilityWeight weight,
                              PoissonFit fit) {
        int horizon = mean.length;
        double[] out = new double[horizon + 1];
        if (process == null) {
            return out;
        }
        if (process.length != horizon || gradient.length % horizon != 0) {
            throw new IllegalArgumentException("process must have " + horizon + " months and gradient a multiple of "
                    + horizon + " values; had " + process.length + " and " + gradient.length);
        }
        int yearMonths = Math.min(12, horizon);
        double theta = weight.ratio(), thetaVar = weight.ratioVariance();
        int p = gradient.length / horizon;
        double[] yearGradient = new double[p], month = new double[p];
        double yearMean = 0, yearProcess = 0;
        for (int m = 0; m < horizon; m++) {
            System.arraycopy(gradient, m * p, month, 0, p);
            double coefficients = fit == null ? 0 : fit.linearVariance(month);
            out[m] = theta * process[m] + thetaVar * mean[m] * mean[m] + (theta * theta + thetaVar) * coefficients;
            if (m < yearMonths) {
                yearMean += mean[m];
                yearProcess += process[m];
                for (int j = 0; j < p; j++) {
                    yearGradient[j] += month[j];
                }
            }
        }
        double coefficients = fit == null ? 0 : fit.linearVariance(yearGradient);
        out[horizon] = theta * yearProcess + thetaVar * yearMean * yearMean + (theta * theta + thetaVar) * coefficients;
        return out;
    }
}
