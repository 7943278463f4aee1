package org.depotcast.fleet;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PastOrPresent;

import java.math.BigDecimal;
import java.time.LocalDate;

public record UsageReadingRequest(@NotNull @PastOrPresent LocalDate readOn,
                                  @NotNull @DecimalMin("0") @DecimalMax("24") BigDecimal hoursPerDay,
                                  @NotNull UsageSource source) {
}
