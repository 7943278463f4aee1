package org.depotcast.catalogue;

import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

@Entity
@Table(name = "pump_model")
public class PumpModel {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(nullable = false, unique = true)
    public String code;
    @Column(nullable = false)
    public String name;
    @Column(name = "service_interval_hours", nullable = false)
    public int serviceIntervalHours;
    @OneToMany(mappedBy = "pumpModel", cascade = CascadeType.ALL, orphanRemoval = true)
    @OrderBy("id")
    public List<BomLine> bom = new ArrayList<>();
    @Version
    public long version;

    /**
     * Makes the bill of materials the given lines. A part already on it keeps its row and takes the new values:
     * replacing the row would insert the new one before the old one is deleted, against the unique part per model.
     */
    void replaceBom(List<BomLine> lines) {
        Map<Long, BomLine> kept = new HashMap<>();
        for (BomLine line : lines) {
            kept.put(line.part.id, line);
        }
        bom.removeIf(existing -> !kept.containsKey(existing.part.id));
        Map<Long, BomLine> current = new HashMap<>();
        for (BomLine existing : bom) {
            current.put(existing.part.id, existing);
        }
        for (BomLine line : lines) {
            BomLine existing = current.get(line.part.id);
            if (existing == null) {
                line.pumpModel = this;
                bom.add(line);
            } else {
                existing.basis = line.basis;
                existing.quantity = line.quantity;
                existing.serviceKitQuantity = line.serviceKitQuantity;
            }
        }
    }
}
