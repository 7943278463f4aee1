package org.depotcast.common;

/** Well-formed input that a rule of the trade refuses (e.g. issuing more than is on hand); answered 422. */
public class BusinessRuleException extends RuntimeException {
    private final String field;

    public BusinessRuleException(String field, String message) {
        super(message);
        this.field = field;
    }

    public String field() {
        return field;
    }
}
