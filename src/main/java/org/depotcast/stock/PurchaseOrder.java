package org.depotcast.stock;

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

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/** An order placed with a supplier; its open lines are the on-order quantities that feed inventory position. */
@Entity
@Table(name = "purchase_order")
public class PurchaseOrder {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "order_number", nullable = false, unique = true)
    public String orderNumber;
    @Column(nullable = false)
    public String supplier;
    @ManyToOne(optional = false)
    @JoinColumn(name = "destination_id")
    public Location destination;
    @Column(name = "ordered_on", nullable = false)
    public LocalDate orderedOn;
    @Column(name = "expected_on")
    public LocalDate expectedOn;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public PurchaseOrderStatus status;
    @OneToMany(mappedBy = "purchaseOrder", cascade = CascadeType.ALL)
    @OrderBy("id")
    public List<PurchaseOrderLine> lines = new ArrayList<>();
    @Version
    public long version;

    void addLine(PurchaseOrderLine line) {
        line.purchaseOrder = this;
        lines.add(line);
    }

    /** Closes the order once every line is fully received. */
    void closeIfComplete() {
        if (lines.stream().allMatch(PurchaseOrderLine::complete)) {
            status = PurchaseOrderStatus.CLOSED;
        }
    }
}
