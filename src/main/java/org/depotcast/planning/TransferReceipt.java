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
import org.hibernate.annotations.Immutable;

import java.math.BigDecimal;
import java.time.OffsetDateTime;

/** One arrival of a transfer: what came in, and what was written off as lost or damaged on the way, and why. */
@Entity
@Immutable
@Table(name = "transfer_receipt")
public class TransferReceipt {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "transfer_order_id")
    public TransferOrder transfer;
    @Column(name = "received_quantity", nullable = false)
    public BigDecimal receivedQuantity;
    @Column(name = "written_off_quantity", nullable = false)
    public BigDecimal writtenOffQuantity;
    @Column(name = "write_off_reason")
    public String writeOffReason;
    /** Whose key it is ({@link org.depotcast.common.IdempotencyKey#ownerFor}); the key is unique per owner. */
    @Column(name = "idempotency_owner")
    public String idempotencyOwner;
    @Column(name = "idempotency_key")
    public String idempotencyKey;
    @Column(name = "recorded_at", nullable = false)
    public OffsetDateTime recordedAt;
    @Column(nullable = false)
    public String actor;
}
