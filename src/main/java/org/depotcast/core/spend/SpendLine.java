package org.depotcast.core.spend;

/**
 * Expected demand that is priced together: one part, at one depot, in one projection year.
 *
 * @param year              0-based projection year
 * @param group             rate-uncertainty group (the component family): lines of a group share one rate draw
 * @param part              index of the part in the caller's list
 * @param depot             index of the depot in the caller's list
 * @param expectedEvents    expected breakdowns (Poisson mean before parameter uncertainty)
 * @param unitsPerEvent     units replaced per breakdown
 * @param deterministicUnits units needed for certain (scheduled services, stock to reach policy levels)
 * @param unitPrice         price per unit in the projection currency, escalation included
 */
public record SpendLine(int year, int group, int part, int depot, double expectedEvents, double unitsPerEvent,
                        double deterministicUnits, double unitPrice) {
    public SpendLine {
        if (year < 0 || group < 0 || part < 0 || depot < 0) {
            throw new IllegalArgumentException("year, group, part and depot indexes must be ≥ 0");
        }
        if (!(expectedEvents >= 0) || !(unitsPerEvent >= 0) || !(deterministicUnits >= 0) || !(unitPrice >= 0)) {
            throw new IllegalArgumentException("expected events, units and price must be finite and ≥ 0");
        }
    }
}
