package org.depotcast.fleet;

import jakarta.validation.constraints.Digits;
import org.depotcast.common.EventDate;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;

import java.math.BigDecimal;
import java.time.LocalDate;

public record UsageReadingRequest(@NotNull @EventDate LocalDate readOn,
                                  @NotNull @DecimalMin("0") @DecimalMax("24")
                                  @Digits(integer = 2, fraction = 4) BigDecimal hoursPerDay,
                                  @NotNull UsageSource source) {
}
