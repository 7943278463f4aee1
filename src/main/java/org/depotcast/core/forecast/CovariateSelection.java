package org.depotcast.core.forecast;

import java.util.ArrayList;
import java.util.List;

/**
 * Chooses which of a family's declared covariates its fleet model keeps, by the Bayesian information criterion
 * (Schwarz 1978, "Estimating the dimension of a model", Annals of Statistics 6(2):461–464): every subset of the
 * declared columns is fitted (at most 2^k Poisson regressions, k ≤ 3 here) and the one with the smallest
 * deviance + p·ln(n) is kept, n being the number of rows. The declared columns are what a programme believes can
 * matter; a small family's history often cannot estimate them, and a coefficient fitted on noise is extrapolated
 * over the horizon (an age term fitted on noise raises every pump's rate year on year). BIC's penalty of ln(n) per
 * term keeps a term only when the data carry it (at n ≈ 2,000 rows, a deviance drop of about 7.6, |z| ≳ 2.8).
 */
public final class CovariateSelection {
    private CovariateSelection() {
    }

    /**
     * The chosen subset and its fit.
     *
     * @param columns indices into the declared columns, in declared order (empty: the intercept alone)
     * @param fit     the Poisson regression on those columns
     * @param bic     its deviance + (columns + 1)·ln(rows)
     */
    public record Choice(int[] columns, PoissonFit fit, double bic) {
    }

    /**
     * @param covariates n rows × k declared columns (no intercept column)
     * @throws PoissonRegression.SingularDesignException when not even the intercept alone can be fitted
     */
    public static Choice byBic(double[][] covariates, double[] counts, double[] exposure) {
        int k = covariates.length == 0 ? 0 : covariates[0].length;
        double penalty = Math.log(counts.length);
        Choice best = null;
        for (int mask = 0; mask < (1 << k); mask++) {
            int[] columns = columnsOf(mask, k);
            PoissonFit fit;
            try {
                fit = PoissonRegression.fit(select(covariates, columns), counts, exposure);
            } catch (PoissonRegression.SingularDesignException singular) {
                continue; // a constant or collinear column: that subset cannot be estimated
            }
            double bic = fit.deviance() + (columns.length + 1) * penalty;
            // On a tie the larger model, the one declared, is kept.
            if (best == null || bic < best.bic() || (bic == best.bic() && columns.length > best.columns().length)) {
                best = new Choice(columns, fit, bic);
            }
        }
        if (best == null) {
            throw new PoissonRegression.SingularDesignException("no subset of the covariates can be fitted");
        }
        return best;
    }

    /** The rows restricted to the given columns. */
    public static double[][] select(double[][] covariates, int[] columns) {
        double[][] chosen = new double[covariates.length][columns.length];
        for (int i = 0; i < covariates.length; i++) {
            for (int c = 0; c < columns.length; c++) {
                chosen[i][c] = covariates[i][columns[c]];
            }
        }
        return chosen;
    }

    private static int[] columnsOf(int mask, int k) {
        List<Integer> columns = new ArrayList<>();
        for (int c = 0; c < k; c++) {
            if ((mask & (1 << c)) != 0) {
                columns.add(c);
            }
        }
        return columns.stream().mapToInt(Integer::intValue).toArray();
    }
}
