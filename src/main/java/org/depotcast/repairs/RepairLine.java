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
import org.depotcast.catalogue.Part;

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
    @ManyToOne(optional = false)
    @JoinColumn(name = "part_id")
    public Part part;
    @Column(nullable = false)
    public BigDecimal quantity;
}
