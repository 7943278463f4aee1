package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.InvalidInputException;
import org.depotcast.fleet.PumpQueryService;

import java.time.LocalDate;

/**
 * The earliest origin a forecast as of a past date (a run, an accuracy report) can have: a month after the register's
 * first pump was installed. Before it there is no history to forecast from, and the answer would be an empty run or
 * report instead of a refusal naming the field.
 */
@ApplicationScoped
class PastOrigins {
    private final PumpQueryService pumps;

    PastOrigins(PumpQueryService pumps) {
        this.pumps = pumps;
    }

    /** @param from the origin's month's first day; {@code given} the origin as the caller wrote it, for the message */
    void requireHistoryBefore(LocalDate from, LocalDate given) {
        LocalDate firstInstalled = pumps.firstInstalled().orElse(null);
        if (firstInstalled == null || !from.isAfter(firstInstalled)) {
            throw new InvalidInputException("origin", "must come after the programme's first pump was installed ("
                    + (firstInstalled == null ? "no pump on the register" : firstInstalled)
                    + "): before it there is no history to forecast from, was " + given);
        }
    }
}
