package org.depotcast.access;

import io.quarkus.security.identity.request.BaseAuthenticationRequest;

/** A request signed in by the session cookie; carries the cookie's value. */
final class SessionAuthenticationRequest extends BaseAuthenticationRequest {
    private final String cookieValue;

    SessionAuthenticationRequest(String cookieValue) {
        this.cookieValue = cookieValue;
    }

    String cookieValue() {
        return cookieValue;
    }
}
