package org.depotcast.common;

import io.quarkus.logging.Log;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.inject.Produces;
import jakarta.inject.Singleton;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Optional;

/**
 * The one clock the service reads the time from, in UTC: the system clock, or a fixed instant when
 * {@code depotcast.clock.fixed} is set (an ISO instant such as {@code 2026-06-15T08:00:00Z}), so tests can pin "today"
 * and date rules (the default forecast origin, a snooze's expiry, a count's date) follow it.
 */
@ApplicationScoped
class ClockProducer {

    @Produces
    @Singleton
    Clock clock(@ConfigProperty(name = "depotcast.clock.fixed") Optional<String> fixed) {
        if (fixed.isEmpty() || fixed.get().isBlank()) {
            return Clock.systemUTC();
        }
        try {
            Instant at = Instant.parse(fixed.get().trim());
            Log.warnf("the clock is fixed at %s (depotcast.clock.fixed): every date rule reads this instant", at);
            return Clock.fixed(at, ZoneOffset.UTC);
        } catch (DateTimeParseException e) {
            throw new IllegalStateException("depotcast.clock.fixed must be an instant such as 2026-06-15T08:00:00Z, was "
                    + fixed.get(), e);
        }
    }
}
