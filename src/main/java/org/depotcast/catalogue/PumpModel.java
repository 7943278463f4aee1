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
import java.util.List;

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

    void replaceBom(List<BomLine> lines) {
        bom.clear();
        for (BomLine line : lines) {
            line.pumpModel = this;
            bom.add(line);
        }
    }
}
