package org.depotcast.stock;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import org.depotcast.common.Bounds;
import org.depotcast.common.EventDate;

import java.math.BigDecimal;
import java.time.LocalDate;

/** One counted line of a stock count: what was found of a part at a location on a day (today when not given). */
public record StockCountLine(@NotBlank @Size(max = 40) String locationCode,
                             @NotBlank @Size(max = 40) String partNumber,
                             @NotNull @DecimalMin("0") @DecimalMax(Bounds.QUANTITY_MAX) BigDecimal quantity,
                             @EventDate LocalDate countedOn) {
}
