package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.access.CurrentUser;
import org.depotcast.access.Roles;
import org.depotcast.catalogue.Part;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;
import org.depotcast.fleet.Pump;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.PumpStatusService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Optional;

/** Repair records, and the consumption each fixed repair posts to the ledger from the mechanic's kit. */
@ApplicationScoped
public class RepairService {
    private final RepairRepository repairs;
    private final PumpService pumps;
    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final CurrentUser currentUser;
    private final org.depotcast.access.AuditService audit;
    private final PumpStatusService pumpStatus;

    RepairService(RepairRepository repairs, PumpService pumps, PartService parts, LocationService locations,
                  StockLedgerService ledger, CurrentUser currentUser, org.depotcast.access.AuditService audit,
                  PumpStatusService pumpStatus) {
        this.audit = audit;
        this.pumpStatus = pumpStatus;
        this.repairs = repairs;
        this.pumps = pumps;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
        this.currentUser = currentUser;
    }

    public record Recorded(RepairResponse repair, boolean replayed) {
    }

    public Repair get(String repairRef) {
        Repair repair = repairs.byRef(repairRef).orElseThrow(() -> new EntityMissingException(null, "repair", repairRef));
        pumps.requireVisible(null, repair.pump.assetId);
        return repair;
    }

    public List<Repair> search(String assetId, LocalDate since, int limit) {
        return search(assetId, since, limit, false);
    }

    /** As {@link #search(String, LocalDate, int)}; {@code openOnly} keeps the repairs not fixed yet. */
    public List<Repair> search(String assetId, LocalDate since, int limit, boolean openOnly) {
        if (openOnly) {
            var visible = pumps.visibleFilter();
            Long pumpId = assetId == null ? null : pumps.requireVisible("asset", assetId).id;
            return repairs.open().stream().filter(r -> pumpId == null ? visible.test(r.pump) : pumpId.equals(r.pump.id))
                    .filter(r -> since == null || !r.reportedOn.isBefore(since)).limit(limit).toList();
        }
        if (assetId != null) {
            return repairs.search(pumps.requireVisible("asset", assetId).id, since, limit);
        }
        // Scoped callers page through their own pumps' repairs only.
        var visible = pumps.visibleFilter();
        return repairs.search(null, since, Integer.MAX_VALUE).stream().filter(r -> visible.test(r.pump)).limit(limit).toList();
    }

    /** Consumption history rows for forecasting; see {@link RepairRepository#consumptionRows()}. */
    public List<ConsumptionRow> consumptionRows() {
        return repairs.consumptionRows();
    }

    /** Records a repair; a fixed one consumes its parts from the mechanic's kit, all in one transaction. */
    @Transactional
    public Recorded record(RepairRequest request) {
        Optional<Repair> earlier = repairs.byRef(request.repairRef());
        if (earlier.isPresent()) {
            if (!pumps.visible(earlier.get().pump)) {
                throw new ConflictException("repairRef", "repair '" + request.repairRef() + "' was recorded for another pump");
            }
            String differs = RepairResend.firstDifference(earlier.get(), request);
            if (differs != null) {
                throw new ConflictException(differs, "repair '" + request.repairRef() + "' was recorded with another "
                        + differs + "; a new repair needs a new reference");
            }
            return new Recorded(RepairResponse.from(earlier.get()), true);
        }
        String mechanic = request.mechanic() == null || currentUser.hasRole(Roles.MECHANIC)
                ? currentUser.name() : request.mechanic();
        String dateProblem = dateOrderProblem(request.reportedOn(), request.diagnosedOn(), request.partsAvailableOn(),
                request.fixedOn());
        if (dateProblem != null) {
            throw new InvalidInputException(dateProblem, "dates must run reported ≤ diagnosed ≤ parts available ≤ fixed");
        }
        Repair repair = newRepair(request, pumps.requireVisible("assetId", request.assetId()), mechanic);
        addLines(repair, request.lines() == null ? List.of() : request.lines());
        repair.ledgerPosted = repair.fixedOn != null && !repair.lines.isEmpty();
        repairs.persist(repair);
        repairs.flush();
        if (repair.ledgerPosted) {
            consumeFromKit(repair);
        }
        pumpStatus.followRepairs(repair.pump);
        RepairResponse recorded = RepairResponse.from(repair);
        audit.record("REPAIR_RECORDED", "repair", repair.repairRef, null, recorded);
        return new Recorded(recorded, false);
    }

    /**
     * Records what happened since a repair was reported (see {@link RepairProgress}): dates reached, the parts it
     * needs until it is fixed; the fix consumes them from the mechanic's kit and the pump's status follows.
     */
    @Transactional
    public RepairResponse progress(String repairRef, RepairProgress p) {
        Repair repair = repairs.byRef(repairRef).orElseThrow(() -> new EntityMissingException(null, "repair", repairRef));
        pumps.requireVisible(null, repair.pump.assetId);
        RepairResponse before = RepairResponse.from(repair);
        repair.diagnosedOn = keepOrSet("diagnosedOn", repair.diagnosedOn, p.diagnosedOn());
        repair.partsAvailableOn = keepOrSet("partsAvailableOn", repair.partsAvailableOn, p.partsAvailableOn());
        boolean fixesNow = repair.fixedOn == null && p.fixedOn() != null;
        repair.fixedOn = keepOrSet("fixedOn", repair.fixedOn, p.fixedOn());
        String dateProblem = dateOrderProblem(repair.reportedOn, repair.diagnosedOn, repair.partsAvailableOn, repair.fixedOn);
        if (dateProblem != null) {
            throw new InvalidInputException(dateProblem, "dates must run reported ≤ diagnosed ≤ parts available ≤ fixed");
        }
        if (p.fault() != null) {
            repair.fault = p.fault();
        }
        if (p.lines() != null && !RepairResend.sameLines(repair.lines, p.lines())) {
            if (!fixesNow && repair.fixedOn != null) {
                throw new ConflictException("lines", "repair '" + repairRef + "' is fixed; its parts can no longer change");
            }
            repair.lines.clear();
            repairs.flush();
            addLines(repair, p.lines());
        }
        if (fixesNow && !repair.lines.isEmpty()) {
            repair.ledgerPosted = true;
            repairs.flush();
            consumeFromKit(repair);
        }
        pumpStatus.followRepairs(repair.pump);
        RepairResponse after = RepairResponse.from(repair);
        if (!after.equals(before)) {
            audit.record("REPAIR_PROGRESSED", "repair", repairRef, before, after);
        }
        return after;
    }

    private static LocalDate keepOrSet(String field, LocalDate stored, LocalDate sent) {
        if (sent == null || sent.equals(stored)) {
            return stored;
        }
        if (stored != null) {
            throw new ConflictException(field, "is already recorded as " + stored);
        }
        return sent;
    }

    private void addLines(Repair repair, List<RepairRequest.Line> lines) {
        for (int i = 0; i < lines.size(); i++) {
            Part part = parts.require("lines[" + i + "].partNumber", lines.get(i).partNumber());
            BigDecimal quantity = Quantities.requirePositive("lines[" + i + "].quantity", lines.get(i).quantity(), part.wholeUnits());
            if (repair.lines.stream().anyMatch(l -> l.part.id.equals(part.id))) {
                throw new InvalidInputException("lines[" + i + "].partNumber", "part '" + part.partNumber + "' is listed twice");
            }
            repair.addLine(line(part, quantity));
        }
    }

    private void consumeFromKit(Repair repair) {
        LocationSummary kit = locations.kitSummaryOf(repair.mechanic).orElseThrow(() -> new BusinessRuleException(
                "mechanic", "mechanic '" + repair.mechanic + "' carries no kit to consume parts from"));
        for (RepairLine line : repair.lines) {
            MovementCommand command = new MovementCommand(MovementKind.CONSUMPTION, line.part.partNumber, kit.code(), null,
                    line.quantity, repair.fixedOn.atStartOfDay().atOffset(ZoneOffset.UTC),
                    repair.kind == RepairKind.BREAKDOWN ? "breakdown repair" : "preventive service",
                    repair.repairRef, IdempotencyKey.internal("repair", repair.repairRef + ":" + line.part.partNumber), null, repair.id);
            ledger.postWithin(command);
        }
    }

    static Repair newRepair(RepairRequest r, Pump pump, String mechanic) {
        Repair repair = new Repair();
        repair.repairRef = r.repairRef();
        repair.pump = pump;
        repair.mechanic = mechanic;
        repair.kind = r.kind();
        repair.reportedOn = r.reportedOn();
        repair.diagnosedOn = r.diagnosedOn();
        repair.partsAvailableOn = r.partsAvailableOn();
        repair.fixedOn = r.fixedOn();
        repair.fault = r.fault();
        return repair;
    }

    static RepairLine line(Part part, BigDecimal quantity) {
        RepairLine line = new RepairLine();
        line.part = part;
        line.quantity = quantity;
        return line;
    }

    /** Null when the dates run in order, else the name of the first date that comes too early. */
    static String dateOrderProblem(LocalDate reported, LocalDate diagnosed, LocalDate available, LocalDate fixed) {
        LocalDate last = reported;
        String[] names = {"diagnosedOn", "partsAvailableOn", "fixedOn"};
        LocalDate[] dates = {diagnosed, available, fixed};
        for (int i = 0; i < dates.length; i++) {
            if (dates[i] != null) {
                if (dates[i].isBefore(last)) {
                    return names[i];
                }
                last = dates[i];
            }
        }
        return null;
    }
}
