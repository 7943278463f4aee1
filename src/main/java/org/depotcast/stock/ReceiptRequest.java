package org.depotcast.stock;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.EventDate;
import org.depotcast.common.Bounds;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** Goods received against one line of a purchase order. */
public record ReceiptRequest(@NotBlank @Size(max = 40) String partNumber,
                             @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                             @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                             BigDecimal quantity,
                             @EventDate OffsetDateTime occurredAt,
                             @Size(max = 80) String idempotencyKey) {
}
