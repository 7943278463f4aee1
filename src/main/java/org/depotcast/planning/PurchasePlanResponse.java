package org.depotcast.planning;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

/**
 * A purchase plan: {@code lines} to buy, and {@code leftOut}, the parts still below their reorder point after it
 * (the budget did not reach them). Pump-days are expected pump-days without water over the protection period.
 */
public record PurchasePlanResponse(long id, String status, LocalDate planningDate, BigDecimal budget, String currency,
                                   BigDecimal spent, double pumpDaysBefore, double pumpDaysAfter, List<Line> lines,
                                   List<Line> leftOut) {
    public record Line(String partNumber, String description, String supplier, int packs, BigDecimal quantity,
                       BigDecimal cost, double positionBefore, double reorderPoint, double orderUpTo,
                       double shortfallAfter) {
        static Line from(PurchasePlanLine l) {
            return new Line(l.part.partNumber, l.part.description, l.part.supplier, l.packs, l.quantity, l.cost,
                    l.positionBefore, l.reorderPoint, l.orderUpTo, l.shortfallAfter);
        }
    }

    static PurchasePlanResponse from(PurchasePlan p) {
        return new PurchasePlanResponse(p.id, p.status.name(), p.planningDate, p.budget, p.currency, p.spent,
                p.pumpDaysBefore, p.pumpDaysAfter,
                p.lines.stream().filter(l -> l.packs > 0).map(Line::from).toList(),
                p.lines.stream().filter(l -> l.shortfallAfter > 0).map(Line::from).toList());
    }
}
