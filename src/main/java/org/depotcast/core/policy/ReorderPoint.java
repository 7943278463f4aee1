package org.depotcast.core.policy;

/**
 * Reorder points for a continuous-review (s, Q) policy from the demand over the protection period (lead time plus
 * review period), after Silver, Pyke &amp; Thomas (2017), Inventory and Production Management in Supply Chains, 4th
 * ed., ch. 6–7:
 * <ul>
 *   <li>cycle service level: the smallest s with P(D ≤ s) ≥ CSL;</li>
 *   <li>fill rate with order quantity Q: P2 = 1 − [G(s) − G(s + Q)] / Q, G the first-order loss function; the
 *   smallest s reaching the target;</li>
 *   <li>expected backorders when an order arrives: G(s).</li>
 * </ul>
 */
public final class ReorderPoint {
    private ReorderPoint() {
    }

    /** How the service target is read. */
    public enum Target { CYCLE_SERVICE_LEVEL, FILL_RATE }

    /**
     * @param reorderPoint       s, in units (whole for discrete demand)
     * @param cycleServiceLevel  P(D ≤ s): chance a replenishment cycle has no stock-out
     * @param fillRate           share of demand met from stock with order quantity Q
     * @param expectedBackorders G(s): expected units short per cycle
     */
    public record Result(double reorderPoint, double cycleServiceLevel, double fillRate, double expectedBackorders) {
    }

    public static Result of(DemandDistribution demand, double target, Target kind, double orderQuantity) {
        if (!(target > 0 && target < 1)) {
            throw new IllegalArgumentException("service level must be in (0, 1), was " + target);
        }
        if (!(orderQuantity > 0)) {
            throw new IllegalArgumentException("order quantity must be > 0, was " + orderQuantity);
        }
        double s;
        if (kind == Target.CYCLE_SERVICE_LEVEL) {
            s = demand.quantile(target);
        } else if (demand instanceof NormalDemand) {
            // On a grid of sd/1000 from the median: the smallest grid point reaching the target.
            double median = demand.quantile(0.5), step = Math.sqrt(demand.variance()) / 1000;
            s = median + step * smallestReaching(k -> fillRate(demand, median + k * step, orderQuantity) >= target);
        } else {
            s = smallestReaching(k -> fillRate(demand, k, orderQuantity) >= target);
        }
        return new Result(s, demand.cdf(s), fillRate(demand, s, orderQuantity), demand.expectedShortfall(s));
    }

    /**
     * The smallest whole k ≥ 0 for which {@code reaches} holds, for a condition that once true stays true as k grows
     * (fill rate rises with s, since the loss G is convex and decreasing): the bound is found by doubling, then the
     * point by bisection (Press et al., Numerical Recipes, 3rd ed., 2007, section 9.1), so about 2·log2(k)
     * evaluations instead of k steps of one unit. Gives up at 2^62 (the condition never holds).
     */
    static long smallestReaching(java.util.function.LongPredicate reaches) {
        if (reaches.test(0)) {
            return 0;
        }
        long below = 0, above = 1;
        while (!reaches.test(above)) {
            below = above;
            if (above >= 1L << 62) {
                return above;
            }
            above *= 2;
        }
        while (above - below > 1) {
            long middle = below + (above - below) / 2;
            if (reaches.test(middle)) {
                above = middle;
            } else {
                below = middle;
            }
        }
        return above;
    }

    /** P2 = 1 − [G(s) − G(s + Q)] / Q. */
    public static double fillRate(DemandDistribution demand, double s, double orderQuantity) {
        return 1 - (demand.expectedShortfall(s) - demand.expectedShortfall(s + orderQuantity)) / orderQuantity;
    }

    /**
     * Mean and variance of demand over a random lead time: E = d·L̄, Var = L̄·σ_d² + d²·σ_L² (Silver, Pyke &amp;
     * Thomas 2017, section 6.10), for per-day demand mean d and variance σ_d², lead time mean L̄ and sd σ_L, in days.
     */
    public static double[] leadTimeMoments(double dailyMean, double dailyVariance, double leadTimeDays, double leadTimeSdDays) {
        if (dailyMean < 0 || dailyVariance < 0 || leadTimeDays < 0 || leadTimeSdDays < 0) {
            throw new IllegalArgumentException("demand and lead-time moments must be ≥ 0");
        }
        return new double[]{dailyMean * leadTimeDays,
                leadTimeDays * dailyVariance + dailyMean * dailyMean * leadTimeSdDays * leadTimeSdDays};
    }
}
