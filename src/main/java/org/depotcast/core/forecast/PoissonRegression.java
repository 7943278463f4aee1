package org.depotcast.core.forecast;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Poisson regression with log link and an exposure offset, fitted by iteratively reweighted least squares
 * (Nelder &amp; Wedderburn 1972, JRSS A 135:370–384; McCullagh &amp; Nelder 1989, Generalized Linear Models, 2nd ed.):
 * n_i ~ Poisson(μ_i), log μ_i = log E_i + β₀ + x_i'β. Each step solves (X'WX)b = X'Wz with W = μ and working response
 * z = η − offset + (y − μ)/μ, by Cholesky (Commons Math). The start (μ = y + 0.1), the stopping rule
 * |dev − dev_old|/(|dev| + 0.1) &lt; 1e-8 and the limit of 25 iterations follow R's {@code glm.fit}, and the reported
 * coefficients and standard errors come from the last solve, as R's do, so results agree with R to rounding.
 */
public final class PoissonRegression {
    private static final double TOLERANCE = 1e-8;
    private static final int MAX_ITERATIONS = 25;
    /** Pearson dispersion above this (with enough residual df) counts as overdispersion. */
    public static final double OVERDISPERSION_THRESHOLD = 1.5;

    private PoissonRegression() {
    }

    /** Thrown when the covariates are collinear or constant, so the coefficients are not identifiable. */
    public static final class SingularDesignException extends IllegalArgumentException {
        public SingularDesignException(String message) {
            super(message);
        }
    }

    /**
     * @param covariates n rows × k columns, without the intercept column (added here)
     * @param counts     n event counts ≥ 0
     * @param exposure   n exposures &gt; 0 (operating hours, pump-years)
     */
    public static PoissonFit fit(double[][] covariates, double[] counts, double[] exposure) {
        double[] offset = logExposure(covariates, counts, exposure);
        int n = counts.length;
        int k = covariates[0].length + 1;
        double[] mu = new double[n], eta = new double[n];
        for (int i = 0; i < n; i++) {
            mu[i] = counts[i] + 0.1;
            eta[i] = Math.log(mu[i]);
        }
        double deviance = deviance(counts, mu);
        double[] beta = new double[k];
        RealMatrix inverse = null;
        int iteration = 0;
        boolean converged = false;
        while (iteration < MAX_ITERATIONS && !converged) {
            iteration++;
            double[][] xtwx = new double[k][k];
            double[] xtwz = new double[k];
            accumulateNormalEquations(covariates, counts, offset, mu, eta, xtwx, xtwz);
            DecompositionSolver solver = cholesky(xtwx);
            beta = solver.solve(new org.apache.commons.math3.linear.ArrayRealVector(xtwz, false)).toArray();
            inverse = solver.getInverse();
            updateMeans(covariates, offset, beta, eta, mu);
            double previous = deviance;
            deviance = deviance(counts, mu);
            converged = Math.abs(deviance - previous) / (Math.abs(deviance) + 0.1) < TOLERANCE;
        }
        double[] se = new double[k];
        for (int a = 0; a < k; a++) {
            se[a] = Math.sqrt(inverse.getEntry(a, a));
        }
        int dfResidual = n - k;
        double dispersion = dfResidual > 0 ? pearsonChiSquare(counts, mu) / dfResidual : Double.NaN;
        return new PoissonFit(beta, se, deviance, dfResidual, dispersion, iteration, converged, inverse.getData());
    }

    /** Checks the arguments' lengths and ranges and returns the offsets log E_i. */
    private static double[] logExposure(double[][] covariates, double[] counts, double[] exposure) {
        int n = counts.length;
        if (n == 0 || covariates.length != n || exposure.length != n) {
            throw new IllegalArgumentException("covariates, counts and exposure must have the same, non-zero length");
        }
        int k = covariates[0].length + 1;
        double[] offset = new double[n];
        for (int i = 0; i < n; i++) {
            if (!(counts[i] >= 0) || Double.isInfinite(counts[i])) {
                throw new IllegalArgumentException("counts[" + i + "] must be ≥ 0, was " + counts[i]);
            }
            if (!(exposure[i] > 0) || Double.isInfinite(exposure[i])) {
                throw new IllegalArgumentException("exposure[" + i + "] must be > 0, was " + exposure[i]);
            }
            if (covariates[i].length != k - 1) {
                throw new IllegalArgumentException("covariates[" + i + "] must have " + (k - 1) + " values");
            }
            offset[i] = Math.log(exposure[i]);
        }
        if (n < k) {
            throw new SingularDesignException("need at least " + k + " rows for " + k + " coefficients, have " + n);
        }
        return offset;
    }

    /** Adds X'WX (both triangles) and X'Wz for the current μ and η, the intercept being column 0. */
    private static void accumulateNormalEquations(double[][] covariates, double[] counts, double[] offset,
                                                  double[] mu, double[] eta, double[][] xtwx, double[] xtwz) {
        int k = xtwz.length;
        if (k <= 3) {
            accumulateUpToThree(covariates, counts, offset, mu, eta, xtwx, xtwz);
            return;
        }
        double[] row = new double[k];
        for (int i = 0; i < counts.length; i++) {
            row[0] = 1.0;
            System.arraycopy(covariates[i], 0, row, 1, k - 1);
            double w = mu[i];
            double z = eta[i] - offset[i] + (counts[i] - mu[i]) / mu[i];
            for (int a = 0; a < k; a++) {
                double wa = w * row[a];
                xtwz[a] += wa * z;
                for (int b = 0; b <= a; b++) {
                    xtwx[a][b] += wa * row[b];
                }
            }
        }
        mirror(xtwx);
    }

    /**
     * The same sums for at most two covariates (every fleet fit) in local variables: each sum takes the same terms in
     * the same order as above, so the results are identical; an absent column is 0 and its sums are not written.
     */
    private static void accumulateUpToThree(double[][] covariates, double[] counts, double[] offset, double[] mu,
                                            double[] eta, double[][] xtwx, double[] xtwz) {
        int k = xtwz.length;
        double z0 = 0, z1 = 0, z2 = 0, s00 = 0, s10 = 0, s11 = 0, s20 = 0, s21 = 0, s22 = 0;
        for (int i = 0; i < counts.length; i++) {
            double[] x = covariates[i];
            double x1 = k > 1 ? x[0] : 0, x2 = k > 2 ? x[1] : 0;
            double w = mu[i];
            double z = eta[i] - offset[i] + (counts[i] - mu[i]) / mu[i];
            double w1 = w * x1, w2 = w * x2;
            z0 += w * z;
            z1 += w1 * z;
            z2 += w2 * z;
            s00 += w;
            s10 += w1;
            s11 += w1 * x1;
            s20 += w2;
            s21 += w2 * x1;
            s22 += w2 * x2;
        }
        double[] z = {z0, z1, z2};
        double[][] s = {{s00}, {s10, s11}, {s20, s21, s22}};
        for (int a = 0; a < k; a++) {
            xtwz[a] += z[a];
            for (int b = 0; b <= a; b++) {
                xtwx[a][b] += s[a][b];
            }
        }
        mirror(xtwx);
    }

    private static void mirror(double[][] xtwx) {
        for (int a = 0; a < xtwx.length; a++) {
            for (int b = a + 1; b < xtwx.length; b++) {
                xtwx[a][b] = xtwx[b][a];
            }
        }
    }

    /** η_i = β₀ + x_i'β + offset_i and μ_i = exp(η_i), in place. */
    private static void updateMeans(double[][] covariates, double[] offset, double[] beta, double[] eta, double[] mu) {
        for (int i = 0; i < mu.length; i++) {
            double linear = beta[0];
            for (int a = 1; a < beta.length; a++) {
                linear += beta[a] * covariates[i][a - 1];
            }
            eta[i] = linear + offset[i];
            mu[i] = Math.exp(eta[i]);
        }
    }

    /** Pearson's X² = Σ (y − μ)²/μ. */
    private static double pearsonChiSquare(double[] y, double[] mu) {
        double sum = 0;
        for (int i = 0; i < y.length; i++) {
            double r = y[i] - mu[i];
            sum += r * r / mu[i];
        }
        return sum;
    }

    private static DecompositionSolver cholesky(double[][] matrix) {
        try {
            return new CholeskyDecomposition(new Array2DRowRealMatrix(matrix, false), 1e-12, 1e-12).getSolver();
        } catch (NonPositiveDefiniteMatrixException | org.apache.commons.math3.linear.NonSymmetricMatrixException e) {
            throw new SingularDesignException("the design matrix is singular: covariates are constant or collinear");
        }
    }

    /** Poisson deviance 2 Σ [y log(y/μ) − (y − μ)], with y log(y/μ) = 0 at y = 0. */
    static double deviance(double[] y, double[] mu) {
        double sum = 0;
        for (int i = 0; i < y.length; i++) {
            sum += (y[i] > 0 ? y[i] * Math.log(y[i] / mu[i]) : 0) - (y[i] - mu[i]);
        }
        return 2 * sum;
    }
}
