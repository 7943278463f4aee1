package org.depotcast.planning;

import io.smallrye.config.ConfigMapping;

/** Tunables of replenishment planning, all with defaults in application.properties. */
@ConfigMapping(prefix = "depotcast.planning")
public interface PlanningSettings {
    /** Cycle service level for parts flagged critical (cup seals, foot valves, bearings in the demo). */
    double serviceLevelCritical();

    double serviceLevelStandard();

    /** A mechanic visits each assigned pump at least this often (common practice: 60 days); kits cover one cycle. */
    int kitVisitCycleDays();

    /** Days from the central store to a depot. */
    int depotTransferLeadDays();

    int depotReviewDays();

    int centralReviewDays();

    /** Supplier lead-time variability as a coefficient of variation (a stated assumption until receipts measure it). */
    double supplierLeadTimeCv();

    /** Cost of placing one order, programme currency (for EOQ). */
    double orderingCost();

    /** Cost of one transfer trip's worth of a part from the central store to a depot (a depot's EOQ). */
    @io.smallrye.config.WithDefault("5")
    double transferTripCost();

    /** Below the central store, hold at most this many days of demand (unless one pack needs more). */
    @io.smallrye.config.WithDefault("180")
    int maxCoverDaysBelowCentral();

    /** Holding cost per year as a share of unit cost (for EOQ). */
    double holdingRatePerYear();

    /** Transport cost per unit per km between stores (distance-based default for transfer costs). */
    double transferCostPerUnitKm();

    /** Value of one pump-day without water, programme currency: the shortage penalty in transfer planning. */
    double pumpDayValue();
}
