package org.depotcast.stock;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

public record MovementResponse(long id, MovementKind kind, String partNumber, String from, String to,
                               BigDecimal quantity, OffsetDateTime occurredAt, OffsetDateTime recordedAt, String actor,
                               String reason, String reference, String idempotencyKey) {
    /** The movement with its part's number (the movement holds the part's id). */
    static MovementResponse from(StockMovement m, String partNumber) {
        return new MovementResponse(m.id, m.kind, partNumber, m.fromLocation == null ? null : m.fromLocation.code,
                m.toLocation == null ? null : m.toLocation.code, m.quantity, m.occurredAt, m.recordedAt, m.actor,
                m.reason, m.reference, m.idempotencyKey);
    }
}
