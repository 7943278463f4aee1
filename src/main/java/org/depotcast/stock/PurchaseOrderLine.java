package org.depotcast.stock;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;
import org.depotcast.common.BusinessRuleException;

import java.math.BigDecimal;

@Entity
@Table(name = "purchase_order_line")
public class PurchaseOrderLine {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "purchase_order_id")
    public PurchaseOrder purchaseOrder;
    /** The catalogue's part (its id, read as a record through PartService). */
    @Column(name = "part_id", nullable = false)
    public long partId;
    @Column(name = "quantity_ordered", nullable = false)
    public BigDecimal quantityOrdered;
    @Column(name = "quantity_received", nullable = false)
    public BigDecimal quantityReceived;

    public BigDecimal outstanding() {
        return quantityOrdered.subtract(quantityReceived);
    }

    boolean complete() {
        return outstanding().signum() == 0;
    }

    void receive(BigDecimal quantity, String partNumber) {
        if (quantity.compareTo(outstanding()) > 0) {
            throw new BusinessRuleException("quantity", "only " + outstanding().stripTrailingZeros().toPlainString()
                    + " of part '" + partNumber + "' is still outstanding on this order");
        }
        quantityReceived = quantityReceived.add(quantity);
    }
}
