package org.depotcast.core.policy;

import org.apache.commons.math3.distribution.PoissonDistribution;

/** Poisson demand with mean m; the cdf and pmf come from Commons Math. Zero mean is a point mass at 0. */
public record PoissonDemand(double mean) implements DemandDistribution {
    public PoissonDemand {
        if (!(mean >= 0) || Double.isInfinite(mean)) {
            throw new IllegalArgumentException("mean must be finite and ≥ 0, was " + mean);
        }
    }

    private PoissonDistribution distribution() {
        return new PoissonDistribution(null, mean, PoissonDistribution.DEFAULT_EPSILON, PoissonDistribution.DEFAULT_MAX_ITERATIONS);
    }

    @Override
    public String name() {
        return "poisson";
    }

    @Override
    public double variance() {
        return mean;
    }

    double pmf(int k) {
        return mean == 0 ? (k == 0 ? 1 : 0) : distribution().probability(k);
    }

    @Override
    public double cdf(double x) {
        if (x < 0) {
            return 0;
        }
        return mean == 0 ? 1 : distribution().cumulativeProbability((int) Math.floor(x));
    }

    @Override
    public double quantile(double p) {
        if (mean == 0) {
            return 0;
        }
        PoissonDistribution d = distribution();
        return DiscreteDemand.quantile(d::cumulativeProbability, p, mean, Math.sqrt(mean));
    }

    /** Closed form G(x) = (m − x)(1 − F(x)) + m·p(x) for whole x (Silver, Pyke &amp; Thomas 2017, appendix). */
    @Override
    public double expectedShortfall(double x) {
        if (x <= 0) {
            // D ≥ 0: below zero (units owed beyond stock) every one of them is short as well as all the demand.
            return mean - x;
        }
        int s = (int) Math.min(Integer.MAX_VALUE - 1L, (long) Math.floor(x));
        return Math.max(0, (mean - s) * (1 - cdf(s)) + mean * pmf(s));
    }
}
