package org.depotcast.catalogue;

import jakarta.persistence.Cacheable;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import org.hibernate.annotations.NaturalId;
import org.hibernate.annotations.NaturalIdCache;

import java.math.BigDecimal;

@Entity
@Cacheable
@NaturalIdCache
@Table(name = "part")
public class Part {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @NaturalId(mutable = true)
    @Column(name = "part_number", nullable = false, unique = true)
    public String partNumber;
    @Column(nullable = false)
    public String description;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public ComponentFamily family;
    @Enumerated(EnumType.STRING)
    @Column(name = "unit_of_issue", nullable = false)
    public UnitOfIssue unitOfIssue;
    @Column(name = "pack_size", nullable = false)
    public int packSize;
    @Column(name = "min_order_qty", nullable = false)
    public int minOrderQty;
    @Column(name = "unit_cost", nullable = false)
    public BigDecimal unitCost;
    @Column(nullable = false)
    public String currency;
    @Column(nullable = false)
    public String supplier;
    @Column(name = "lead_time_days", nullable = false)
    public int leadTimeDays;
    @Column(name = "shelf_life_days")
    public Integer shelfLifeDays;
    @Column(nullable = false)
    public boolean critical;
    @Version
    public long version;

    public boolean wholeUnits() {
        return unitOfIssue.wholeUnits();
    }
}
