package org.depotcast.planning;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Which alerts a policy and its stock raise, each with the numbers that explain it. */
final class AlertRules {
    private AlertRules() {
    }

    static List<ReorderAlert> raise(StockPolicy p, long pumpsWaiting) {
        List<ReorderAlert> alerts = new ArrayList<>();
        Double cover = p.dailyDemand() > 0 ? p.onHand() / p.dailyDemand() : null;
        if (p.onHand() <= 0 && pumpsWaiting > 0) {
            alerts.add(alert(p, AlertKind.OUT_WITH_PUMPS_WAITING, p.pumpDaysAtRisk() + pumpsWaiting * (double) p.protectionDays(),
                    cover, pumpsWaiting, pumpsWaiting + " pump(s) broken and waiting for this part"));
        }
        if (p.dailyDemand() > 0 && p.position() <= p.reorderPoint()) {
            alerts.add(alert(p, AlertKind.BELOW_REORDER_POINT, p.pumpDaysAtRisk(), cover, pumpsWaiting,
                    String.format(Locale.ROOT, "position %.0f at or below reorder point %.0f; order up to %.0f",
                            p.position(), p.reorderPoint(), p.orderUpTo())));
        }
        if (cover != null && p.onHand() > 0 && cover < p.protectionDays()) {
            alerts.add(alert(p, AlertKind.STOCKOUT_PROJECTED, p.pumpDaysAtRisk(), cover, pumpsWaiting,
                    String.format(Locale.ROOT, "%.0f days of cover, replenishment takes %d days", cover, p.protectionDays())));
        }
        if (p.position() > p.orderUpTo() + p.orderQuantity()) {
            alerts.add(alert(p, AlertKind.EXCESS, 0, cover, pumpsWaiting,
                    String.format(Locale.ROOT, "%.0f beyond order-up-to %.0f", p.position() - p.orderUpTo(), p.orderUpTo())));
        }
        if (p.shelfLifeDays() != null && p.onHand() > 0 && (p.dailyDemand() == 0 || cover > p.shelfLifeDays())) {
            double unused = p.onHand() - p.dailyDemand() * p.shelfLifeDays();
            alerts.add(alert(p, AlertKind.SHELF_LIFE_RISK, 0, cover, pumpsWaiting,
                    String.format(Locale.ROOT, "about %.0f units will not be used within the %d-day shelf life at the current rate",
                            unused, p.shelfLifeDays())));
        }
        return alerts;
    }

    private static ReorderAlert alert(StockPolicy p, AlertKind kind, double pumpDays, Double cover, long waiting, String detail) {
        return new ReorderAlert(p.partNumber(), p.locationCode(), kind, pumpDays, p.onHand(), p.onOrder(), p.committed(), p.position(),
                p.reorderPoint(), p.orderUpTo(), p.dailyDemand(), cover, waiting, detail, false, null);
    }

    static ReorderAlert withAction(ReorderAlert a, boolean acknowledged, LocalDate snoozedUntil) {
        return new ReorderAlert(a.partNumber(), a.locationCode(), a.kind(), a.pumpDaysAtRisk(), a.onHand(), a.onOrder(),
                a.committed(), a.position(), a.reorderPoint(), a.orderUpTo(), a.dailyDemand(), a.daysOfCover(), a.pumpsWaiting(),
                a.detail(), acknowledged, snoozedUntil);
    }
}
