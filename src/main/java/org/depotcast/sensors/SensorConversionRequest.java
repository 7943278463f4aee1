package org.depotcast.sensors;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import org.eclipse.microprofile.openapi.annotations.media.Schema;

import java.math.BigDecimal;

/** A pump model's conversion factors; a factor left out (null) is unset, and rows in that unit are refused. */
public record SensorConversionRequest(
        @Schema(description = "Handle strokes per hour of use (above 0, at most 100,000; two decimals)")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") @Digits(integer = 6, fraction = 2)
        BigDecimal strokesPerHour,
        @Schema(description = "Litres drawn per hour of use (above 0, at most 100,000; two decimals)")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000") @Digits(integer = 6, fraction = 2)
        BigDecimal litresPerHour) {
}
