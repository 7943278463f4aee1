package org.depotcast.repairs;

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

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;

/**
 * A repair visit to a pump. Dates: reported (pump found broken), diagnosed (mechanic saw what it needs), parts
 * available (everything needed was in the kit), fixed. Days waiting for parts = parts available − diagnosed.
 * {@code ledgerPosted} is false for imported history that predates the stock ledger.
 */
@Entity
@Table(name = "repair")
public class Repair {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "repair_ref", nullable = false, unique = true)
    public String repairRef;
    /** The fleet's pump (its id: the pump entity stays in fleet, read as a record through PumpQueryService). */
    @Column(name = "pump_id", nullable = false)
    public long pumpId;
    @Column(nullable = false)
    public String mechanic;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public RepairKind kind;
    @Column(name = "reported_on", nullable = false)
    public LocalDate reportedOn;
    @Column(name = "diagnosed_on")
    public LocalDate diagnosedOn;
    @Column(name = "parts_available_on")
    public LocalDate partsAvailableOn;
    @Column(name = "fixed_on")
    public LocalDate fixedOn;
    public String fault;
    @Column(name = "ledger_posted", nullable = false)
    public boolean ledgerPosted;
    @OneToMany(mappedBy = "repair", cascade = CascadeType.ALL, orphanRemoval = true)
    @OrderBy("id")
    public List<RepairLine> lines = new ArrayList<>();

    void addLine(RepairLine line) {
        line.repair = this;
        lines.add(line);
    }

    /** Days the pump stood waiting for parts after diagnosis; 0 when the parts were at hand. Null while unknown. */
    public Long daysWaitingForParts() {
        if (diagnosedOn == null) {
            return null;
        }
        if (partsAvailableOn == null) {
            return fixedOn == null ? null : 0L;
        }
        return Math.max(0, ChronoUnit.DAYS.between(diagnosedOn, partsAvailableOn));
    }

    /** Days from report to fix; null while the pump is still broken. */
    public Long downtimeDays() {
        return fixedOn == null ? null : ChronoUnit.DAYS.between(reportedOn, fixedOn);
    }

    /** A new repair as requested, at the pump {@code pumpId}, by {@code mechanic}; lines are added after. */
    static Repair from(RepairRequest r, long pumpId, String mechanic) {
        Repair repair = new Repair();
        repair.repairRef = r.repairRef();
        repair.pumpId = pumpId;
        repair.mechanic = mechanic;
        repair.kind = r.kind();
        repair.reportedOn = r.reportedOn();
        repair.diagnosedOn = r.diagnosedOn();
        repair.partsAvailableOn = r.partsAvailableOn();
        repair.fixedOn = r.fixedOn();
        repair.fault = r.fault();
        return repair;
    }
}
