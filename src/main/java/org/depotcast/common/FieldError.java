package org.depotcast.common;

/** One thing wrong with the input: where (a JSON field path, a query parameter or "row 12, column qty") and what. */
public record FieldError(String field, String message) {
}
