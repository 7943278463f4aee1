package org.depotcast.core.policy;

/** Shared searches for whole-unit demand distributions. */
final class DiscreteDemand {
    /** Upper end of a quantile search, in standard deviations above the mean. */
    private static final double SEARCH_SDS = 40;

    private DiscreteDemand() {
    }

    interface Cdf {
        double at(int k);
    }

    /**
     * Smallest k with F(k) ≥ p, by bisection over whole numbers in [0, mean + 40 sd + 50] (Press et al., Numerical
     * Recipes, 3rd ed., 2007, section 9.1). F is non-decreasing, so about log2(mean + 40 sd) cdf evaluations find
     * it whatever the mean: the cost does not grow with the demand as a walk from 0 one unit at a time would.
     */
    static int quantile(Cdf cdf, double p, double mean, double sd) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("probability must be in (0, 1), was " + p);
        }
        int limit = (int) Math.min(Integer.MAX_VALUE - 1L, (long) Math.ceil(mean + SEARCH_SDS * sd + 50));
        double target = p - 1e-14;
        if (cdf.at(0) >= target) {
            return 0;
        }
        if (cdf.at(limit) < target) {
            return limit;
        }
        int below = 0, reaching = limit; // F(below) < target ≤ F(reaching)
        while (reaching - below > 1) {
            int middle = below + (reaching - below) / 2;
            if (cdf.at(middle) >= target) {
                reaching = middle;
            } else {
                below = middle;
            }
        }
        return reaching;
    }
}
