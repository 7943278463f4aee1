package org.depotcast.stock;

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
                                   @NotBlank String destination,
                                   @NotNull LocalDate orderedOn,
                                   LocalDate expectedOn,
                                   @NotEmpty List<@Valid @NotNull Line> lines) {
    public record Line(@NotBlank String partNumber, @NotNull BigDecimal quantity) {
    }
}
