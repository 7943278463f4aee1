package org.depotcast.core.policy;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * Negative binomial demand for counts more variable than Poisson, parameterised by mean m and variance v &gt; m:
 * r = m²/(v − m), p = m/v, P(k) = Γ(r+k)/(Γ(r) k!) p^r (1−p)^k. The cdf is the regularised incomplete beta
 * I_p(r, k+1) (Johnson, Kemp &amp; Kotz, Univariate Discrete Distributions, 3rd ed., ch. 5), so r need not be whole.
 */
public record NegativeBinomialDemand(double mean, double variance) implements DemandDistribution {
    public NegativeBinomialDemand {
        if (!(mean > 0) || Double.isInfinite(mean)) {
            throw new IllegalArgumentException("mean must be finite and > 0, was " + mean);
        }
        if (!(variance > mean) || Double.isInfinite(variance)) {
            throw new IllegalArgumentException("variance must exceed the mean (" + mean + "), was " + variance);
        }
    }

    @Override
    public String name() {
        return "negative-binomial";
    }

    public double size() {
        return mean * mean / (variance - mean);
    }

    public double successProbability() {
        return mean / variance;
    }

    double pmf(int k) {
        double r = size(), p = successProbability();
        double log = Gamma.logGamma(r + k) - Gamma.logGamma(r) - Gamma.logGamma(k + 1.0)
                + r * Math.log(p) + k * Math.log1p(-p);
        return Math.exp(log);
    }

    @Override
    public double cdf(double x) {
        if (x < 0) {
            return 0;
        }
        return Beta.regularizedBeta(successProbability(), size(), Math.floor(x) + 1.0);
    }

    @Override
    public double quantile(double p) {
        return DiscreteDemand.quantile(k -> cdf(k), p, mean, Math.sqrt(variance));
    }

    /**
     * G(s) = E[(D − s)+] for whole s = ⌊x⌋ ≥ 1 in closed form: since k·P_r(k) = m·P_{r+1}(k − 1) (Johnson, Kemp &amp;
     * Kotz, ch. 5), E[D; D &gt; s] = m·P(D_{r+1} ≥ s), so G(s) = m·I_{1−p}(s, r + 1) − s·I_{1−p}(s + 1, r), with the
     * upper tails written as regularised incomplete beta functions to keep their precision. Constant cost in s.
     */
    @Override
    public double expectedShortfall(double x) {
        int s = (int) Math.min(Integer.MAX_VALUE - 1L, (long) Math.floor(x));
        if (s <= 0) {
            // D ≥ 0: below zero (units owed beyond stock) every one of them is short as well as all the demand.
            return mean - x;
        }
        double q = 1 - successProbability(), r = size();
        double meanAbove = mean * Beta.regularizedBeta(q, s, r + 1);
        double countAbove = Beta.regularizedBeta(q, s + 1.0, r);
        return Math.max(0, meanAbove - s * countAbove);
    }
}
