package org.depotcast.stock;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.PlanDate;
import org.depotcast.common.EventDate;
import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

public record PurchaseOrderRequest(@NotBlank @Size(max = 40) String orderNumber,
                                   @NotBlank @Size(max = 120) String supplier,
                                   @NotBlank @Size(max = 40) String destination,
                                   @NotNull @EventDate LocalDate orderedOn,
                                   @PlanDate LocalDate expectedOn,
                                   @NotEmpty @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull Line> lines) {
    public record Line(@NotBlank @Size(max = 40) String partNumber,
                       @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                       @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                       BigDecimal quantity) {
    }
}
