package org.depotcast.fleet;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

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
    /** The catalogue's pump model (its id: the catalogue's entity stays in the catalogue). */
    @Column(name = "pump_model_id", nullable = false)
    public long modelId;
    @Column(name = "depth_m", nullable = false)
    public BigDecimal depthM;
    @Column(name = "installed_on", nullable = false)
    public LocalDate installedOn;
    public BigDecimal latitude;
    public BigDecimal longitude;
    /** The stock location of the depot the pump belongs to (its id, read as a record through stock). */
    @Column(name = "depot_id", nullable = false)
    public long depotId;
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

    /** Keeps status and its dates consistent: a broken pump says since when, a decommissioned one when. */
    void setStatus(PumpStatus newStatus, LocalDate since, String note) {
        status = newStatus;
        statusSince = since;
        statusNote = note;
        brokenSince = newStatus == PumpStatus.BROKEN ? since : null;
        decommissionedOn = newStatus == PumpStatus.DECOMMISSIONED ? since : null;
    }
}
