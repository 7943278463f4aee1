package org.depotcast.planning;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/** Which reasons a policy and its stock raise, folded into the one alert of the part at the location. */
final class AlertRules {
    /** The forecast method a policy carries when the latest run has no forecast of the part at the location. */
    static final String NO_FORECAST = "no forecast";

    private AlertRules() {
    }

    /**
     * The alert of one part at one location, or null when nothing needs attention.
     *
     * @param waiting        broken pumps of the location waiting for the part, longest first
     * @param breakdownsOnly for a kit, the same part's policy from breakdown demand alone (null elsewhere): it ranks
     *                       the alert, and tells a shortage from parts that only planned services need
     */
    static ReorderAlert raise(StockPolicy p, List<ReorderAlert.WaitingPump> waiting, StockPolicy breakdownsOnly) {
        Double cover = p.dailyDemand() > 0 ? p.onHand() / p.dailyDemand() : null;
        boolean out = p.onHand() <= 0 && !waiting.isEmpty();
        List<ReorderAlert.Reason> reasons = new ArrayList<>();
        addShortageReasons(reasons, p, waiting, breakdownsOnly);
        addHoldingReasons(reasons, p, cover);
        if (reasons.isEmpty()) {
            return null;
        }
        reasons.sort(Comparator.comparing(ReorderAlert.Reason::kind));
        double risk = breakdownsOnly != null ? breakdownsOnly.pumpDaysAtRisk() : p.pumpDaysAtRisk();
        if (out) {
            risk += waiting.size() * (double) p.protectionDays();
        }
        return new ReorderAlert(p.partNumber(), p.locationCode(), p.level(), reasons.get(0).kind(), List.copyOf(reasons),
                risk, p.onHand(), p.onOrder(), p.committed(), p.position(), p.reorderPoint(), p.orderUpTo(),
                p.dailyDemand(), cover, waiting.size(), List.copyOf(waiting), p.forecastMethod(),
                reasons.get(0).detail(), false, null, List.of());
    }

    /** Too little: out with pumps waiting, at or below the reorder point, or running out within the protection period. */
    private static void addShortageReasons(List<ReorderAlert.Reason> reasons, StockPolicy p,
                                           List<ReorderAlert.WaitingPump> waiting, StockPolicy breakdownsOnly) {
        if (p.onHand() <= 0 && !waiting.isEmpty()) {
            ReorderAlert.WaitingPump longest = waiting.get(0);
            String days = longest.daysWaiting() == 1 ? "1 day" : longest.daysWaiting() + " days";
            reasons.add(new ReorderAlert.Reason(AlertKind.OUT_WITH_PUMPS_WAITING, waiting.size() == 1
                    ? String.format(Locale.ROOT, "none on hand; 1 pump broken and waiting for this part (%s, repair %s) for %s",
                    longest.assetId(), longest.repairRef(), days)
                    : String.format(Locale.ROOT, "none on hand; %d pumps broken and waiting for this part, the longest (%s, "
                    + "repair %s) for %s", waiting.size(), longest.assetId(), longest.repairRef(), days)));
        }
        if (p.dailyDemand() > 0 && p.position() <= p.reorderPoint()) {
            if (breakdownsOnly != null && breakdownsOnly.position() > breakdownsOnly.reorderPoint()) {
                reasons.add(new ReorderAlert.Reason(AlertKind.PLANNED_WORK_SHORT, String.format(Locale.ROOT,
                        "position %.0f at or below min %.0f only because of planned services; top up to %.0f before "
                                + "the services are due", p.position(), p.reorderPoint(), p.orderUpTo())));
            } else {
                reasons.add(new ReorderAlert.Reason(AlertKind.BELOW_REORDER_POINT, String.format(Locale.ROOT,
                        "position %.0f at or below reorder point %.0f; order up to %.0f",
                        p.position(), p.reorderPoint(), p.orderUpTo())));
            }
        }
        // A kit running out of parts that only planned services use is planned work, not a stock-out.
        double shortageDemand = breakdownsOnly != null ? breakdownsOnly.dailyDemand() : p.dailyDemand();
        Double shortageCover = shortageDemand > 0 ? p.onHand() / shortageDemand : null;
        if (shortageCover != null && p.onHand() > 0 && shortageCover < p.protectionDays()) {
            reasons.add(new ReorderAlert.Reason(AlertKind.STOCKOUT_PROJECTED, String.format(Locale.ROOT,
                    "%.0f days of cover, replenishment takes %d days", shortageCover, p.protectionDays())));
        }
    }

    /** Too much or unknown: shelf life at risk, excess over order-up-to, or stock held with no forecast. */
    private static void addHoldingReasons(List<ReorderAlert.Reason> reasons, StockPolicy p, Double cover) {
        boolean forecast = !NO_FORECAST.equals(p.forecastMethod());
        if (forecast && p.shelfLifeDays() != null && p.onHand() > 0 && (p.dailyDemand() == 0 || cover > p.shelfLifeDays())) {
            double unused = p.onHand() - p.dailyDemand() * p.shelfLifeDays();
            reasons.add(new ReorderAlert.Reason(AlertKind.SHELF_LIFE_RISK, String.format(Locale.ROOT,
                    "about %.0f units will not be used within the %d-day shelf life at the current rate",
                    unused, p.shelfLifeDays())));
        }
        if (forecast && p.position() > p.orderUpTo() + p.orderQuantity()) {
            reasons.add(new ReorderAlert.Reason(AlertKind.EXCESS, String.format(Locale.ROOT,
                    "%.0f beyond order-up-to %.0f", p.position() - p.orderUpTo(), p.orderUpTo())));
        }
        if (!forecast && p.onHand() > 0) {
            reasons.add(new ReorderAlert.Reason(AlertKind.NO_FORECAST, "stock is held but the latest forecast run has "
                    + "no forecast of this part here: demand unknown, so no reorder point, excess or shelf-life check"));
        }
    }

    static ReorderAlert withAction(ReorderAlert a, boolean acknowledged, LocalDate snoozedUntil, List<AlertKind> raisedAgainBy) {
        return new ReorderAlert(a.partNumber(), a.locationCode(), a.level(), a.kind(), a.reasons(), a.pumpDaysAtRisk(),
                a.onHand(), a.onOrder(), a.committed(), a.position(), a.reorderPoint(), a.orderUpTo(), a.dailyDemand(),
                a.daysOfCover(), a.pumpsWaiting(), a.waitingPumps(), a.forecastMethod(), a.detail(), acknowledged,
                snoozedUntil, raisedAgainBy);
    }
}
