package org.depotcast.planning;

import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.Table;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/** A proposed supplier order within a budget; accepting it places the purchase orders. */
@Entity
@Table(name = "purchase_plan")
public class PurchasePlan {
    public enum Status { PROPOSED, ACCEPTED }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "created_at", nullable = false)
    public OffsetDateTime createdAt;
    @Column(name = "created_by", nullable = false)
    public String createdBy;
    @Column(name = "planning_date", nullable = false)
    public LocalDate planningDate;
    @Column(nullable = false)
    public BigDecimal budget;
    @Column(nullable = false)
    public String currency;
    @Column(nullable = false)
    public BigDecimal spent;
    @Column(name = "pump_days_before", nullable = false)
    public double pumpDaysBefore;
    @Column(name = "pump_days_after", nullable = false)
    public double pumpDaysAfter;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public Status status;
    /** The days over which pump-days without water are counted: each part's lead time + central review. */
    @Column(name = "horizon_days_min")
    public Integer horizonDaysMin;
    @Column(name = "horizon_days_max")
    public Integer horizonDaysMax;
    @OneToMany(mappedBy = "plan", cascade = CascadeType.ALL)
    @OrderBy("id")
    public List<PurchasePlanLine> lines = new ArrayList<>();
}
