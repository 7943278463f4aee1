package org.depotcast.catalogue;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;

import java.math.BigDecimal;

/** One part in a pump model's bill of materials, with how many a pump holds and how many a service kit replaces. */
@Entity
@Table(name = "bom_line")
public class BomLine {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "pump_model_id")
    public PumpModel pumpModel;
    @ManyToOne(optional = false)
    @JoinColumn(name = "part_id")
    public Part part;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public BomBasis basis;
    @Column(nullable = false)
    public BigDecimal quantity;
    @Column(name = "service_kit_quantity", nullable = false)
    public BigDecimal serviceKitQuantity;

    /** Units installed in one pump at this depth: per-metre lines round up to whole lengths. */
    public double installedQuantity(double depthM) {
        return basis.unitsAt(quantity, depthM);
    }

    /** Units a preventive service replaces in a pump at this depth; per-metre kit lines scale with depth. */
    public double serviceKitQuantity(double depthM) {
        return basis.unitsAt(serviceKitQuantity, depthM);
    }
}
