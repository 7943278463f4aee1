package org.depotcast.common;

import java.util.List;

/** The request itself is malformed or out of range; answered 400 with every field problem listed. */
public class InvalidInputException extends RuntimeException {
    private final List<FieldError> errors;

    public InvalidInputException(List<FieldError> errors) {
        super(summary(errors));
        this.errors = List.copyOf(errors);
    }

    public InvalidInputException(String field, String message) {
        this(List.of(new FieldError(field, message)));
    }

    public List<FieldError> errors() {
        return errors;
    }

    private static String summary(List<FieldError> errors) {
        if (errors.isEmpty()) {
            return "invalid input";
        }
        FieldError first = errors.get(0);
        String more = errors.size() > 1 ? " (and " + (errors.size() - 1) + " more)" : "";
        return first.field() + ": " + first.message() + more;
    }
}
