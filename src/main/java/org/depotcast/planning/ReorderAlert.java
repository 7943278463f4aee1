package org.depotcast.planning;

import java.time.LocalDate;
import java.util.List;

/**
 * The one alert of a part at a location, carrying every reason that applies, with the numbers behind them.
 * {@code kind} is the most pressing reason. {@code pumpDaysAtRisk} is the expected pump-days without water used for
 * ranking: the policy's expected shortfall × half the protection period (a kit: from breakdown demand only, since
 * parts for planned services are planned work), plus, when nothing is on hand, the pumps already waiting × the
 * protection period. {@code raisedAgainBy} lists reasons that appeared after the last acknowledgement or snooze.
 */
public record ReorderAlert(String partNumber, String locationCode, String level, AlertKind kind, List<Reason> reasons,
                           double pumpDaysAtRisk, double onHand, double onOrder, double committed, double position,
                           double reorderPoint, double orderUpTo, double dailyDemand, Double daysOfCover,
                           long pumpsWaiting, List<WaitingPump> waitingPumps, String forecastMethod, String detail,
                           boolean acknowledged, LocalDate snoozedUntil, List<AlertKind> raisedAgainBy) {

    /** One reason the part needs attention at this location, in words. */
    public record Reason(AlertKind kind, String detail) {
    }

    /** A broken pump of this depot waiting for the part: since diagnosis (or report), and the repair it waits in. */
    public record WaitingPump(String assetId, long daysWaiting, String repairRef) {
    }

    boolean has(AlertKind reason) {
        return reasons.stream().anyMatch(r -> r.kind() == reason);
    }
}
