package org.depotcast.stock;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.EventDate;
import org.depotcast.common.Bounds;
import jakarta.validation.constraints.NotBlank;
import org.depotcast.common.IdempotencyKey;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/**
 * A movement as a client posts it. {@code from}/{@code to} are location codes, absent for outside the programme.
 * A phone that resends after a dropped connection sends the same {@code idempotencyKey} and is answered with the
 * movement already posted.
 */
public record MovementRequest(@NotNull MovementKind kind, @NotBlank @Size(max = 40) String partNumber,
                              @Size(max = 40) String from, @Size(max = 40) String to,
                              @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                              @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                              BigDecimal quantity,
                              @EventDate OffsetDateTime occurredAt, @Size(max = 200) String reason,
                              @Size(max = 80) String reference, @Size(max = 80) String idempotencyKey) {
    MovementCommand toCommand() {
        return new MovementCommand(kind, partNumber, from, to, quantity, occurredAt, reason, reference,
                IdempotencyKey.client("movement", idempotencyKey), null, null);
    }
}
