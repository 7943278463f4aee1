package org.depotcast.stock;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;
import org.hibernate.annotations.Immutable;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** One append-only line of the stock ledger. Never updated; a mistake is corrected by a compensating movement. */
@Entity
@Immutable
@Table(name = "stock_movement")
public class StockMovement {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public MovementKind kind;
    /** The catalogue's part (its id, read as a record through PartService). */
    @Column(name = "part_id", nullable = false)
    public long partId;
    @ManyToOne(fetch = FetchType.LAZY)
    @JoinColumn(name = "from_location_id")
    public Location fromLocation;
    @ManyToOne(fetch = FetchType.LAZY)
    @JoinColumn(name = "to_location_id")
    public Location toLocation;
    @Column(nullable = false)
    public BigDecimal quantity;
    @Column(name = "occurred_at", nullable = false)
    public OffsetDateTime occurredAt;
    @Column(name = "recorded_at", nullable = false)
    public OffsetDateTime recordedAt;
    @Column(nullable = false)
    public String actor;
    public String reason;
    public String reference;
    /** Whose key it is: see {@link org.depotcast.common.IdempotencyKey#ownerFor(String)}. */
    @Column(name = "idempotency_owner")
    public String idempotencyOwner;
    @Column(name = "idempotency_key")
    public String idempotencyKey;
    @Column(name = "purchase_order_line_id")
    public Long purchaseOrderLineId;
    @Column(name = "repair_id")
    public Long repairId;
}
