package org.depotcast.common;

/** The request clashes with the current state (duplicate key, stale version); answered 409. */
public class ConflictException extends RuntimeException {
    private final String field;

    public ConflictException(String field, String message) {
        super(message);
        this.field = field;
    }

    public String field() {
        return field;
    }
}
