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
