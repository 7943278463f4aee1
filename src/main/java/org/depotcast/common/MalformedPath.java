package org.depotcast.common;

import jakarta.ws.rs.NotFoundException;
import jakarta.ws.rs.core.UriInfo;

import java.util.List;
import java.util.Map;

/**
 * A path identifier that is not a whole number (/api/stock/movements/abc, or one past a 64-bit number): Quarkus REST
 * answers 404 for a path parameter it cannot convert, as if nothing were there. The client sent a malformed value,
 * so the answer is a 400 naming the parameter, as for a query parameter ({@link QueryParams}).
 */
final class MalformedPath {
    private MalformedPath() {
    }

    /** The refusal naming the malformed path parameter, or null when the 404 is a real "nothing here". */
    static InvalidInputException refusal(Throwable e, UriInfo uri) {
        // The converter's failure rides as the cause; a 404 thrown by our own code or an unmatched route has none.
        if (!(e instanceof NotFoundException) || e.getCause() == null || uri == null) {
            return null;
        }
        for (Map.Entry<String, List<String>> parameter : uri.getPathParameters().entrySet()) {
            for (String value : parameter.getValue()) {
                if (!isWholeNumber(value)) {
                    return new InvalidInputException(parameter.getKey(),
                            "must be a whole number, was '" + QueryParams.shown(value) + "'");
                }
            }
        }
        return null;
    }

    private static boolean isWholeNumber(String value) {
        try {
            Long.parseLong(value);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
