package org.depotcast.common;

import jakarta.ws.rs.core.HttpHeaders;

/**
 * A body of a type the operation does not read (text/plain or XML to a JSON endpoint, JSON to a CSV upload): the 415
 * names the Content-Type header and quotes what was sent, so a client sees what to change. Quarkus REST refuses it
 * while choosing the method, before one is chosen, so the answer points at the API document for the types taken.
 */
final class UnreadableMediaType {
    static final String FIELD = "Content-Type";

    private UnreadableMediaType() {
    }

    static FieldError error(HttpHeaders headers) {
        String sent = headers == null ? null : headers.getHeaderString(HttpHeaders.CONTENT_TYPE);
        String what = sent == null || sent.isBlank() ? "no type" : "'" + QueryParams.shown(sent) + "'";
        return new FieldError(FIELD, what + " is not a body this operation reads: send the type the API document gives"
                + " for it (application/json for a JSON body, text/csv for a CSV upload)");
    }
}
