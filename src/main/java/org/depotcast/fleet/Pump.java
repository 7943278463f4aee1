package org.depotcast.fleet;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import org.depotcast.catalogue.PumpModel;
import org.depotcast.stock.Location;

import java.math.BigDecimal;
import java.time.LocalDate;

/** An installed hand pump on a borehole. */
@Entity
@Table(name = "pump")
public class Pump {
    /** Design load of a hand pump, hours of use a day (common practice, no published source). */
    public static final BigDecimal DEFAULT_HOURS_PER_DAY = new BigDecimal("5.00");

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "asset_id", nullable = false, unique = true)
    public String assetId;
    @ManyToOne(optional = false)
    @JoinColumn(name = "pump_model_id")
    public PumpModel model;
    @Column(name = "depth_m", nullable = false)
    public BigDecimal depthM;
    @Column(name = "installed_on", nullable = false)
    public LocalDate installedOn;
    public BigDecimal latitude;
    public BigDecimal longitude;
    @ManyToOne(optional = false)
    @JoinColumn(name = "depot_id")
    public Location depot;
    @Column(name = "assigned_mechanic")
    public String assignedMechanic;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public PumpStatus status;
    @Column(name = "broken_since")
    public LocalDate brokenSince;
    @Column(name = "decommissioned_on")
    public LocalDate decommissionedOn;
    /** The date the current status began (null for a working pump with no record of when it was last fixed). */
    @Column(name = "status_since")
    public LocalDate statusSince;
    @Column(name = "status_note")
    public String statusNote;
    @Column(name = "usage_hours_per_day", nullable = false)
    public BigDecimal usageHoursPerDay;
    @Enumerated(EnumType.STRING)
    @Column(name = "usage_source", nullable = false)
    public UsageSource usageSource;
    @Version
    public long version;

    /** The code of the depot the pump belongs to, for features that report it without reading the location. */
    public String depotCode() {
        return depot.code;
    }

    /** Keeps status and its dates consistent: a broken pump says since when, a decommissioned one when. */
    void setStatus(PumpStatus newStatus, LocalDate since, String note) {
        status = newStatus;
        statusSince = since;
        statusNote = note;
        brokenSince = newStatus == PumpStatus.BROKEN ? since : null;
        decommissionedOn = newStatus == PumpStatus.DECOMMISSIONED ? since : null;
    }
}
