package org.depotcast.planning;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
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

/** Stock sent from one store to another: dispatched into transit, then received. The ledger holds the movements. */
@Entity
@Table(name = "transfer_order")
public class TransferOrder {
    public enum Status { IN_TRANSIT, RECEIVED }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(optional = false)
    @JoinColumn(name = "part_id")
    public Part part;
    @ManyToOne(optional = false)
    @JoinColumn(name = "from_id")
    public Location from;
    @ManyToOne(optional = false)
    @JoinColumn(name = "to_id")
    public Location to;
    @Column(nullable = false)
    public BigDecimal quantity;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public Status status;
    @Column(name = "dispatched_at", nullable = false)
    public OffsetDateTime dispatchedAt;
    @Column(name = "received_at")
    public OffsetDateTime receivedAt;
    @Column(nullable = false)
    public String actor;
    @Version
    public long version;
}
