package org.depotcast.forecasting;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/**
 * One forecast run; {@code forPlanning} is false for a run as of a past origin, which planning never reads.
 * {@code startedBy} is the account that started it ({@code system:forecast-schedule} for the nightly run; null for
 * runs older than the record).
 */
public record RunResponse(long id, String trigger, String startedBy, boolean forPlanning, String status, LocalDate origin, OffsetDateTime startedAt, OffsetDateTime finishedAt,
                          LocalDate historyFrom, LocalDate historyTo, int horizonMonths, int seriesDone,
                          int seriesTotal, String message, Long jobId) {
    static RunResponse from(ForecastRun r) {
        return new RunResponse(r.id, r.triggerKind, r.startedBy, !ForecastRunService.AS_OF_TRIGGER.equals(r.triggerKind), r.status.name(), r.origin, r.startedAt, r.finishedAt, r.historyFrom,
                r.historyTo, r.horizonMonths, r.seriesDone, r.seriesTotal, r.message, r.jobId);
    }
}
