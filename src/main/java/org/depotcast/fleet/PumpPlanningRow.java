package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * One pump as programme-wide planning runs read it, without loading entities.
 *
 * @param decommissionedOn null unless the pump is decommissioned
 * @param usageHoursPerDay the pump's current daily load, hours
 */
public record PumpPlanningRow(long pumpId, long depotId, String mechanic, BigDecimal depthM, LocalDate installedOn,
                              PumpStatus status, LocalDate decommissionedOn, long modelId, BigDecimal usageHoursPerDay) {
}
