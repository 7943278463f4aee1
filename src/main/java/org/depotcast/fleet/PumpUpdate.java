package org.depotcast.fleet;

import jakarta.validation.constraints.Digits;
import org.depotcast.common.EventDate;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * A change to a registered pump: only the fields sent change; a field left out (or null) keeps its value. An empty
 * {@code assignedMechanic} removes the assignment. {@code assetId}, when sent, must match the path. A status change
 * needs {@code statusSince} unless the pump becomes WORKING today.
 */
public record PumpUpdate(@Size(max = 40) String assetId,
                         @Size(min = 1, max = 40) String modelCode,
                         @DecimalMin(value = "0", inclusive = false) @DecimalMax("500")
                         @Digits(integer = 3, fraction = 6) BigDecimal depthM,
                         @EventDate LocalDate installedOn,
                         @DecimalMin("-90") @DecimalMax("90") @Digits(integer = 2, fraction = 8) BigDecimal latitude,
                         @DecimalMin("-180") @DecimalMax("180") @Digits(integer = 3, fraction = 8) BigDecimal longitude,
                         @Size(min = 1, max = 40) String depotCode,
                         @Size(max = 60) String assignedMechanic,
                         PumpStatus status,
                         @EventDate LocalDate statusSince,
                         @Size(max = 300) String statusNote,
                         @DecimalMin("0") @DecimalMax("24")
                         @Digits(integer = 2, fraction = 4) BigDecimal usageHoursPerDay,
                         UsageSource usageSource) {
}
