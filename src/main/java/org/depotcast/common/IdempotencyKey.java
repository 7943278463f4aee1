package org.depotcast.common;

/**
 * An idempotency key and whose it is. A client's key belongs to the account that sent it and to one operation
 * ("movement", "receipt", "transfer-dispatch" …): another account sending the same text, or the same account using it
 * for another operation, is a different key. The service's own keys (a repair's consumptions, a request's issues)
 * live in an internal space that no client can write, whatever text a client sends.
 *
 * <p>Stored as two columns, {@link #ownerFor(String)} and {@link #key()}, unique together. Use it wherever a write
 * accepts a client key: {@code IdempotencyKey.client("transfer-dispatch", body.idempotencyKey())}, then store
 * {@code ownerFor(currentUser.name())} beside the key.
 */
public record IdempotencyKey(boolean internal, String operation, String key) {
    /** Longest client key accepted (the column holds it). */
    public static final int MAX_LENGTH = 80;

    public IdempotencyKey {
        if (operation == null || operation.isBlank() || operation.contains("/")) {
            throw new IllegalArgumentException("operation must be a plain name, was " + operation);
        }
        if (key == null || key.isEmpty()) {
            throw new IllegalArgumentException("key must not be empty");
        }
    }

    /** A key a client sent for one operation; null when it sent none. */
    public static IdempotencyKey client(String operation, String key) {
        return key == null || key.isEmpty() ? null : new IdempotencyKey(false, operation, key);
    }

    /** One of the service's own keys, for one purpose. */
    public static IdempotencyKey internal(String purpose, String key) {
        return new IdempotencyKey(true, purpose, key);
    }

    /**
     * The stored owner: {@code account:<name>/<operation>} for a client key, {@code internal/<purpose>} for the
     * service's own. Account names hold no ':' or '/', so no account's space is another's or the internal one.
     */
    public String ownerFor(String account) {
        return internal ? "internal/" + operation : "account:" + account + "/" + operation;
    }
}
