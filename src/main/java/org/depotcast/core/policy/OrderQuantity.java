package org.depotcast.core.policy;

/**
 * Order sizes: the economic order quantity (Harris 1913, "How many parts to make at once", Factory, The Magazine of
 * Management 10(2):135–136; Q* = √(2DK/h), cost TC = DK/Q + hQ/2), rounded to whole packs by comparing the cost of
 * the two neighbouring pack multiples, and never below the minimum order quantity.
 */
public final class OrderQuantity {
    private OrderQuantity() {
    }

    public static double economic(double annualDemand, double orderingCost, double holdingCostPerUnitYear) {
        if (annualDemand < 0 || !(orderingCost > 0) || !(holdingCostPerUnitYear > 0)) {
            throw new IllegalArgumentException("annual demand must be ≥ 0, ordering and holding costs > 0");
        }
        return Math.sqrt(2 * annualDemand * orderingCost / holdingCostPerUnitYear);
    }

    public static double annualCost(double quantity, double annualDemand, double orderingCost, double holdingCostPerUnitYear) {
        return annualDemand * orderingCost / quantity + holdingCostPerUnitYear * quantity / 2;
    }

    /** The cheaper of the pack multiples around the EOQ, at least one pack and at least the MOQ. */
    public static long economicInPacks(double annualDemand, double orderingCost, double holding, int packSize, int moq) {
        double q = economic(annualDemand, orderingCost, holding);
        long down = Math.max(1, (long) Math.floor(q / packSize)) * packSize;
        long up = Math.max(1, (long) Math.ceil(q / packSize)) * packSize;
        long best = annualCost(down, annualDemand, orderingCost, holding) <= annualCost(up, annualDemand, orderingCost, holding)
                ? down : up;
        return roundUpToPacks(Math.max(best, moq), packSize);
    }

    /** Smallest whole number of packs holding at least {@code quantity} units. */
    public static long roundUpToPacks(double quantity, int packSize) {
        if (packSize < 1) {
            throw new IllegalArgumentException("pack size must be ≥ 1, was " + packSize);
        }
        return (long) Math.ceil(quantity / packSize - 1e-9) * packSize;
    }
}
