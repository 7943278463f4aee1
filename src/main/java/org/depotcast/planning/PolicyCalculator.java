package org.depotcast.planning;

import org.depotcast.catalogue.PartSummary;
import org.depotcast.core.policy.DemandDistribution;
import org.depotcast.core.policy.ReplenishmentPolicy;
import org.depotcast.stock.LocationKind;

/**
 * The stock policy of one part at one location: the part, the location's level and the settings turned into the
 * core's inputs ({@link ReplenishmentPolicy}, where the rules and their sources are), and its result into a
 * {@link StockPolicy}.
 */
final class PolicyCalculator {
    private final ReplenishmentPolicy.Settings settings;

    PolicyCalculator(PlanningSettings settings) {
        this.settings = new ReplenishmentPolicy.Settings(settings.centralReviewDays(), settings.depotTransferLeadDays(),
                settings.depotReviewDays(), settings.kitVisitCycleDays(), settings.supplierLeadTimeCv(),
                settings.orderingCost(), settings.transferTripCost(), settings.holdingRatePerYear(),
                settings.maxCoverDaysBelowCentral());
    }

    static DemandDistribution distribution(double mean, double variance) {
        return ReplenishmentPolicy.distribution(mean, variance);
    }

    /** Service levels in force: for critical parts and the rest. */
    record ServiceLevels(double critical, double standard) {
        double of(PartSummary part) {
            return part.critical() ? critical : standard;
        }
    }

    StockPolicy policy(PartSummary part, String locationCode, LocationKind level, double monthlyMean,
                       double monthlyVariance, String method, double onHand, double onOrder, double committed, ServiceLevels levels) {
        ReplenishmentPolicy.Level planned = switch (level) {
            case CENTRAL_STORE -> ReplenishmentPolicy.Level.CENTRAL_STORE;
            case DEPOT -> ReplenishmentPolicy.Level.DEPOT;
            case KIT -> ReplenishmentPolicy.Level.KIT;
            // Refused before it gets here (PlanningService): stock on the road is not replenished.
            case IN_TRANSIT -> throw new IllegalArgumentException("stock in transit has no reorder policy");
        };
        ReplenishmentPolicy.Item item = new ReplenishmentPolicy.Item(part.leadTimeDays(), part.unitCost().doubleValue(),
                part.packSize(), part.minOrderQty(), part.shelfLifeDays());
        double serviceLevel = levels.of(part);
        ReplenishmentPolicy.Result r = ReplenishmentPolicy.of(planned, item, monthlyMean, monthlyVariance, serviceLevel,
                onHand, onOrder, committed, settings);
        return new StockPolicy(part.partNumber(), locationCode, level.name(), part.critical(), serviceLevel,
                r.protectionDays(), r.dailyDemand(), r.demandMean(), r.demandVariance(), r.distribution(),
                r.reorderPoint(), r.orderQuantity(), r.orderUpTo(), onHand, onOrder, committed, r.position(),
                r.expectedShortUnits(), r.pumpDaysAtRisk(), method, part.shelfLifeDays(), part.unitCost().doubleValue(),
                part.currency(), part.packSize(), part.minOrderQty(), part.supplier(), r.orderUpToRule());
    }
}
