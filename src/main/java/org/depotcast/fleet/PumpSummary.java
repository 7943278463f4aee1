package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * An installed pump as other features read it: a record, not the entity, so they hold no managed pump, pump model
 * or depot. {@code modelId} is the catalogue's pump model, {@code depotId} and {@code depotCode} the stock location.
 * Read by query ({@code PumpRepository}), never copied from the entity's associations.
 *
 * @param usageHoursPerDay the pump's current daily load, hours
 */
public record PumpSummary(long id, String assetId, long modelId, long depotId, String depotCode,
                          String assignedMechanic, BigDecimal depthM, LocalDate installedOn, PumpStatus status,
                          BigDecimal usageHoursPerDay) {
}
