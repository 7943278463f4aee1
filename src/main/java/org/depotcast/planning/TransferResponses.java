package org.depotcast.planning;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** Transfer suggestions and orders as the API shows them. */
public final class TransferResponses {
    private TransferResponses() {
    }

    /** A suggested move: {@code unitCost} is transport per unit; {@code pumpDaysAvoided} the shortage it removes. */
    public record Suggestion(String partNumber, String from, String to, long quantity, double distanceKm,
                             double unitCost, double pumpDaysAvoided) {
    }

    public record Order(long id, String partNumber, String from, String to, BigDecimal quantity, String status,
                        OffsetDateTime dispatchedAt, OffsetDateTime receivedAt, String actor) {
        static Order from(TransferOrder t) {
            return new Order(t.id, t.part.partNumber, t.from.code, t.to.code, t.quantity, t.status.name(),
                    t.dispatchedAt, t.receivedAt, t.actor);
        }
    }
}
