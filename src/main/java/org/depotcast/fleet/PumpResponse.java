package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/** A pump as the API shows it; {@code statusSince} is when the current status began, {@code statusNote} why. */
public record PumpResponse(String assetId, String modelCode, BigDecimal depthM, LocalDate installedOn,
                           BigDecimal latitude, BigDecimal longitude, String depotCode, String assignedMechanic,
                           PumpStatus status, LocalDate statusSince, String statusNote, LocalDate brokenSince,
                           LocalDate decommissionedOn, BigDecimal usageHoursPerDay, UsageSource usageSource,
                           long version) {
    /** The pump with its model's and depot's codes, as {@link PumpCodes} reads them. */
    static PumpResponse from(Pump p, PumpCodes codes) {
        return new PumpResponse(p.assetId, codes.modelCode(p.modelId), p.depthM, p.installedOn, p.latitude, p.longitude,
                codes.depotCode(p.depotId), p.assignedMechanic, p.status, p.statusSince, p.statusNote, p.brokenSince,
                p.decommissionedOn, p.usageHoursPerDay, p.usageSource, p.version);
    }
}
