package org.depotcast.core.forecast;

import org.depotcast.core.policy.DemandDistribution;

import java.util.Map;

/**
 * A forecast for one series.
 *
 * @param method          the method used (chosen by backtest when asked for "auto")
 * @param alpha           smoothing constant used, NaN if none
 * @param beta            TSB probability constant used, NaN if none
 * @param forecast        demand per period for each of the horizon periods
 * @param profile         ADI, CV², class and other diagnostics
 * @param backtest        rolling-origin scores per candidate method (empty when the history was too short)
 * @param perPeriodVariance variance of one period's demand used for intervals (see {@link SeriesForecaster})
 */
public record SeriesForecast(ForecastMethod method, double alpha, double beta, double[] forecast,
                             DemandProfile profile, Map<ForecastMethod, ErrorScores> backtest,
                             double perPeriodVariance) {

    /** Demand over the next {@code periods} periods (a lead time, or the whole horizon). */
    public DemandDistribution demandOver(double periods) {
        if (!(periods > 0)) {
            throw new IllegalArgumentException("periods must be > 0, was " + periods);
        }
        double perPeriod = forecast.length == 0 ? 0 : forecast[0];
        return DemandDistribution.fromMoments(perPeriod * periods, perPeriodVariance * periods);
    }
}
