package org.depotcast.stock;

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
public record MovementRequest(@NotNull MovementKind kind, @NotBlank String partNumber, String from, String to,
                              @NotNull BigDecimal quantity, OffsetDateTime occurredAt, @Size(max = 200) String reason,
                              @Size(max = 80) String reference, @Size(max = 80) String idempotencyKey) {
    MovementCommand toCommand() {
        return new MovementCommand(kind, partNumber, from, to, quantity, occurredAt, reason, reference,
                IdempotencyKey.client("movement", idempotencyKey), null, null);
    }
}
