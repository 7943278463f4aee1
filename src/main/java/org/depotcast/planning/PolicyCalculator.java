package org.depotcast.planning;

import org.depotcast.catalogue.Part;
import org.depotcast.core.policy.DemandDistribution;
import org.depotcast.core.policy.NormalDemand;
import org.depotcast.core.policy.OrderQuantity;
import org.depotcast.core.policy.ReorderPoint;
import org.depotcast.stock.LocationKind;

/**
 * Reorder point and order-up-to level for one part at one location (Silver, Pyke &amp; Thomas 2017, ch. 6–7):
 * demand over the protection period from the stored monthly forecast, Poisson or negative binomial by its
 * variance-to-mean ratio, normal for fast movers (mean over the period ≥ 30 units); s for the target cycle service
 * level; Q from the EOQ rounded to packs and the MOQ (a depot's at the cost of a transfer trip from the central
 * store, in whole packs); S = s + Q, below the central store capped at the set days of cover unless one pack above s
 * needs more, and capped so stock is not held past its shelf life. The policy says which rule set S.
 * Protection periods: central store = supplier lead time (with its variability) + central review; depot = transfer
 * lead time + depot review; kit = one visit cycle, its min/max being s and s + one cycle's mean demand.
 */
final class PolicyCalculator {
    private static final double DAYS_PER_MONTH = 365.25 / 12;
    private static final double FAST_MOVER_UNITS = 30;

    private final PlanningSettings settings;

    PolicyCalculator(PlanningSettings settings) {
        this.settings = settings;
    }

    static DemandDistribution distribution(double mean, double variance) {
        return mean >= FAST_MOVER_UNITS ? new NormalDemand(mean, Math.max(variance, mean))
                : DemandDistribution.fromMoments(mean, variance);
    }

    /** Service levels in force: for critical parts and the rest. */
    record ServiceLevels(double critical, double standard) {
        double of(Part part) {
            return part.critical ? critical : standard;
        }
    }

    StockPolicy policy(Part part, String locationCode, LocationKind level, double monthlyMean, double monthlyVariance,
                       String method, double onHand, double onOrder, double committed, ServiceLevels levels) {
        int protection = switch (level) {
            case CENTRAL_STORE -> part.leadTimeDays + settings.centralReviewDays();
            case DEPOT -> settings.depotTransferLeadDays() + settings.depotReviewDays();
            default -> settings.kitVisitCycleDays();
        };
        double daily = Math.max(0, monthlyMean) / DAYS_PER_MONTH;
        double dailyVariance = Math.max(Math.max(0, monthlyVariance) / DAYS_PER_MONTH, daily);
        double leadSd = level == LocationKind.CENTRAL_STORE ? settings.supplierLeadTimeCv() * part.leadTimeDays : 0;
        double[] moments = ReorderPoint.leadTimeMoments(daily, dailyVariance, protection, leadSd);
        DemandDistribution demand = distribution(moments[0], moments[1]);
        double serviceLevel = levels.of(part);
        double annual = daily * 365.25;
        double holding = Math.max(0.01, part.unitCost.doubleValue() * settings.holdingRatePerYear());
        double quantity;
        String rule;
        if (level == LocationKind.KIT) {
            quantity = Math.max(1, Math.ceil(daily * settings.kitVisitCycleDays()));
            rule = "reorder point + one visit cycle's mean demand";
        } else if (level == LocationKind.DEPOT) {
            // A depot is replenished by a transfer trip from the central store, not by a supplier order.
            quantity = annual <= 0 ? part.packSize
                    : OrderQuantity.economicInPacks(annual, settings.transferTripCost(), holding, part.packSize, part.packSize);
            rule = "reorder point + economic quantity at the transfer-trip cost";
        } else {
            quantity = annual <= 0 ? part.packSize
                    : OrderQuantity.economicInPacks(annual, settings.orderingCost(), holding, part.packSize, part.minOrderQty);
            rule = "reorder point + economic order quantity";
        }
        double s = Math.ceil(ReorderPoint.of(demand, serviceLevel, ReorderPoint.Target.CYCLE_SERVICE_LEVEL, quantity)
                .reorderPoint() - 1e-9);
        double upTo = s + quantity;
        int coverDays = settings.maxCoverDaysBelowCentral();
        if (level != LocationKind.CENTRAL_STORE && daily > 0 && upTo > Math.floor(daily * coverDays)) {
            // Below the central store hold at most the days of cover set, unless one pack above s needs more.
            double cap = Math.floor(daily * coverDays);
            double least = s + (level == LocationKind.DEPOT ? part.packSize : 1);
            upTo = Math.max(cap, least);
            quantity = upTo - s;
            rule = upTo <= cap ? "capped at " + coverDays + " days of cover"
                    : level == LocationKind.DEPOT ? "reorder point + one pack: the pack needs more than " + coverDays
                    + " days of cover" : "reorder point + one unit: the reorder point alone is over " + coverDays
                    + " days of cover";
        }
        if (part.shelfLifeDays != null && daily > 0 && upTo > Math.floor(daily * part.shelfLifeDays)) {
            // Never hold more than will be used before it expires, but never less than the reorder point.
            upTo = Math.max(s, Math.floor(daily * part.shelfLifeDays));
            rule = "capped by the shelf life of " + part.shelfLifeDays + " days";
        }
        double position = onHand + onOrder - committed;
        double shortUnits = demand.expectedShortfall(Math.max(0, position));
        return new StockPolicy(part.partNumber, locationCode, level.name(), part.critical, serviceLevel, protection,
                daily, moments[0], moments[1], demand.name(), s, quantity, upTo, onHand, onOrder, committed, position, shortUnits,
                shortUnits * protection / 2.0, method, part.shelfLifeDays, part.unitCost.doubleValue(), part.currency,
                part.packSize, part.minOrderQty, part.supplier, rule);
    }
}
