package org.depotcast.stock;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;

public record LocationRequest(
        @NotBlank @Size(max = 40)
        @Pattern(regexp = "[A-Za-z0-9._-]+", message = "may hold letters, digits and . _ - only")
        String code,
        @NotBlank @Size(max = 120) String name,
        @NotNull LocationKind kind,
        @Size(max = 40) String parentCode,
        @DecimalMin("-90") @DecimalMax("90") @Digits(integer = 2, fraction = 8) BigDecimal latitude,
        @DecimalMin("-180") @DecimalMax("180") @Digits(integer = 3, fraction = 8) BigDecimal longitude,
        @Size(max = 60) String mechanicUsername) {
}
