package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/** A pump as the API shows it; {@code statusSince} is when the current status began, {@code statusNote} why. */
public record PumpResponse(String assetId, String modelCode, BigDecimal depthM, LocalDate installedOn,
                           BigDecimal latitude, BigDecimal longitude, String depotCode, String assignedMechanic,
                           PumpStatus status, LocalDate statusSince, String statusNote, LocalDate brokenSince,
                           LocalDate decommissionedOn, BigDecimal usageHoursPerDay, UsageSource usageSource,
                           long version) {
    static PumpResponse from(Pump p) {
        return new PumpResponse(p.assetId, p.model.code, p.depthM, p.installedOn, p.latitude, p.longitude,
                p.depot.code, p.assignedMechanic, p.status, p.statusSince, p.statusNote, p.brokenSince,
                p.decommissionedOn, p.usageHoursPerDay, p.usageSource, p.version);
    }
}
