package org.depotcast.catalogue;

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
        @Min(1) int serviceIntervalHours,
        @NotEmpty List<@Valid @NotNull Line> bom) {

    public record Line(@NotBlank String partNumber, @NotNull BomBasis basis,
                       @NotNull @DecimalMin(value = "0", inclusive = false) BigDecimal quantity,
                       @DecimalMin("0") BigDecimal serviceKitQuantity) {
    }
}
