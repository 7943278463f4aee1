package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AuditService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;

import java.time.LocalDate;
import java.util.Collection;
import java.util.HashSet;
import java.util.Set;
import java.util.Map;

/**
 * A pump's status follows its repairs: an open breakdown repair makes it BROKEN from the day it was reported; once
 * no breakdown repair is open, its latest fix makes it WORKING from the day it was fixed. A fix older than the
 * status on record (a pump reported broken after that repair) changes nothing: the newer fact stands. Decommissioned
 * pumps never change by a repair. Mechanics report broken or working in between; a pump cannot be reported working
 * while one of its breakdown repairs is open (record the repair's fix instead).
 */
@ApplicationScoped
public class PumpStatusService {
    private final PumpService pumps;
    private final RepairRecords repairs;
    private final AuditService audit;

    PumpStatusService(PumpService pumps, RepairRecords repairs, AuditService audit) {
        this.pumps = pumps;
        this.repairs = repairs;
        this.audit = audit;
    }

    /** Brings one pump's status in line with its repairs, after a repair was recorded or changed. */
    @Transactional(Transactional.TxType.MANDATORY)
    public void followRepairs(Pump pump) {
        PumpCodes codes = pumps.codes();
        PumpResponse before = codes.response(pump);
        if (follow(pump, repairs.factsOf(pump.id))) {
            audit.record("PUMP_STATUS_FOLLOWED_REPAIR", "pump", pump.assetId, before, codes.response(pump));
        }
    }

    /** {@link #followRepairs(Pump)} for the pump with this id (a repair holds its pump's id). */
    @Transactional(Transactional.TxType.MANDATORY)
    public void followRepairsOf(long pumpId) {
        followRepairs(pumps.byId(pumpId));
    }

    /** {@link #followRepairs(Collection)} for the pumps with these ids (a repair import's pumps). */
    @Transactional(Transactional.TxType.MANDATORY)
    public int followRepairsOf(Collection<Long> pumpIds) {
        Set<Long> wanted = new HashSet<>(pumpIds);
        return followRepairs(pumps.all().stream().filter(p -> wanted.contains(p.id)).toList());
    }

    /** The same for many pumps at once (imports); returns how many changed. The import's own audit entry covers it. */
    @Transactional(Transactional.TxType.MANDATORY)
    public int followRepairs(Collection<Pump> many) {
        if (many.isEmpty()) {
            return 0;
        }
        Map<Long, RepairFacts> facts = repairs.factsOfAll();
        int changed = 0;
        for (Pump pump : many) {
            changed += follow(pump, facts.getOrDefault(pump.id, RepairFacts.NONE)) ? 1 : 0;
        }
        return changed;
    }

    static boolean follow(Pump pump, RepairFacts facts) {
        if (pump.status == PumpStatus.DECOMMISSIONED) {
            return false;
        }
        if (facts.openSince() != null) {
            LocalDate since = pump.status == PumpStatus.BROKEN && pump.statusSince != null
                    && pump.statusSince.isBefore(facts.openSince()) ? pump.statusSince : facts.openSince();
            if (pump.status == PumpStatus.BROKEN && since.equals(pump.statusSince)) {
                return false;
            }
            pump.setStatus(PumpStatus.BROKEN, since, "breakdown reported, repair " + facts.openRepairRef());
            return true;
        }
        if (facts.lastFixedOn() == null || (pump.statusSince != null && facts.lastFixedOn().isBefore(pump.statusSince))
                || (pump.status == PumpStatus.WORKING && facts.lastFixedOn().equals(pump.statusSince))) {
            return false;
        }
        pump.setStatus(PumpStatus.WORKING, facts.lastFixedOn(), "fixed, repair " + facts.lastFixedRef());
        return true;
    }

    /**
     * A mechanic (or officer) reports a pump broken or working again. The same report again changes nothing; the same
     * status with an earlier date moves the date back; a different status dated before the status on record is a
     * conflict (a late report from a phone that was offline).
     */
    @Transactional
    public Pump report(String assetId, StatusReport report) {
        Pump pump = pumps.requireVisible(null, assetId);
        if (report.status() == PumpStatus.DECOMMISSIONED) {
            throw new BusinessRuleException("status", "report a pump BROKEN or WORKING; a stores officer decommissions "
                    + "pumps by updating the pump");
        }
        if (pump.status == PumpStatus.DECOMMISSIONED) {
            throw new BusinessRuleException("status", "pump '" + assetId + "' was decommissioned on " + pump.statusSince);
        }
        if (report.since().isBefore(pump.installedOn)) {
            throw new BusinessRuleException("since", "is before the pump was installed on " + pump.installedOn);
        }
        PumpCodes codes = pumps.codes();
        PumpResponse before = codes.response(pump);
        if (report.status() == pump.status) {
            if (pump.statusSince == null || report.since().isBefore(pump.statusSince)) {
                pump.setStatus(pump.status, report.since(), report.note() == null ? pump.statusNote : report.note());
                audit.record("PUMP_STATUS_REPORTED", "pump", assetId, before, codes.response(pump));
            }
            return pump;
        }
        if (pump.statusSince != null && report.since().isBefore(pump.statusSince)) {
            throw new ConflictException("since", "pump '" + assetId + "' is recorded " + pump.status + " since "
                    + pump.statusSince + "; a report dated " + report.since() + " is older and cannot change it");
        }
        pumps.change(pump, report.status(), report.since(), report.note());
        audit.record("PUMP_STATUS_REPORTED", "pump", assetId, before, codes.response(pump));
        return pump;
    }
}
