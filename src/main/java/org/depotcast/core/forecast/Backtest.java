package org.depotcast.core.forecast;

import java.util.Arrays;

/**
 * Rolling-origin evaluation (Tashman 2000, IJF 16(4):437–450): for each origin among the last {@code origins}
 * periods, fit on everything before it and forecast the next
 * {@code horizon} periods; all forecasts are scored together against what happened, scaled by the series before the
 * first origin.
 */
public final class Backtest {
    private Backtest() {
    }

    /** Forecasts from a method for the periods after an origin, given the training part. */
    @FunctionalInterface
    public interface Forecaster {
        double perPeriod(double[] training);
    }

    public static ErrorScores rollingOrigin(double[] y, int origins, int horizon, Forecaster forecaster) {
        if (origins < 1 || horizon < 1) {
            throw new IllegalArgumentException("origins and horizon must be ≥ 1");
        }
        int first = y.length - origins;
        if (first < 2) {
            throw new IllegalArgumentException("need at least " + (origins + 2) + " periods for " + origins + " origins");
        }
        int count = 0;
        for (int o = first; o < y.length; o++) {
            count += Math.min(horizon, y.length - o);
        }
        double[] forecasts = new double[count], actuals = new double[count];
        int i = 0;
        for (int o = first; o < y.length; o++) {
            double f = forecaster.perPeriod(Arrays.copyOf(y, o));
            for (int h = 0; h < horizon && o + h < y.length; h++, i++) {
                forecasts[i] = f;
                actuals[i] = y[o + h];
            }
        }
        return ErrorScores.of(Arrays.copyOf(y, first), forecasts, actuals);
    }

    /**
     * Scores a method on a series. Smoothing constants not given are chosen once, on the periods before the first
     * origin, and held through the origins: as good as re-choosing them for the comparison, and it keeps a
     * programme-wide run of tens of thousands of series within seconds.
     */
    public static ErrorScores method(double[] y, int origins, int horizon, ForecastMethod method, double alpha, double beta) {
        FittedSeries tuned = SeriesFitter.fitOptimised(Arrays.copyOf(y, Math.max(2, y.length - origins)), method, alpha, beta);
        return rollingOrigin(y, origins, horizon, training -> SeriesFitter.run(training, method, tuned.alpha(), tuned.beta(), null));
    }
}
