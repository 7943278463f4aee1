package org.depotcast.core.policy;

/**
 * Distribution of demand over a lead time (or any horizon), in units. Discrete models treat x as a whole number of
 * units; the normal model is continuous.
 */
public sealed interface DemandDistribution permits PoissonDemand, NegativeBinomialDemand, NormalDemand {

    String name();

    double mean();

    double variance();

    /** P(D ≤ x). */
    double cdf(double x);

    /** The smallest whole (discrete) or real (normal) s with P(D ≤ s) ≥ p, for p in (0, 1). */
    double quantile(double p);

    /**
     * First-order loss G(x) = E[(D − x)+], expected units short when x are on hand; m − x for x below 0 (units owed
     * beyond stock).
     */
    double expectedShortfall(double x);

    /**
     * Poisson when the variance does not exceed the mean (within rounding), else a negative binomial with the same
     * two moments (Silver, Pyke &amp; Thomas 2017, ch. 6: variance-to-mean ratio decides).
     */
    static DemandDistribution fromMoments(double mean, double variance) {
        if (!(mean >= 0) || Double.isInfinite(mean)) {
            throw new IllegalArgumentException("mean must be finite and ≥ 0, was " + mean);
        }
        // No expected demand is no demand, whatever spread an estimate carries.
        if (mean == 0 || Double.isNaN(variance) || variance <= mean * (1 + 1e-9)) {
            return new PoissonDemand(mean);
        }
        return new NegativeBinomialDemand(mean, variance);
    }
}
