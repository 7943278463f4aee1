package org.depotcast.stock;

/** A posted movement, and whether it was posted before under the same idempotency key (a resend). */
public record PostedMovement(MovementResponse movement, boolean replayed) {
}
