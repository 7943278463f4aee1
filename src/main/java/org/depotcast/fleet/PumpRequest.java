package org.depotcast.fleet;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PastOrPresent;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;

/** A pump as registered or updated. Usage defaults to the 5 h/day design load (common practice) when not given. */
public record PumpRequest(@NotBlank @Size(max = 40) String assetId,
                          @NotBlank String modelCode,
                          @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("500") BigDecimal depthM,
                          @NotNull @PastOrPresent LocalDate installedOn,
                          @DecimalMin("-90") @DecimalMax("90") BigDecimal latitude,
                          @DecimalMin("-180") @DecimalMax("180") BigDecimal longitude,
                          @NotBlank String depotCode,
                          @Size(max = 60) String assignedMechanic,
                          PumpStatus status,
                          LocalDate statusSince,
                          @DecimalMin("0") @DecimalMax("24") BigDecimal usageHoursPerDay,
                          UsageSource usageSource) {
}
