package org.depotcast.sensors;

import org.depotcast.fleet.PumpSummary;

import java.math.BigDecimal;
import java.util.List;
import java.util.Map;

/**
 * Whose pumps a sensor report covers and which stock it is set against: a depot the caller may see (its pumps, its
 * own stock and its mechanics' kits), or, for a mechanic who names no depot, the pumps assigned to them and their
 * own kit (a mechanic's scope holds no depot, so the depot's shelves are not shown).
 *
 * @param depotCode   the depot named, or the depot the mechanic's kit belongs to (null for a mechanic with no kit)
 * @param mechanic    the mechanic whose own pumps these are, or null for a depot
 * @param pumps       the pumps covered
 * @param atDepot     units on hand per part on the depot's shelves; null when the caller does not see the depot
 * @param inKits      units on hand per part in the kits counted (the depot's mechanics', or the mechanic's own)
 * @param stockWords  where the stock counted is, in words
 */
record SensorArea(String depotCode, String mechanic, List<PumpSummary> pumps, Map<String, BigDecimal> atDepot,
                  Map<String, BigDecimal> inKits, String stockWords) {
    /** Depot and kits together, per part. */
    Map<String, BigDecimal> held() {
        Map<String, BigDecimal> all = new java.util.HashMap<>(inKits);
        if (atDepot != null) {
            atDepot.forEach((part, units) -> all.merge(part, units, BigDecimal::add));
        }
        return all;
    }
}
