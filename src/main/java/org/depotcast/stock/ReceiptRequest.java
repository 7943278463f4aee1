package org.depotcast.stock;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** Goods received against one line of a purchase order. */
public record ReceiptRequest(@NotBlank String partNumber, @NotNull BigDecimal quantity, OffsetDateTime occurredAt,
                             @Size(max = 80) String idempotencyKey) {
}
