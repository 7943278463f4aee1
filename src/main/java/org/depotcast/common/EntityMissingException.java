package org.depotcast.common;

/** A named thing (part, location, pump...) does not exist; answered 404, or 422 when named inside a request body. */
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
