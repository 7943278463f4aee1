package org.depotcast.core.forecast;

/**
 * One method fitted to one series.
 *
 * @param method        the method
 * @param alpha         smoothing constant used (NaN for the Poisson mean)
 * @param beta          TSB's probability constant (NaN otherwise)
 * @param perPeriod     flat forecast of demand per period after the last observation
 * @param inSampleMse   mean squared one-step in-sample error (NaN when no period has a forecast)
 * @param fitted        one-step in-sample forecasts, NaN where none
 */
public record FittedSeries(ForecastMethod method, double alpha, double beta, double perPeriod, double inSampleMse,
                           double[] fitted) {
}
