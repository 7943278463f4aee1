package org.depotcast.access;

import io.smallrye.config.ConfigMapping;
import io.smallrye.config.WithDefault;

import java.time.Duration;
import java.util.Optional;

/** The browser session: how its cookie is signed and marked, and how long it lasts. */
@ConfigMapping(prefix = "depotcast.session")
public interface SessionSettings {
    /**
     * Signs session cookies (HMAC-SHA-256). Required in production mode (at least 32 characters, from a secret store);
     * in demo mode a random key is made at each start, so sessions end at a restart. Never logged.
     */
    Optional<String> key();

    /** A session ends this long after sign-in, used or not (a working day by default). */
    @WithDefault("PT12H")
    Duration lifetime();

    /**
     * Mark the cookie Secure on every answer. Unset: Secure in production mode; in demo mode only when the request
     * came over HTTPS. Set false to run production over plain HTTP on a local network (the cookie then travels in
     * clear text).
     */
    Optional<Boolean> secureCookie();
}
