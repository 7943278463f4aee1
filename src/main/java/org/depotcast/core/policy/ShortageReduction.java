package org.depotcast.core.policy;

/**
 * Expected pump-days without water that extra stock removes at one location. With demand D over the protection
 * period and inventory position x, the expected units short are the loss G(x) = E(D − x)⁺ (Silver, Pyke &amp; Thomas
 * 2017, §7.5; Axsäter 2015, §5.3); a pump that breaks while its part is out waits on average half the protection
 * period, so pump-days without water = G(x) × protection / 2. Adding u units to the position removes
 * [G(x) − G(x + u)] × protection / 2: the first unit removes most, and units beyond what demand can use remove
 * almost nothing (G is convex and falls to 0).
 */
public final class ShortageReduction {
    private ShortageReduction() {
    }

    /**
     * @param demand         demand over the protection period
     * @param position       inventory position before the units arrive (on hand + on order − committed; may be
     *                       below 0)
     * @param units          units added (≥ 0)
     * @param protectionDays lead time + review period the position must cover (&gt; 0)
     */
    public static double pumpDaysAvoided(DemandDistribution demand, double position, double units, double protectionDays) {
        if (!(units >= 0)) {
            throw new IllegalArgumentException("units must be ≥ 0, was " + units);
        }
        if (!(protectionDays > 0)) {
            throw new IllegalArgumentException("protectionDays must be > 0, was " + protectionDays);
        }
        // Below zero G(x) = m − x: the units that bring a position owed beyond stock back to 0 each remove a whole unit.
        return Math.max(0, demand.expectedShortfall(position) - demand.expectedShortfall(position + units))
                * protectionDays / 2;
    }

    /**
     * Units worth adding one at a time: counts units, up to {@code maxUnits}, while the next one removes at least
     * {@code minPumpDays} pump-days.
     */
    public static long worthwhileUnits(DemandDistribution demand, double position, long maxUnits, double protectionDays,
                                       double minPumpDays) {
        long units = 0;
        while (units < maxUnits
                && pumpDaysAvoided(demand, position + units, 1, protectionDays) >= minPumpDays) {
            units++;
        }
        return units;
    }
}
