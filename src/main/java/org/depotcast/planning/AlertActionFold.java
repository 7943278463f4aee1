package org.depotcast.planning;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * How the latest acknowledgement or snooze of a part at a location applies to its alert today. An action covers the
 * reasons the alert had when it was taken. An acknowledgement holds until the location's next review (review days
 * after it); a snooze until its date. While an action holds, a reason it did not cover raises the alert again
 * (shown, not acknowledged, not snoozed, with {@code raisedAgainBy}); once it lapses, the alert stands as new.
 */
final class AlertActionFold {
    private AlertActionFold() {
    }

    /** The alert with its acknowledgement and snooze state; {@code latest} may be null. */
    static ReorderAlert apply(ReorderAlert alert, AlertAction latest, LocalDate today, int reviewDays) {
        if (latest == null) {
            return alert;
        }
        boolean holds = latest.action == AlertAction.Action.SNOOZE
                ? latest.snoozedUntil != null && latest.snoozedUntil.isAfter(today)
                : latest.actedAt.atZoneSameInstant(ZoneOffset.UTC).toLocalDate().plusDays(reviewDays).isAfter(today);
        if (!holds) {
            return alert;
        }
        Set<AlertKind> covered = covered(latest);
        List<AlertKind> uncovered = alert.reasons().stream().map(ReorderAlert.Reason::kind)
                .filter(k -> !covered.contains(k)).toList();
        boolean quiet = uncovered.isEmpty();
        return AlertRules.withAction(alert, quiet && latest.action == AlertAction.Action.ACKNOWLEDGE,
                quiet && latest.action == AlertAction.Action.SNOOZE ? latest.snoozedUntil : null, uncovered);
    }

    static Set<AlertKind> covered(AlertAction action) {
        Set<AlertKind> kinds = EnumSet.noneOf(AlertKind.class);
        String list = action.reasons == null ? action.alertKind.name() : action.reasons;
        for (String name : list.split(",")) {
            if (!name.isBlank()) {
                kinds.add(AlertKind.valueOf(name.strip()));
            }
        }
        return kinds;
    }

    static String join(List<ReorderAlert.Reason> reasons) {
        return String.join(",", reasons.stream().map(r -> r.kind().name()).toList());
    }
}
