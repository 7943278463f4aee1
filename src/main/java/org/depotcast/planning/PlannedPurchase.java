package org.depotcast.planning;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** A part put into the purchase plan of a store: how many to buy, until a purchase order takes it. */
@Entity
@Table(name = "planned_purchase")
public class PlannedPurchase {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    /** The catalogue part to buy. */
    @Column(name = "part_id", nullable = false)
    public Long partId;
    /** The store (a stock location: the central store or a depot) whose plan it is. */
    @Column(name = "location_id", nullable = false)
    public Long locationId;
    @Column(nullable = false)
    public BigDecimal quantity;
    public String note;
    @Column(name = "added_by", nullable = false)
    public String addedBy;
    @Column(name = "added_at", nullable = false)
    public OffsetDateTime addedAt;
    @Version
    public long version;
}
