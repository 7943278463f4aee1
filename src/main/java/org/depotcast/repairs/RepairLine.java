package org.depotcast.repairs;

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

/** A component replaced at a repair. */
@Entity
@Table(name = "repair_line")
public class RepairLine {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "repair_id")
    public Repair repair;
    /** The catalogue's part (its id, read as a record through PartService). */
    @Column(name = "part_id", nullable = false)
    public long partId;
    @Column(nullable = false)
    public BigDecimal quantity;

    static RepairLine of(long partId, BigDecimal quantity) {
        RepairLine line = new RepairLine();
        line.partId = partId;
        line.quantity = quantity;
        return line;
    }
}
