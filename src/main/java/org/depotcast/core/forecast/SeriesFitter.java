package org.depotcast.core.forecast;

/**
 * Fits a method to a series with given smoothing constants, or chooses them by minimising the in-sample mean
 * squared one-step error over a grid. Grids (stated bounds): α ∈ [0.05, 0.50] step 0.01 for Croston, SBA and SBJ
 * (the range the intermittent-demand literature recommends); α ∈ [0.01, 1.00] step 0.01 for SES; α and β ∈
 * [0.05, 0.50] step 0.05 for TSB. TSB starts p̂ at the mean demand share.
 */
public final class SeriesFitter {
    /** The grids, made once (read only): α for SES, α for Croston, SBA and SBJ, α and β for TSB. */
    private static final double[] SES_ALPHAS = grid(0.01, 1.0, 0.01);
    private static final double[] CROSTON_ALPHAS = grid(0.05, 0.5, 0.01);
    private static final double[] TSB_GRID = grid(0.05, 0.5, 0.05);

    private SeriesFitter() {
    }

    public static FittedSeries fit(double[] y, ForecastMethod method, double alpha, double beta) {
        Series.requireValid(y);
        double[] fitted = new double[y.length];
        double forecast = run(y, method, alpha, beta, fitted);
        return new FittedSeries(method, method.usesAlpha() ? alpha : Double.NaN, method.usesBeta() ? beta : Double.NaN,
                forecast, Smoothing.meanSquaredError(y, fitted), fitted);
    }

    /** Chooses α (and β for TSB) where not given (NaN) by the in-sample grid search, then fits. */
    public static FittedSeries fitOptimised(double[] y, ForecastMethod method, double alpha, double beta) {
        Series.requireValid(y);
        if (method == ForecastMethod.COMBINED) {
            return combined(y);
        }
        if (!method.usesAlpha() || (!Double.isNaN(alpha) && (!method.usesBeta() || !Double.isNaN(beta)))) {
            return fit(y, method, alpha, beta);
        }
        double bestAlpha = alpha, bestBeta = beta, bestMse = Double.POSITIVE_INFINITY;
        double[] alphas = !Double.isNaN(alpha) ? new double[]{alpha}
                : method == ForecastMethod.SES ? SES_ALPHAS : method == ForecastMethod.TSB ? TSB_GRID : CROSTON_ALPHAS;
        double[] betas = !method.usesBeta() ? new double[]{Double.NaN}
                : Double.isNaN(beta) ? TSB_GRID : new double[]{beta};
        for (double a : alphas) {
            for (double b : betas) {
                double mse = Smoothing.oneStepMse(y, method, a, b);
                // Strictly better only: ties keep the smaller constant, the smoother forecast.
                if (mse < bestMse - 1e-12) {
                    bestMse = mse;
                    bestAlpha = a;
                    bestBeta = b;
                }
            }
        }
        if (Double.isInfinite(bestMse)) {
            bestAlpha = Double.isNaN(alpha) ? 0.1 : alpha;
            bestBeta = method.usesBeta() && Double.isNaN(beta) ? 0.1 : beta;
        }
        return fit(y, method, bestAlpha, bestBeta);
    }

    /**
     * {@link ForecastMethod#COMBINED}: each part tuned on its own; the median of their forecasts, and of their fitted
     * values period by period (for the in-sample error the interval model reads).
     */
    private static FittedSeries combined(double[] y) {
        int parts = ForecastMethod.COMBINED_PARTS.size();
        double[] forecasts = new double[parts];
        double[][] partsFitted = new double[parts][];
        for (int i = 0; i < parts; i++) {
            FittedSeries f = fitOptimised(y, ForecastMethod.COMBINED_PARTS.get(i), Double.NaN, Double.NaN);
            forecasts[i] = f.perPeriod();
            partsFitted[i] = f.fitted();
        }
        double[] fitted = new double[y.length];
        double[] column = new double[parts];
        for (int t = 0; t < y.length; t++) {
            for (int i = 0; i < parts; i++) {
                column[i] = partsFitted[i][t];
            }
            fitted[t] = median(column);
        }
        return new FittedSeries(ForecastMethod.COMBINED, Double.NaN, Double.NaN, median(forecasts),
                Smoothing.meanSquaredError(y, fitted), fitted);
    }

    static double run(double[] y, ForecastMethod method, double alpha, double beta, double[] fitted) {
        if (method == ForecastMethod.COMBINED) {
            FittedSeries f = combined(y);
            if (fitted != null) {
                System.arraycopy(f.fitted(), 0, fitted, 0, y.length);
            }
            return f.perPeriod();
        }
        return switch (method) {
            case CROSTON, SBA, SBJ -> Smoothing.croston(y, alpha, method, fitted);
            case TSB -> Smoothing.tsb(y, alpha, beta, Smoothing.TsbStart.MEAN, fitted);
            case SES -> Smoothing.ses(y, alpha, fitted);
            case POISSON -> Smoothing.poissonMean(y, fitted);
            case MEAN12 -> Smoothing.movingMean(y, 12, fitted);
            case COMBINED -> throw new IllegalStateException("handled above");
        };
    }

    private static double[] grid(double from, double to, double step) {
        int n = (int) Math.round((to - from) / step) + 1;
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            values[i] = Math.round((from + i * step) * 1e6) / 1e6;
        }
        return values;
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        java.util.Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }
}
