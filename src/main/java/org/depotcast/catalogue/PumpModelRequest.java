package org.depotcast.catalogue;

import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.util.List;

public record PumpModelRequest(
        @NotBlank @Size(max = 40) String code,
        @NotBlank @Size(max = 120) String name,
        @Min(1) @Max(Bounds.SERVICE_INTERVAL_HOURS_MAX) int serviceIntervalHours,
        @NotEmpty @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull Line> bom) {

    public record Line(@NotBlank @Size(max = 40) String partNumber, @NotNull BomBasis basis,
                       @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.BOM_QUANTITY_MAX)
                       @Digits(integer = 4, fraction = 4) BigDecimal quantity,
                       @DecimalMin("0") @DecimalMax(Bounds.BOM_QUANTITY_MAX)
                       @Digits(integer = 4, fraction = 4) BigDecimal serviceKitQuantity) {
    }
}
