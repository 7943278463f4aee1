package org.depotcast.planning;

/**
 * The policy of one part at one location and where its stock stands against it.
 *
 * @param level            CENTRAL_STORE, DEPOT or KIT
 * @param protectionDays   lead time + review period the reorder point covers (a kit: one visit cycle)
 * @param dailyDemand      expected units a day (breakdowns + scheduled services)
 * @param demandMean       expected demand over the protection period
 * @param demandVariance   its variance (with lead-time variability at the central store)
 * @param distribution     poisson, negative-binomial or normal
 * @param reorderPoint     s (a kit's min)
 * @param orderQuantity    Q in whole packs, at least the MOQ
 * @param orderUpTo        S = s + Q, capped by days of cover below the central store and by shelf life (a kit's max)
 * @param orderUpToRule    which rule set {@code orderUpTo}, in words
 * @param onOrder          outstanding on purchase orders, plus transfers dispatched here and not yet received
 * @param committed        approved for mechanics and not yet issued
 * @param position         on hand + on order − committed
 * @param expectedShortUnits G(position): units expected short before replenishment arrives
 * @param pumpDaysAtRisk   expected pump-days without water: short units × half the protection period (a pump that
 *                         breaks while the part is out waits, on average, half the time to the next replenishment)
 */
public record StockPolicy(String partNumber, String locationCode, String level, boolean critical, double serviceLevel,
                          int protectionDays, double dailyDemand, double demandMean, double demandVariance,
                          String distribution, double reorderPoint, double orderQuantity, double orderUpTo,
                          double onHand, double onOrder, double committed, double position, double expectedShortUnits,
                          double pumpDaysAtRisk, String forecastMethod, Integer shelfLifeDays, double unitCost,
                          String currency, int packSize, int minOrderQty, String supplier, String orderUpToRule) {
    /**
     * Whole units this location can give another and stay at its reorder point: what is on the shelf less what is
     * already promised to mechanics (approved, not yet issued), above s. Units on order are not on the shelf to send.
     */
    public long spareToGive() {
        return Math.max(0, (long) Math.floor(onHand - committed - reorderPoint));
    }
}
