package org.depotcast.planning;

import java.time.LocalDate;

/**
 * One alert with the numbers behind it. {@code pumpDaysAtRisk} is the consequence used for sorting; for pumps
 * already waiting it adds the waiting pumps times the protection period.
 */
public record ReorderAlert(String partNumber, String locationCode, AlertKind kind, double pumpDaysAtRisk,
                           double onHand, double onOrder, double committed, double position, double reorderPoint, double orderUpTo,
                           double dailyDemand, Double daysOfCover, long pumpsWaiting, String detail,
                           boolean acknowledged, LocalDate snoozedUntil) {
}
