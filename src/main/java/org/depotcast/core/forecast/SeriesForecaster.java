package org.depotcast.core.forecast;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Forecasts one demand series with a named method, or "auto".
 *
 * <p>Auto: the {@link ForecastMethod#COMBINED} forecast (the median of SBA, TSB, SES, the Poisson mean and the
 * 12-period mean). Choosing the one method with the lowest backtest error loses to the plain 12-period mean on
 * simulated part series with level shifts (selection on a short backtest is noisy), the combination does not (see
 * AutoVersusMeanTest). Each candidate, the combination included, is still scored over the last
 * {@link #BACKTEST_ORIGINS} rolling origins (Tashman 2000) with a 12-period horizon and the scores are reported,
 * where there are at least {@link #BACKTEST_ORIGINS} + 6 periods and two demands. A single period: SES if smooth,
 * SBA otherwise.
 *
 * <p>Interval model (stated because the Croston family has no consistent stochastic model, Shenstone &amp; Hyndman
 * 2005, J. Forecasting 24:389–402): the variance of one period's demand is the larger of the forecast mean and the
 * in-sample mean squared one-step error, and periods are taken as independent, so demand over L periods has mean
 * L·f and variance L·σ². It is Poisson when σ² equals the mean, negative binomial when larger.
 */
public final class SeriesForecaster {
    public static final int BACKTEST_ORIGINS = 12;
    private static final int BACKTEST_HORIZON = 12;
    private static final List<ForecastMethod> CANDIDATES = List.of(ForecastMethod.CROSTON, ForecastMethod.SBA,
            ForecastMethod.TSB, ForecastMethod.SES, ForecastMethod.POISSON, ForecastMethod.MEAN12, ForecastMethod.COMBINED);

    private SeriesForecaster() {
    }

    /**
     * The forecast alone, without the candidates' backtest scores ({@link SeriesForecast#backtest()} empty). Auto
     * forecasts with the combination whatever the scores say, so a forecast run that does not report them does not
     * pay for them: scoring seven candidates over 12 rolling origins costs several times the forecast itself (the
     * combination re-tunes its parts at every origin).
     *
     * @param method  the method, or null for auto
     * @param alpha   smoothing constant, NaN to optimise
     * @param beta    TSB's probability constant, NaN to optimise
     * @param horizon periods to forecast, 1..60
     */
    public static SeriesForecast forecast(double[] history, ForecastMethod method, double alpha, double beta, int horizon) {
        return forecast(history, method, alpha, beta, horizon, false);
    }

    /**
     * The forecast with, under auto, every candidate's rolling-origin backtest scores (for the pages and endpoints
     * that show them beside the method used).
     */
    public static SeriesForecast forecastScored(double[] history, ForecastMethod method, double alpha, double beta,
                                                int horizon) {
        return forecast(history, method, alpha, beta, horizon, true);
    }

    private static SeriesForecast forecast(double[] history, ForecastMethod method, double alpha, double beta,
                                           int horizon, boolean scored) {
        Series.requireValid(history);
        if (horizon < 1 || horizon > 60) {
            throw new IllegalArgumentException("horizon must be between 1 and 60, was " + horizon);
        }
        if (!Double.isNaN(alpha)) {
            Series.requireSmoothing("alpha", alpha);
        }
        if (!Double.isNaN(beta)) {
            Series.requireSmoothing("beta", beta);
        }
        DemandProfile profile = DemandProfile.of(history);
        Map<ForecastMethod, ErrorScores> scores = new EnumMap<>(ForecastMethod.class);
        ForecastMethod chosen = method;
        if (chosen == null) {
            chosen = choose(history, profile, alpha, beta, scored ? scores : null);
        }
        FittedSeries fit = SeriesFitter.fitOptimised(history, chosen, alpha, beta);
        double[] forecast = new double[horizon];
        Arrays.fill(forecast, fit.perPeriod());
        double variance = Double.isNaN(fit.inSampleMse()) ? fit.perPeriod() : Math.max(fit.perPeriod(), fit.inSampleMse());
        return new SeriesForecast(chosen, fit.alpha(), fit.beta(), forecast, profile, scores, variance);
    }

    /** @param scores filled with each candidate's backtest scores; null not to score them */
    private static ForecastMethod choose(double[] history, DemandProfile profile, double alpha, double beta,
                                         Map<ForecastMethod, ErrorScores> scores) {
        if (history.length < 2) {
            return profile.demandClass() == DemandClass.SMOOTH ? ForecastMethod.SES : ForecastMethod.SBA;
        }
        if (scores != null && history.length >= BACKTEST_ORIGINS + 6 && profile.demands() >= 2) {
            for (ForecastMethod candidate : CANDIDATES) {
                scores.put(candidate, Backtest.method(history, BACKTEST_ORIGINS, BACKTEST_HORIZON, candidate, alpha, beta));
            }
        }
        return ForecastMethod.COMBINED;
    }
}
