package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.UsageTimeline;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * Everything a forecast run needs, read from the database once into plain values: pumps with their usage timelines
 * and bills of materials, and the consumption history. Built by {@link FleetSnapshotLoader}.
 *
 * @param historyStart first day of the first history month
 * @param historyEnd   first day after the last complete history month (the forecast origin)
 * @param pumps        pumps that were in service at some time in the history window or are in service now
 * @param consumption  every replaced part from the repair records
 * @param kitByMechanic kit location code of each mechanic
 * @param locationCodes code of each depot and kit by id
 * @param partNumbers  part number by id
 * @param recordsStartDay epoch day of the earliest repair on record: exposure before it has no events to match
 */
public record FleetSnapshot(LocalDate historyStart, LocalDate historyEnd, List<PumpRecord> pumps, List<Consumption> consumption,
                     Map<String, String> kitByMechanic, Map<Long, String> locationCodes, Map<Long, String> partNumbers,
                     Map<Long, ComponentFamily> partFamilies, long recordsStartDay) {

    int months() {
        return (int) java.time.temporal.ChronoUnit.MONTHS.between(historyStart, historyEnd);
    }

    int monthIndex(LocalDate day) {
        return (int) java.time.temporal.ChronoUnit.MONTHS.between(historyStart, day.withDayOfMonth(1));
    }

    /** A bill-of-materials line as it applies to one pump at its depth. */
    public record BomPart(long partId, ComponentFamily family, double serviceKitQuantity) {
    }

    /**
     * {@code serviceKnown}: a service is on record, or the records cover the pump's whole life. When not,
     * {@code lastServiceDay} is the start of the records: no service is known since then.
     */
    public record PumpRecord(long id, long depotId, String mechanic, double depthM, long installedDay, long endDay,
                      int serviceIntervalHours, UsageTimeline usage, List<BomPart> bom, long lastServiceDay,
                      boolean serviceKnown) {
        /** Operating hours since the last service (or installation), or on record with none, up to {@code day}. */
        public double hoursSinceService(long day) {
            return usage.hoursBetween(Math.max(lastServiceDay, installedDay), day);
        }

        /** Share of the days from {@code from} to {@code to} (exclusive) that the pump is in service. */
        public double inServiceShare(long from, long to) {
            long days = Math.min(to, endDay) - Math.max(from, installedDay);
            return to <= from ? 0 : Math.max(0, Math.min(1, days / (double) (to - from)));
        }

        /** Services due (or expected, when the last one is unknown) in each coming month. */
        public double[] servicesPerMonth(long origin, double[] hoursPerMonth) {
            double since = usage.hoursBetween(Math.max(lastServiceDay, installedDay), origin);
            if (!serviceKnown) {
                return org.depotcast.core.forecast.PreventiveSchedule.expectedServices(hoursPerMonth, serviceIntervalHours, since);
            }
            return org.depotcast.core.forecast.PreventiveSchedule.servicesDuePerMonth(since, hoursPerMonth, serviceIntervalHours);
        }

    }

    /**
     * One part replaced on one repair line.
     *
     * @param day        the day the repair was fixed, or reported while it is open
     * @param reportedOn the day it was reported (on or before {@code day})
     */
    public record Consumption(long partId, long pumpId, long depotId, String mechanic, boolean breakdown, LocalDate day,
                       double quantity, LocalDate reportedOn) {
        /** A repair fixed (or reported, while open) on the day it was reported. */
        public Consumption(long partId, long pumpId, long depotId, String mechanic, boolean breakdown, LocalDate day,
                           double quantity) {
            this(partId, pumpId, depotId, mechanic, breakdown, day, quantity, day);
        }

        /**
         * The line as the records showed it on {@code origin}: as it is, when fixed before then; open and dated by
         * its report, when reported before then and fixed later (as {@code coalesce(fixed, reported)} dated it on that
         * day); null when reported on or after it.
         */
        Consumption asKnownOn(LocalDate origin) {
            if (day.isBefore(origin)) {
                return this;
            }
            return reportedOn.isBefore(origin)
                    ? new Consumption(partId, pumpId, depotId, mechanic, breakdown, reportedOn, quantity, reportedOn)
                    : null;
        }

        /**
         * The line as a held-out window [{@code from}, {@code to}) counts it: as a run on {@code to} reads it (dated by
         * its fix, or by its report while still open then), and null when it was reported before {@code from}, since
         * a run on {@code from} already counted it in its history ({@link #asKnownOn}), or on or after {@code to}.
         * Scored this way every repair is counted once, on one side of the origin: counted by fix date, a repair open
         * on the origin would be history to the forecast and an outcome to its scoring.
         */
        Consumption arisingBetween(LocalDate from, LocalDate to) {
            return reportedOn.isBefore(from) ? null : asKnownOn(to);
        }
    }
}
