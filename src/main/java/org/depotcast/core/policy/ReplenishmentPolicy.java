package org.depotcast.core.policy;

/**
 * Reorder point and order-up-to level for one part at one level of the stock hierarchy (Silver, Pyke &amp; Thomas
 * 2017, "Inventory and Production Management in Supply Chains", 4th ed., ch. 6–7).
 * <ul>
 * <li>Protection period: central store = supplier lead time + central review, with the lead time's spread
 * (σ_L = CV × L); depot = transfer lead time + depot review; kit = one visit cycle.</li>
 * <li>Demand over it from the monthly mean and variance (a month = 365.25 / 12 days, the daily variance at least the
 * daily mean), by {@link ReorderPoint#leadTimeMoments}: normal for fast movers (mean ≥ {@link #FAST_MOVER_UNITS}),
 * else Poisson or negative binomial by the variance-to-mean ratio ({@link DemandDistribution#fromMoments}).</li>
 * <li>s for the target cycle service level, rounded up to whole units.</li>
 * <li>Q: central store, the EOQ at the ordering cost in packs and at least the MOQ; depot, the EOQ at a transfer
 * trip's cost in whole packs; kit, one visit cycle's mean demand (at least 1). No demand: one pack.</li>
 * <li>S = s + Q; below the central store at most the set days of cover, unless one pack (a kit: one unit) above s
 * needs more; never more than is used within the shelf life, never less than s.</li>
 * <li>Expected short units G(position) at the inventory position, and pump-days at risk = short units × half the
 * protection period (a pump breaking while the part is out waits on average half the time to replenishment).</li>
 * </ul>
 */
public final class ReplenishmentPolicy {
    /** Mean demand over the protection period from which it is taken as normal. */
    public static final double FAST_MOVER_UNITS = 30;
    private static final double DAYS_PER_MONTH = 365.25 / 12;

    /** Where the stock is held: the level sets the protection period and how Q is reached. */
    public enum Level { CENTRAL_STORE, DEPOT, KIT }

    /** Tunables, in days and programme currency. */
    public record Settings(int centralReviewDays, int depotTransferLeadDays, int depotReviewDays, int kitVisitCycleDays,
                           double supplierLeadTimeCv, double orderingCost, double transferTripCost,
                           double holdingRatePerYear, int maxCoverDaysBelowCentral) {
        public Settings {
            if (centralReviewDays < 0 || depotTransferLeadDays < 0 || depotReviewDays < 0 || kitVisitCycleDays < 1
                    || !(supplierLeadTimeCv >= 0) || !(orderingCost > 0) || !(transferTripCost > 0)
                    || !(holdingRatePerYear >= 0) || maxCoverDaysBelowCentral < 1) {
                throw new IllegalArgumentException("settings out of range: " + centralReviewDays + ", "
                        + depotTransferLeadDays + ", " + depotReviewDays + ", " + kitVisitCycleDays + ", "
                        + supplierLeadTimeCv + ", " + orderingCost + ", " + transferTripCost + ", "
                        + holdingRatePerYear + ", " + maxCoverDaysBelowCentral);
            }
        }
    }

    /** The part: supplier lead time, unit cost, pack and minimum order, shelf life (null when it keeps). */
    public record Item(int leadTimeDays, double unitCost, int packSize, int minOrderQty, Integer shelfLifeDays) {
        public Item {
            if (leadTimeDays < 0 || !(unitCost >= 0) || packSize < 1 || minOrderQty < 1
                    || (shelfLifeDays != null && shelfLifeDays < 1)) {
                throw new IllegalArgumentException("leadTimeDays ≥ 0, unitCost ≥ 0, packSize and minOrderQty ≥ 1, "
                        + "shelfLifeDays ≥ 1 or none; were " + leadTimeDays + ", " + unitCost + ", " + packSize + ", "
                        + minOrderQty + ", " + shelfLifeDays);
            }
        }
    }

    /**
     * The policy and where stock stands against it.
     *
     * @param dailyDemand    expected units a day
     * @param demandMean     expected demand over the protection period; {@code demandVariance} its variance
     * @param distribution   poisson, negative-binomial or normal
     * @param position       on hand + on order − committed
     * @param orderUpToRule  which rule set S, in words
     */
    public record Result(int protectionDays, double dailyDemand, double demandMean, double demandVariance,
                         String distribution, double reorderPoint, double orderQuantity, double orderUpTo,
                         double position, double expectedShortUnits, double pumpDaysAtRisk, String orderUpToRule) {
    }

    private record Quantity(double units, String rule) {
    }

    /** Q and S after the caps, and the rule that set S. */
    private record Capped(double quantity, double upTo, String rule) {
    }

    private ReplenishmentPolicy() {
    }

    /** Normal for fast movers, else Poisson or negative binomial by the variance-to-mean ratio. */
    public static DemandDistribution distribution(double mean, double variance) {
        return mean >= FAST_MOVER_UNITS ? new NormalDemand(mean, Math.max(variance, mean))
                : DemandDistribution.fromMoments(mean, variance);
    }

    /**
     * @param monthlyMean     expected units a month (negative taken as 0); {@code monthlyVariance} its variance
     * @param serviceLevel    target cycle service level in (0, 1)
     * @param onHand          units on the shelf; {@code onOrder} on the way; {@code committed} promised, not issued
     */
    public static Result of(Level level, Item item, double monthlyMean, double monthlyVariance, double serviceLevel,
                            double onHand, double onOrder, double committed, Settings settings) {
        int protection = switch (level) {
            case CENTRAL_STORE -> item.leadTimeDays() + settings.centralReviewDays();
            case DEPOT -> settings.depotTransferLeadDays() + settings.depotReviewDays();
            case KIT -> settings.kitVisitCycleDays();
        };
        double daily = Math.max(0, monthlyMean) / DAYS_PER_MONTH;
        double dailyVariance = Math.max(Math.max(0, monthlyVariance) / DAYS_PER_MONTH, daily);
        double leadSd = level == Level.CENTRAL_STORE ? settings.supplierLeadTimeCv() * item.leadTimeDays() : 0;
        double[] moments = ReorderPoint.leadTimeMoments(daily, dailyVariance, protection, leadSd);
        DemandDistribution demand = distribution(moments[0], moments[1]);
        Quantity quantity = orderQuantity(level, item, daily, settings);
        double s = Math.ceil(ReorderPoint.of(demand, serviceLevel, ReorderPoint.Target.CYCLE_SERVICE_LEVEL,
                quantity.units()).reorderPoint() - 1e-9);
        Capped capped = capped(level, item, daily, s, quantity, settings.maxCoverDaysBelowCentral());
        double position = onHand + onOrder - committed;
        double shortUnits = demand.expectedShortfall(Math.max(0, position));
        return new Result(protection, daily, moments[0], moments[1], demand.name(), s, capped.quantity(),
                capped.upTo(), position, shortUnits, shortUnits * protection / 2.0, capped.rule());
    }

    /** Q as the level orders it, before any cap on S. */
    private static Quantity orderQuantity(Level level, Item item, double daily, Settings settings) {
        double annual = daily * 365.25;
        double holding = Math.max(0.01, item.unitCost() * settings.holdingRatePerYear());
        return switch (level) {
            case KIT -> new Quantity(Math.max(1, Math.ceil(daily * settings.kitVisitCycleDays())),
                    "reorder point + one visit cycle's mean demand");
            // A depot is replenished by a transfer trip from the central store, not by a supplier order.
            case DEPOT -> new Quantity(annual <= 0 ? item.packSize() : OrderQuantity.economicInPacks(annual,
                    settings.transferTripCost(), holding, item.packSize(), item.packSize()),
                    "reorder point + economic quantity at the transfer-trip cost");
            case CENTRAL_STORE -> new Quantity(annual <= 0 ? item.packSize() : OrderQuantity.economicInPacks(annual,
                    settings.orderingCost(), holding, item.packSize(), item.minOrderQty()),
                    "reorder point + economic order quantity");
        };
    }

    /**
     * S = s + Q under the cover and shelf-life caps, with the rule that set it; Q follows the cover cap (S − s), while
     * the shelf-life cap lowers S alone.
     */
    private static Capped capped(Level level, Item item, double daily, double s, Quantity quantity, int coverDays) {
        double q = quantity.units();
        double upTo = s + q;
        String rule = quantity.rule();
        if (level != Level.CENTRAL_STORE && daily > 0 && upTo > Math.floor(daily * coverDays)) {
            // Below the central store hold at most the days of cover set, unless one pack above s needs more.
            double cap = Math.floor(daily * coverDays);
            upTo = Math.max(cap, s + (level == Level.DEPOT ? item.packSize() : 1));
            q = upTo - s;
            rule = upTo <= cap ? "capped at " + coverDays + " days of cover"
                    : level == Level.DEPOT ? "reorder point + one pack: the pack needs more than " + coverDays
                    + " days of cover" : "reorder point + one unit: the reorder point alone is over " + coverDays
                    + " days of cover";
        }
        Integer shelfLife = item.shelfLifeDays();
        if (shelfLife != null && daily > 0 && upTo > Math.floor(daily * shelfLife)) {
            // Never hold more than will be used before it expires, but never less than the reorder point.
            upTo = Math.max(s, Math.floor(daily * shelfLife));
            rule = "capped by the shelf life of " + shelfLife + " days";
        }
        return new Capped(q, upTo, rule);
    }
}
