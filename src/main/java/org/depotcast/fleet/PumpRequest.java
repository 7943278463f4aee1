package org.depotcast.fleet;

import jakarta.validation.constraints.Digits;
import org.depotcast.common.EventDate;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;

/** A pump as registered or updated. Usage defaults to the 5 h/day design load (common practice) when not given. */
public record PumpRequest(@NotBlank @Size(max = 40) String assetId,
                          @NotBlank @Size(max = 40) String modelCode,
                          @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("500")
                          @Digits(integer = 3, fraction = 6) BigDecimal depthM,
                          @NotNull @EventDate LocalDate installedOn,
                          @DecimalMin("-90") @DecimalMax("90") @Digits(integer = 2, fraction = 8) BigDecimal latitude,
                          @DecimalMin("-180") @DecimalMax("180")
                          @Digits(integer = 3, fraction = 8) BigDecimal longitude,
                          @NotBlank @Size(max = 40) String depotCode,
                          @Size(max = 60) String assignedMechanic,
                          PumpStatus status,
                          @EventDate LocalDate statusSince,
                          @DecimalMin("0") @DecimalMax("24")
                          @Digits(integer = 2, fraction = 4) BigDecimal usageHoursPerDay,
                          UsageSource usageSource) {
}
