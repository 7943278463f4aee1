package org.depotcast.repairs;

import java.time.LocalDate;

/**
 * When a pump's next preventive service falls due, from its operating hours at its daily load.
 *
 * @param serviceIntervalHours  the pump model's service interval
 * @param lastServiceOn         the latest preventive service on record, or null
 * @param countedFrom           the day the hours are counted from: the last service, else installation, else (when
 *                              the pump is older than the records) the first repair on record
 * @param serviceOnRecord       false when no service is on record and the pump is older than the records: the hours
 *                              are then at least those shown, the last service before the records being unknown
 * @param hoursSinceService     operating hours from {@code countedFrom} to today
 * @param hoursPerDay           the daily load in force today
 * @param hoursLeft             interval minus hours since service (negative: past due)
 * @param dueOn                 the day the interval is reached at today's load (in the past when overdue); null when
 *                              the pump is not in use (no load)
 * @param state                 OVERDUE, DUE_SOON (within {@link ServiceDueService#SOON_DAYS} days), LATER, NOT_IN_USE
 */
public record ServiceDue(String assetId, String modelCode, int serviceIntervalHours, LocalDate lastServiceOn,
                         LocalDate countedFrom, boolean serviceOnRecord, double hoursSinceService, double hoursPerDay,
                         double hoursLeft, LocalDate dueOn, State state) {
    public enum State {
        OVERDUE, DUE_SOON, LATER, NOT_IN_USE
    }
}
