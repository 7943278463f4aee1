package org.depotcast.forecasting;

import org.depotcast.core.policy.DemandDistribution;

/**
 * A forecast's central 80 % and 95 % ranges: demand with the stored mean and variance, Poisson when the variance does
 * not exceed the mean, else a negative binomial with the same two moments (a gamma mixture of Poissons, the form the
 * rate's uncertainty gives; Silver, Pyke &amp; Thomas 2017, ch. 6). Bounds are the 10 % and 90 % (2.5 % and 97.5 %)
 * quantiles in whole units.
 */
public record ForecastRange(double mean, double variance, String distribution, double low80, double high80,
                            double low95, double high95) {

    static ForecastRange of(double mean, double variance) {
        DemandDistribution d = DemandDistribution.fromMoments(Math.max(0, mean), Math.max(mean, variance));
        return new ForecastRange(mean, variance, d.name(), quantile(d, 0.10), quantile(d, 0.90), quantile(d, 0.025),
                quantile(d, 0.975));
    }

    /** The distribution the range is drawn from, for scoring an outcome against it. */
    DemandDistribution demand() {
        return DemandDistribution.fromMoments(Math.max(0, mean), Math.max(mean, variance));
    }

    private static double quantile(DemandDistribution d, double p) {
        return d.mean() == 0 ? 0 : d.quantile(p);
    }
}
