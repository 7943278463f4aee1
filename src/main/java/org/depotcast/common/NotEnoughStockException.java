package org.depotcast.common;

import java.util.Map;

/**
 * A draw of more than the books show on hand at a location; answered 422 {@code /problems/not-enough-stock}, a
 * kind of its own so that a client can tell "book the parts first, then send the same again" from other refusals.
 */
public class NotEnoughStockException extends BusinessRuleException {
    public NotEnoughStockException(String field, String message) {
        super(field, message);
    }

    /** Members the problem answer carries beside the standard ones (none here; a feature's refusal may add its own). */
    public Map<String, Object> members() {
        return Map.of();
    }
}
