package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

public record PumpResponse(String assetId, String modelCode, BigDecimal depthM, LocalDate installedOn,
                           BigDecimal latitude, BigDecimal longitude, String depotCode, String assignedMechanic,
                           PumpStatus status, LocalDate brokenSince, LocalDate decommissionedOn,
                           BigDecimal usageHoursPerDay, UsageSource usageSource, long version) {
    static PumpResponse from(Pump p) {
        return new PumpResponse(p.assetId, p.model.code, p.depthM, p.installedOn, p.latitude, p.longitude,
                p.depot.code, p.assignedMechanic, p.status, p.brokenSince, p.decommissionedOn, p.usageHoursPerDay,
                p.usageSource, p.version);
    }
}
