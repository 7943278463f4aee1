package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * An installed pump as other features read it: a record, not the entity, so they hold no managed pump, pump model
 * or depot. {@code modelId} is the catalogue's pump model, {@code depotId} and {@code depotCode} the stock location.
 * Read by query ({@code PumpRepository}), the depot's code from stock by id.
 *
 * @param usageHoursPerDay the pump's current daily load, hours
 */
public record PumpSummary(long id, String assetId, long modelId, long depotId, String depotCode,
                          String assignedMechanic, BigDecimal depthM, LocalDate installedOn, PumpStatus status,
                          BigDecimal usageHoursPerDay) {
    /** As the pump table holds it, before the depot's code is read from stock (the repository's query). */
    PumpSummary(long id, String assetId, long modelId, long depotId, String assignedMechanic, BigDecimal depthM,
                LocalDate installedOn, PumpStatus status, BigDecimal usageHoursPerDay) {
        this(id, assetId, modelId, depotId, null, assignedMechanic, depthM, installedOn, status, usageHoursPerDay);
    }

    PumpSummary withDepotCode(String code) {
        return new PumpSummary(id, assetId, modelId, depotId, code, assignedMechanic, depthM, installedOn, status,
                usageHoursPerDay);
    }
}
