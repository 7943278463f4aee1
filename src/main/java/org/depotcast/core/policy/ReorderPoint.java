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
            s = demand.quantile(0.5);
            double step = Math.sqrt(demand.variance()) / 1000;
            while (fillRate(demand, s, orderQuantity) < target) {
                s += step;
            }
        } else {
            s = 0;
            while (fillRate(demand, s, orderQuantity) < target) {
                s++;
            }
        }
        return new Result(s, demand.cdf(s), fillRate(demand, s, orderQuantity), demand.expectedShortfall(s));
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
