package org.depotcast.planning;

import org.depotcast.catalogue.PartSummary;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * A purchase plan: {@code lines} to buy; {@code leftOut}, what the plan did not buy of parts that stay below their
 * reorder point (a part-funded line shows only its unfunded remainder), and why; {@code noForecast}, parts the
 * latest forecast run has no programme forecast for, so the plan could not weigh them. {@code objective} says what
 * was minimised, in what unit, over which days; {@code caution} is the one line to read before buying.
 */
public record PurchasePlanResponse(long id, String status, LocalDate planningDate, BigDecimal budget, String currency,
                                   BigDecimal spent, Objective objective, double pumpDaysBefore, double pumpDaysAfter,
                                   List<Line> lines, List<LeftOut> leftOut, List<String> noForecast, String caution) {
    static final String CAUTION = "A plan, not an order: confirm stock, prices and lead times before buying; parts in "
            + "contact with drinking water must be approved for that use where the pumps are installed (national "
            + "drinking-water quality rules, local codes).";

    public record Line(String partNumber, String description, String supplier, int packs, BigDecimal quantity,
                       BigDecimal cost, double positionBefore, double reorderPoint, double orderUpTo,
                       double shortfallAfter) {
        static Line from(PurchasePlanLine l, PartSummary part) {
            return new Line(part.partNumber(), part.description(), part.supplier(), l.packs, l.quantity, l.cost,
                    l.positionBefore, l.reorderPoint, l.orderUpTo, l.shortfallAfter);
        }
    }

    /**
     * What the plan did not buy of one part: {@code quantity} more units (whole packs) would have brought it to its
     * order-up-to level, at {@code cost} in {@code currency}; {@code reason} BUDGET or OTHER_CURRENCY.
     */
    public record LeftOut(String partNumber, String description, String supplier, BigDecimal quantity, BigDecimal cost,
                          String currency, String reason, double positionAfter, double reorderPoint) {
        static LeftOut from(PurchasePlanLine l, PartSummary part) {
            return new LeftOut(part.partNumber(), part.description(), part.supplier(), l.unfundedQuantity,
                    part.unitCost().multiply(l.unfundedQuantity).setScale(2, RoundingMode.HALF_UP), part.currency(),
                    l.leftOutReason, l.positionBefore + l.quantity.doubleValue(), l.reorderPoint);
        }
    }

    /** What the plan minimises, its unit and the days it is counted over, and the figure before and after. */
    public record Objective(String measure, String unit, Integer horizonDaysMin, Integer horizonDaysMax, double before,
                            double after, String statement) {
    }

    /** The plan with its lines' parts, read as records by part id. */
    static PurchasePlanResponse from(PurchasePlan p, Map<Long, PartSummary> parts) {
        return new PurchasePlanResponse(p.id, p.status.name(), p.planningDate, p.budget, p.currency, p.spent,
                objective(p), p.pumpDaysBefore, p.pumpDaysAfter,
                p.lines.stream().filter(l -> l.packs > 0).map(l -> Line.from(l, parts.get(l.partId))).toList(),
                p.lines.stream().filter(l -> l.leftOutReason != null && !"NO_FORECAST".equals(l.leftOutReason)
                        && l.unfundedQuantity.signum() > 0).map(l -> LeftOut.from(l, parts.get(l.partId))).toList(),
                p.lines.stream().filter(l -> "NO_FORECAST".equals(l.leftOutReason)).map(l -> parts.get(l.partId).partNumber())
                        .toList(),
                CAUTION);
    }

    private static Objective objective(PurchasePlan p) {
        String days = p.horizonDaysMin == null ? "each part's replenishment period"
                : p.horizonDaysMin.equals(p.horizonDaysMax) ? p.horizonDaysMin + " days"
                : p.horizonDaysMin + "–" + p.horizonDaysMax + " days (each part's supplier lead time + central review)";
        String statement = String.format(java.util.Locale.ROOT, "minimise expected pump-days without water over the "
                + "next %s: %,.1f before this plan, %,.1f after", days, p.pumpDaysBefore, p.pumpDaysAfter);
        return new Objective("expected pump-days without water", "pump-days", p.horizonDaysMin, p.horizonDaysMax,
                p.pumpDaysBefore, p.pumpDaysAfter, statement);
    }
}
