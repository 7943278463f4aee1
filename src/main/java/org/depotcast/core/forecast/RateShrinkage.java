package org.depotcast.core.forecast;

/**
 * Empirical-Bayes shrinkage of group rate ratios (depots, kits) toward the fleet model, so a small depot borrows
 * strength from the whole fleet instead of forecasting from a handful of events. Poisson–gamma model with Marshall's
 * moment estimator (Marshall 1991, "Mapping disease and mortality rates using empirical Bayes estimators", Applied
 * Statistics 40(2):283–294; formula from memory, checked by the tests' hand-worked case):
 * r_i = O_i/E_i, m = ΣO/ΣE, s² = Σ E_i (r_i − m)² / ΣE, prior variance A = max(0, s² − m/ē) with ē = ΣE/n;
 * shrunk ratio θ_i = m + C_i (r_i − m), C_i = A / (A + m/E_i).
 */
public final class RateShrinkage {
    private RateShrinkage() {
    }

    /**
     * @param observed events seen in each group
     * @param expected events the fleet model expects in each group (all &gt; 0)
     * @return the shrunk rate ratio of each group (multiply the fleet model's rate by it)
     */
    /**
     * Whether the groups differ by more than chance, judged by BIC as the covariates are ({@link CovariateSelection}),
     * but with n the rows fitted (the covariates' n, the number of events, was not measured here): a multiplier per
     * group (its maximum-likelihood value O_i/E_i) lowers the Poisson deviance by 2 Σ [O_i ln(O_i/E_i) − (O_i − E_i)],
     * and is kept only when that drop exceeds BIC's penalty (groups − 1)·ln(rows) (Schwarz 1978). With three depots, the moment estimate of the spread alone comes out positive for about one
     * family in five that has no depot effect, and a large family then takes its noise almost unshrunk into every
     * depot's forecast.
     *
     * @param rows       the rows the fleet model was fitted on
     * @param dispersion the fit's variance factor (1, or the quasi-Poisson dispersion): the drop is scaled by it
     */
    public static boolean groupsDiffer(double[] observed, double[] expected, int rows, double dispersion) {
        if (observed.length < 2) {
            return false;
        }
        double drop = 0;
        for (int i = 0; i < observed.length; i++) {
            drop += (observed[i] > 0 ? observed[i] * Math.log(observed[i] / expected[i]) : 0) - (observed[i] - expected[i]);
        }
        return 2 * drop / dispersion > (observed.length - 1) * Math.log(rows);
    }

    public static double[] shrink(double[] observed, double[] expected) {
        int n = observed.length;
        if (n != expected.length || n == 0) {
            throw new IllegalArgumentException("observed and expected must have the same, non-zero length");
        }
        double sumO = 0, sumE = 0;
        for (int i = 0; i < n; i++) {
            if (!(expected[i] > 0)) {
                throw new IllegalArgumentException("expected[" + i + "] must be > 0, was " + expected[i]);
            }
            sumO += observed[i];
            sumE += expected[i];
        }
        double m = sumO / sumE;
        double s2 = 0;
        for (int i = 0; i < n; i++) {
            double r = observed[i] / expected[i] - m;
            s2 += expected[i] * r * r;
        }
        s2 /= sumE;
        double priorVariance = Math.max(0, s2 - m / (sumE / n));
        double[] shrunk = new double[n];
        for (int i = 0; i < n; i++) {
            double weight = priorVariance == 0 ? 0 : priorVariance / (priorVariance + m / expected[i]);
            shrunk[i] = m + weight * (observed[i] / expected[i] - m);
        }
        return shrunk;
    }
}
