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
import jakarta.persistence.Version;
import org.depotcast.catalogue.Part;
import org.depotcast.stock.Location;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** A part put into the purchase plan of a store: how many to buy, until a purchase order takes it. */
@Entity
@Table(name = "planned_purchase")
public class PlannedPurchase {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.EAGER, optional = false)
    @JoinColumn(name = "part_id")
    public Part part;
    @ManyToOne(fetch = FetchType.EAGER, optional = false)
    @JoinColumn(name = "location_id")
    public Location location;
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
