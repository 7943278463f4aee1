package org.depotcast.common;

/**
 * A named thing (part, location, pump...) does not exist: answered 404 {@code not-found} when named in the path
 * ({@code field} null), 422 {@code unknown-reference} naming the field when named in a body or query.
 */
public class EntityMissingException extends RuntimeException {
    private final String field;

    public EntityMissingException(String field, String what, Object key) {
        super(what + " '" + key + "' does not exist");
        this.field = field;
    }

    public String field() {
        return field;
    }
}
