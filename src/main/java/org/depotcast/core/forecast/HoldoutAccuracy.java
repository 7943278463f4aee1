package org.depotcast.core.forecast;

import org.depotcast.core.policy.DemandDistribution;

import java.util.List;

/**
 * How forecasts of a held-out period's totals compared with what happened, over a set of series.
 *
 * <p>Per series: the forecast total (the distribution's mean), the actual total, the error F − A, and whether the
 * actual fell inside the central 80 % range [q(0.10), q(0.90)] and the 95 % range [q(0.025), q(0.975)] of the
 * forecast distribution (both ends included: the distributions are discrete). Over the series: MAE = Σ|F − A|/n,
 * mean error = Σ(F − A)/n, total bias = (ΣF − ΣA)/ΣA (as the forecasting issue's accuracy table states it; NaN when
 * nothing happened), and the share of series whose actual fell inside each range. An honest 80 % range holds about
 * 80 % of the actuals; MAE on its own rewards forecasting zero for intermittent series (Kolassa 2016, IJF 32:788–803),
 * so it is read beside the bias.
 */
public final class HoldoutAccuracy {
    private HoldoutAccuracy() {
    }

    /** A closed range of totals, units. */
    public record Range(double lower, double upper) {
        public boolean holds(double value) {
            return value >= lower && value <= upper;
        }
    }

    /** One series: forecast and actual totals, units, and the forecast's central ranges. */
    public record Scored(double forecast, double actual, Range range80, Range range95) {
        public Scored {
            if (!(forecast >= 0) || !(actual >= 0)) {
                throw new IllegalArgumentException("forecast and actual must be ≥ 0, were " + forecast + ", " + actual);
            }
        }

        public double error() {
            return forecast - actual;
        }
    }

    /**
     * @param series        how many series were scored
     * @param forecastTotal ΣF, units
     * @param actualTotal   ΣA, units
     * @param mae           Σ|F − A|/n, units
     * @param meanError     Σ(F − A)/n, units (positive: forecast too high)
     * @param totalBias     (ΣF − ΣA)/ΣA, a fraction; NaN when ΣA = 0
     * @param coverage80    share of series with the actual inside the 80 % range
     * @param coverage95    share of series with the actual inside the 95 % range
     */
    public record Summary(int series, double forecastTotal, double actualTotal, double mae, double meanError,
                          double totalBias, double coverage80, double coverage95) {
    }

    /** Scores one series: the forecast distribution of the period's total against the actual total. */
    public static Scored score(DemandDistribution forecast, double actual) {
        return new Scored(forecast.mean(), actual,
                new Range(forecast.quantile(0.10), forecast.quantile(0.90)),
                new Range(forecast.quantile(0.025), forecast.quantile(0.975)));
    }

    public static Summary summarise(List<Scored> series) {
        if (series.isEmpty()) {
            throw new IllegalArgumentException("series must not be empty");
        }
        double forecastTotal = 0, actualTotal = 0, absolute = 0;
        int in80 = 0, in95 = 0;
        for (Scored s : series) {
            forecastTotal += s.forecast();
            actualTotal += s.actual();
            absolute += Math.abs(s.error());
            in80 += s.range80().holds(s.actual()) ? 1 : 0;
            in95 += s.range95().holds(s.actual()) ? 1 : 0;
        }
        int n = series.size();
        double bias = actualTotal == 0 ? Double.NaN : (forecastTotal - actualTotal) / actualTotal;
        return new Summary(n, forecastTotal, actualTotal, absolute / n, (forecastTotal - actualTotal) / n, bias,
                (double) in80 / n, (double) in95 / n);
    }
}
