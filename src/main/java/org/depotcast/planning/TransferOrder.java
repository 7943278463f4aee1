package org.depotcast.planning;

import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/**
 * Stock sent from one store to another: dispatched into transit, then received, in one or several receipts, some
 * of it perhaps written off as lost or damaged on the way. It ends (RECEIVED) when received + written off equals
 * the quantity dispatched. The ledger holds the movements.
 */
@Entity
@Table(name = "transfer_order")
public class TransferOrder {
    public enum Status { IN_TRANSIT, RECEIVED }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    /** The catalogue's part (its id, read as a record through PartService). */
    @Column(name = "part_id", nullable = false)
    public long partId;
    /** The stock location sending (its id; codes through LocationService). */
    @Column(name = "from_id", nullable = false)
    public long fromId;
    /** The stock location receiving. */
    @Column(name = "to_id", nullable = false)
    public long toId;
    @Column(nullable = false)
    public BigDecimal quantity;
    @Column(name = "received_quantity", nullable = false)
    public BigDecimal receivedQuantity = BigDecimal.ZERO;
    @Column(name = "written_off_quantity", nullable = false)
    public BigDecimal writtenOffQuantity = BigDecimal.ZERO;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public Status status;
    @Column(name = "dispatched_at", nullable = false)
    public OffsetDateTime dispatchedAt;
    @Column(name = "received_at")
    public OffsetDateTime receivedAt;
    @Column(nullable = false)
    public String actor;
    /** Whose key it is ({@link org.depotcast.common.IdempotencyKey#ownerFor}); the key is unique per owner. */
    @Column(name = "idempotency_owner")
    public String idempotencyOwner;
    @Column(name = "idempotency_key")
    public String idempotencyKey;
    @OneToMany(mappedBy = "transfer", cascade = CascadeType.ALL)
    @OrderBy("id")
    public List<TransferReceipt> receipts = new ArrayList<>();
    @Version
    public long version;

    /** Still on the road: dispatched less what was received or written off. */
    public BigDecimal outstanding() {
        return quantity.subtract(receivedQuantity).subtract(writtenOffQuantity);
    }

    /** Books one receipt; the transfer ends when nothing is outstanding. */
    void book(TransferReceipt receipt) {
        receipt.transfer = this;
        receipts.add(receipt);
        receivedQuantity = receivedQuantity.add(receipt.receivedQuantity);
        writtenOffQuantity = writtenOffQuantity.add(receipt.writtenOffQuantity);
        if (outstanding().signum() == 0) {
            status = Status.RECEIVED;
            receivedAt = receipt.recordedAt;
        }
    }
}
