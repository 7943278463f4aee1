package org.depotcast.planning;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;

import java.math.BigDecimal;

/** One part in a purchase plan: what to buy (possibly nothing) and where its position stands after. */
@Entity
@Table(name = "purchase_plan_line")
public class PurchasePlanLine {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "purchase_plan_id")
    public PurchasePlan plan;
    /** The catalogue part bought. */
    @Column(name = "part_id", nullable = false)
    public Long partId;
    @Column(nullable = false)
    public int packs;
    @Column(nullable = false)
    public BigDecimal quantity;
    @Column(nullable = false)
    public BigDecimal cost;
    @Column(name = "position_before", nullable = false)
    public double positionBefore;
    @Column(name = "reorder_point", nullable = false)
    public double reorderPoint;
    @Column(name = "order_up_to", nullable = false)
    public double orderUpTo;
    @Column(name = "shortfall_after", nullable = false)
    public double shortfallAfter;
    /** Units the part needed to reach its order-up-to level that the plan did not buy (whole packs). */
    @Column(name = "unfunded_quantity", nullable = false)
    public BigDecimal unfundedQuantity = BigDecimal.ZERO;
    /** Why the part stayed below its reorder point: BUDGET, OTHER_CURRENCY or NO_FORECAST; null when it did not. */
    @Column(name = "left_out_reason")
    public String leftOutReason;
}
