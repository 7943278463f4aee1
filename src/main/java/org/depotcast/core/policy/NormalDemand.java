package org.depotcast.core.policy;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Normal demand for fast movers. Loss G(x) = σ·G_u((x − μ)/σ) with the unit normal loss G_u(k) = φ(k) − k(1 − Φ(k))
 * (Silver, Pyke &amp; Thomas 2017, section 6.7 and appendix).
 */
public record NormalDemand(double mean, double variance) implements DemandDistribution {
    public NormalDemand {
        if (!Double.isFinite(mean)) {
            throw new IllegalArgumentException("mean must be finite, was " + mean);
        }
        if (!(variance > 0) || Double.isInfinite(variance)) {
            throw new IllegalArgumentException("variance must be finite and > 0, was " + variance);
        }
    }

    private static final NormalDistribution UNIT = new NormalDistribution(null, 0, 1);

    @Override
    public String name() {
        return "normal";
    }

    private double sd() {
        return Math.sqrt(variance);
    }

    @Override
    public double cdf(double x) {
        return UNIT.cumulativeProbability((x - mean) / sd());
    }

    @Override
    public double quantile(double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("probability must be in (0, 1), was " + p);
        }
        return mean + sd() * UNIT.inverseCumulativeProbability(p);
    }

    @Override
    public double expectedShortfall(double x) {
        return sd() * unitLoss((x - mean) / sd());
    }

    /** G_u(k) = φ(k) − k(1 − Φ(k)). */
    public static double unitLoss(double k) {
        return UNIT.density(k) - k * (1 - UNIT.cumulativeProbability(k));
    }
}
