package org.depotcast.sensors;

import java.time.LocalDate;

/**
 * A pump's daily load as its sensor measured it over a window of whole months before an origin: hours per day over
 * the days read (days without a reading are left out, not counted as zero). {@link UsageBasis} says where a pump's
 * load comes from; a pump with no sensor months keeps the quarterly estimate.
 */
public record MeasuredUsage(long pumpId, double hoursPerDay, double hours, int daysCovered, LocalDate from,
                            LocalDate to) {
    public UsageBasis basis() {
        return UsageBasis.MEASURED_BY_SENSOR;
    }
}
