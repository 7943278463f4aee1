package org.depotcast.planning;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** One alert per part and location, its ranking, and how acknowledgements and snoozes apply to it. */
class AlertRulesTest {
    private static StockPolicy policy(String level, double daily, double reorderPoint, double onHand, double pumpDays,
                                      String method) {
        return new StockPolicy("P-1", "DEP-A", level, true, 0.95, 21, daily, daily * 21, daily * 21, "poisson",
                reorderPoint, 10, reorderPoint + 10, onHand, 0, 0, onHand, 0.5, pumpDays, method, null, 2.5, "USD", 10,
                10, "Supplier", "reorder point + economic order quantity");
    }

    /** A depot with 10 on the shelf, 6 of them promised to mechanics and s = 3 has 1 to give, not 7. */
    @Test
    void unitsPromisedToMechanicsAreNotSpareToGive() {
        StockPolicy promised = new StockPolicy("P-1", "DEP-A", "DEPOT", true, 0.95, 21, 0.1, 2.1, 2.1, "poisson", 3,
                10, 13, 10, 4, 6, 8, 0.1, 0.2, "fleet", null, 2.5, "USD", 1, 1, "Supplier", "rule");
        assertEquals(1, promised.spareToGive());
        assertEquals(7, policy("DEPOT", 0.1, 3, 10, 0, "fleet").spareToGive());
        assertEquals(0, policy("DEPOT", 0.1, 3, 2.5, 0, "fleet").spareToGive(), "below s there is nothing to give");
    }

    private static final List<ReorderAlert.WaitingPump> TWO_WAITING = List.of(
            new ReorderAlert.WaitingPump("OB-1", 9, "R-1"), new ReorderAlert.WaitingPump("OB-2", 3, "R-2"));

    @Test
    void everyReasonGoesIntoOneAlertRankedByPumpDays() {
        // Nothing on hand, below the reorder point, and two pumps waiting: one alert with both reasons.
        ReorderAlert alert = AlertRules.raise(policy("DEPOT", 0.5, 6, 0, 4.0, "SBA"), TWO_WAITING, null);
        assertEquals(AlertKind.OUT_WITH_PUMPS_WAITING, alert.kind());
        assertEquals(List.of(AlertKind.OUT_WITH_PUMPS_WAITING, AlertKind.BELOW_REORDER_POINT),
                alert.reasons().stream().map(ReorderAlert.Reason::kind).toList());
        // Expected pump-days: the policy's 4.0 plus 2 waiting pumps × the 21-day protection period.
        assertEquals(4.0 + 2 * 21, alert.pumpDaysAtRisk(), 1e-12);
        assertEquals(2, alert.pumpsWaiting());
        assertEquals("OB-1", alert.waitingPumps().get(0).assetId());
        assertTrue(alert.detail().contains("R-1") && alert.detail().contains("9 days"));
        assertEquals("none on hand; 2 pumps broken and waiting for this part, the longest (OB-1, repair R-1) for 9 days",
                alert.reasons().get(0).detail());
    }

    @Test
    void oneWaitingPumpIsSaidInPlainWords() {
        // Was "1 pump(s) broken and waiting for this part, the longest (...) for 1 days".
        ReorderAlert alert = AlertRules.raise(policy("DEPOT", 0.5, 6, 0, 4.0, "SBA"),
                List.of(new ReorderAlert.WaitingPump("OB-7", 1, "R-7")), null);
        assertEquals("none on hand; 1 pump broken and waiting for this part (OB-7, repair R-7) for 1 day",
                alert.reasons().get(0).detail());
    }

    @Test
    void aKitShortOnlyForPlannedServicesIsPlannedWorkRankedByBreakdownRisk() {
        StockPolicy withServices = policy("KIT", 0.2, 3, 1, 0.9, "fleet");
        StockPolicy breakdownsOnly = policy("KIT", 0.01, 0, 1, 0.004, "fleet");
        ReorderAlert alert = AlertRules.raise(withServices, List.of(), breakdownsOnly);
        assertEquals(AlertKind.PLANNED_WORK_SHORT, alert.kind());
        assertEquals(0.004, alert.pumpDaysAtRisk(), 1e-12);
        // Short even for breakdowns: a shortage, ranked by the breakdown risk.
        ReorderAlert shortage = AlertRules.raise(withServices, List.of(), policy("KIT", 0.1, 2, 1, 0.3, "fleet"));
        assertEquals(AlertKind.BELOW_REORDER_POINT, shortage.kind());
        assertEquals(0.3, shortage.pumpDaysAtRisk(), 1e-12);
    }

    @Test
    void aPartWithoutAForecastIsSaidSoNotCalledExcess() {
        ReorderAlert alert = AlertRules.raise(policy("DEPOT", 0, 0, 40, 0, AlertRules.NO_FORECAST), List.of(), null);
        assertEquals(List.of(AlertKind.NO_FORECAST), alert.reasons().stream().map(ReorderAlert.Reason::kind).toList());
        assertEquals(0, alert.pumpDaysAtRisk());
        // The same stock with a forecast of no demand is excess.
        assertEquals(AlertKind.EXCESS, AlertRules.raise(policy("DEPOT", 0, 0, 40, 0, "SBA"), List.of(), null).kind());
        assertNull(AlertRules.raise(policy("DEPOT", 0, 0, 0, 0, AlertRules.NO_FORECAST), List.of(), null));
    }

    private static AlertAction action(AlertAction.Action kind, String reasons, LocalDate actedOn, LocalDate snoozedUntil) {
        AlertAction a = new AlertAction();
        a.action = kind;
        a.alertKind = AlertKind.valueOf(reasons.split(",")[0]);
        a.reasons = reasons;
        a.actedAt = OffsetDateTime.of(actedOn.atStartOfDay(), ZoneOffset.UTC);
        a.snoozedUntil = snoozedUntil;
        return a;
    }

    @Test
    void anAcknowledgementCoversItsReasonsUntilTheNextReview() {
        LocalDate today = LocalDate.of(2026, 12, 2);
        ReorderAlert below = AlertRules.raise(policy("DEPOT", 0.5, 6, 2, 1.0, "SBA"), List.of(), null);
        AlertAction ack = action(AlertAction.Action.ACKNOWLEDGE, "BELOW_REORDER_POINT,STOCKOUT_PROJECTED", today.minusDays(2), null);
        ReorderAlert acknowledged = AlertActionFold.apply(below, ack, today, 7);
        assertTrue(acknowledged.acknowledged());
        assertTrue(acknowledged.raisedAgainBy().isEmpty());
        // At the next review (7 days on) it stands again as new.
        assertFalse(AlertActionFold.apply(below, ack, today.plusDays(5), 7).acknowledged());
        // A reason the acknowledgement did not cover raises it again at once.
        ReorderAlert worse = AlertRules.raise(policy("DEPOT", 0.5, 6, 0, 1.0, "SBA"), TWO_WAITING, null);
        ReorderAlert raisedAgain = AlertActionFold.apply(worse, ack, today, 7);
        assertFalse(raisedAgain.acknowledged());
        assertEquals(List.of(AlertKind.OUT_WITH_PUMPS_WAITING), raisedAgain.raisedAgainBy());
    }

    @Test
    void aSnoozeHidesTheAlertUntilItsDateUnlessANewReasonAppears() {
        LocalDate today = LocalDate.of(2026, 12, 2);
        ReorderAlert below = AlertRules.raise(policy("DEPOT", 0.5, 6, 2, 1.0, "SBA"), List.of(), null);
        AlertAction snooze = action(AlertAction.Action.SNOOZE, "BELOW_REORDER_POINT,STOCKOUT_PROJECTED", today, today.plusDays(3));
        assertEquals(today.plusDays(3), AlertActionFold.apply(below, snooze, today, 7).snoozedUntil());
        assertNull(AlertActionFold.apply(below, snooze, today.plusDays(3), 7).snoozedUntil());
        ReorderAlert worse = AlertRules.raise(policy("DEPOT", 0.5, 6, 0, 1.0, "SBA"), TWO_WAITING, null);
        assertNull(AlertActionFold.apply(worse, snooze, today, 7).snoozedUntil());
    }
}
