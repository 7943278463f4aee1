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

    /** {@link ForecastMethod#COMBINED}: each part tuned on its own, forecasts and fitted values averaged. */
    private static FittedSeries combined(double[] y) {
        double[] fitted = new double[y.length];
        double forecast = 0;
        int parts = ForecastMethod.COMBINED_PARTS.size();
        for (ForecastMethod part : ForecastMethod.COMBINED_PARTS) {
            FittedSeries f = fitOptimised(y, part, Double.NaN, Double.NaN);
            forecast += f.perPeriod() / parts;
            for (int t = 0; t < y.length; t++) {
                fitted[t] += f.fitted()[t] / parts;
            }
        }
        return new FittedSeries(ForecastMethod.COMBINED, Double.NaN, Double.NaN, forecast,
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
}
