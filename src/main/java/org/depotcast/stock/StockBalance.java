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
import jakarta.persistence.Version;
import org.depotcast.common.Bounds;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.NotEnoughStockException;

import java.math.BigDecimal;

/** On hand for one part at one location; changed only by the ledger, and never below zero. */
@Entity
@Table(name = "stock_balance")
public class StockBalance {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    /** The catalogue's part (its id, read as a record through PartService). */
    @Column(name = "part_id", nullable = false)
    public long partId;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "location_id")
    public Location location;
    @Column(name = "on_hand", nullable = false)
    public BigDecimal onHand;
    @Version
    public long version;

    void add(BigDecimal quantity) {
        BigDecimal after = onHand.add(quantity);
        if (after.compareTo(Bounds.BALANCE_CAPACITY) > 0) {
            // The database would refuse the row; say so instead of failing the write as if it were busy.
            throw new BusinessRuleException("quantity", "the balance would exceed the largest the ledger holds ("
                    + Bounds.BALANCE_CAPACITY.toPlainString() + ")");
        }
        onHand = after;
    }

    void take(BigDecimal quantity, String partNumber, String locationCode) {
        if (onHand.compareTo(quantity) < 0) {
            throw new NotEnoughStockException("quantity", "only " + onHand.stripTrailingZeros().toPlainString() + " of part '"
                    + partNumber + "' on hand at '" + locationCode + "', cannot take " + quantity.stripTrailingZeros().toPlainString());
        }
        onHand = onHand.subtract(quantity);
    }
}
