package org.depotcast.sensors;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * The pumps of a depot (or a mechanic's own pumps) that have probably stopped, the parts they are expected to need,
 * summed and set against the stock the caller sees (the depot and its mechanics' kits, or the mechanic's own kit),
 * and how earlier flags ended (repairs reported, false alarms).
 *
 * @param mechanic     the mechanic whose own pumps these are; null for a depot's report
 * @param stockCounted where the stock set against the parts is, in words
 */
public record ProbablyDownReport(String depotCode, String mechanic, LocalDate asOf, String method, Long forecastRunId,
                                 List<Pump> pumps, List<PartNeed> parts, String stockCounted, long closedByRepair,
                                 long falseAlarms) {
    /**
     * One flagged pump; {@code expectedRepairsByFamily} and {@code expectedParts} are probability-weighted.
     * {@code openRepairRef}: a breakdown repair reported since the flag, which closes it at the next check (else null).
     */
    public record Pump(String assetId, String assignedMechanic, String state, LocalDate stoppedFrom,
                       LocalDate flaggedOn, long daysSinceUseFell, double probabilityDown, double baselineHoursPerDay,
                       String openRepairRef, Map<String, Double> expectedRepairsByFamily,
                       Map<String, Double> expectedParts) {
    }

    /**
     * A part the flagged pumps are expected to need, against stock. {@code haveReady}: the whole units to set aside,
     * the smallest k with P(N ≤ k) ≥ {@code coverLevel} for N ~ Poisson({@code expectedUnits}), the cover level being
     * the programme's service level for the part's class (critical or standard); 0 means the chance of needing none
     * already reaches that level. {@code enoughInStock}: the depot and kits (or the mechanic's kit) hold
     * {@code haveReady}. {@code onHandDepot} is null in a mechanic's report (the depot's shelves are outside a
     * mechanic's scope), and {@code onHandKits} is then the mechanic's own kit.
     */
    public record PartNeed(String partNumber, double expectedUnits, int haveReady, double coverLevel,
                           BigDecimal onHandDepot, BigDecimal onHandKits, boolean enoughInStock) {
    }
}
