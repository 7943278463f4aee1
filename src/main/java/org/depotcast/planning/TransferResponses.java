package org.depotcast.planning;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.util.List;

/** Transfer suggestions and orders as the API shows them. */
public final class TransferResponses {
    private TransferResponses() {
    }

    /**
     * A suggested move: {@code unitCost} is transport per unit; {@code pumpDaysAvoided} the receiver's reduction in
     * expected pump-days without water over its protection period, {@code overDays} days (its transfer time and
     * review), so suggestions to stores with other periods can be compared per day.
     */
    public record Suggestion(String partNumber, String from, String to, long quantity, double distanceKm,
                             double unitCost, double pumpDaysAvoided, int overDays) {
    }

    /**
     * A transfer: {@code quantity} dispatched; {@code receivedQuantity} and {@code writtenOffQuantity} booked so far;
     * {@code outstanding} still in transit. RECEIVED once nothing is outstanding.
     */
    public record Order(long id, String partNumber, String from, String to, BigDecimal quantity,
                        BigDecimal receivedQuantity, BigDecimal writtenOffQuantity, BigDecimal outstanding,
                        String status, OffsetDateTime dispatchedAt, OffsetDateTime receivedAt, String actor,
                        String idempotencyKey, List<Receipt> receipts) {
        static Order from(TransferOrder t, TransferNames names) {
            return new Order(t.id, names.partNumber(t), names.fromCode(t), names.toCode(t), t.quantity, t.receivedQuantity,
                    t.writtenOffQuantity, t.outstanding(), t.status.name(), t.dispatchedAt, t.receivedAt, t.actor,
                    t.idempotencyKey, t.receipts.stream().map(Receipt::from).toList());
        }
    }

    public record Receipt(BigDecimal receivedQuantity, BigDecimal writtenOffQuantity, String writeOffReason,
                          OffsetDateTime recordedAt, String actor) {
        static Receipt from(TransferReceipt r) {
            return new Receipt(r.receivedQuantity, r.writtenOffQuantity, r.writeOffReason, r.recordedAt, r.actor);
        }
    }

    /** A lane between two depots: {@code setCost} replaces {@code distanceCost} (per unit) when the lead set one. */
    public record Lane(String from, String to, double distanceKm, double distanceCost, Double setCost) {
    }
}
