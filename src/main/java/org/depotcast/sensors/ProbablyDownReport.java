package org.depotcast.sensors;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * The pumps of a depot that have probably stopped, the parts they are expected to need, summed and set against the
 * depot's and its mechanics' kits' stock, and how earlier flags ended (repairs reported, false alarms).
 */
public record ProbablyDownReport(String depotCode, String method, Long forecastRunId, List<Pump> pumps,
                                 List<PartNeed> parts, long closedByRepair, long falseAlarms) {
    /** One flagged pump; {@code expectedRepairsByFamily} and {@code expectedParts} are probability-weighted. */
    public record Pump(String assetId, String assignedMechanic, String state, LocalDate stoppedFrom,
                       LocalDate flaggedOn, double probabilityDown, double baselineHoursPerDay,
                       Map<String, Double> expectedRepairsByFamily, Map<String, Double> expectedParts) {
    }

    /** A part the flagged pumps are expected to need, against stock at the depot and in its kits. */
    public record PartNeed(String partNumber, double expectedUnits, BigDecimal onHandDepot, BigDecimal onHandKits,
                           boolean enoughInStock) {
    }
}
