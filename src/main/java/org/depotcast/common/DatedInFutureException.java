package org.depotcast.common;

/** A date after the thing could have happened (more than a day ahead), read outside Bean Validation; answered 422. */
public class DatedInFutureException extends BusinessRuleException {
    public DatedInFutureException(String field) {
        super(field, DateBounds.futureMessage());
    }
}
