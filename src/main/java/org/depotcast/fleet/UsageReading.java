package org.depotcast.fleet;

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
import java.time.LocalDate;

/** Average hours of use a day observed for a pump, dated; it holds from that date until the next reading. */
@Entity
@Table(name = "usage_reading")
public class UsageReading {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "pump_id")
    public Pump pump;
    @Column(name = "read_on", nullable = false)
    public LocalDate readOn;
    @Column(name = "hours_per_day", nullable = false)
    public BigDecimal hoursPerDay;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public UsageSource source;
}
