package org.depotcast.stock;

import org.depotcast.common.IdempotencyKey;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/**
 * What a caller asks the ledger to post. Locations by code (null = outside the programme); the two link ids tie a
 * movement to the purchase-order line or repair that caused it. A client's idempotency key belongs to the account
 * posting it ({@link IdempotencyKey#client}); the services' own keys are {@link IdempotencyKey#internal}.
 */
public record MovementCommand(MovementKind kind, String partNumber, String fromCode, String toCode,
                              BigDecimal quantity, OffsetDateTime occurredAt, String reason, String reference,
                              IdempotencyKey idempotencyKey, Long purchaseOrderLineId, Long repairId) {

    public static MovementCommand of(MovementKind kind, String partNumber, String fromCode, String toCode,
                                     BigDecimal quantity, String reference) {
        return new MovementCommand(kind, partNumber, fromCode, toCode, quantity, null, null, reference, null, null, null);
    }
}
