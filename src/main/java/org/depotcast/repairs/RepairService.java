package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.access.CurrentUser;
import org.depotcast.access.Roles;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.NotEnoughStockException;
import org.depotcast.common.Quantities;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.PumpStatusService;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Repair records, and the consumption each fixed repair posts to the ledger from the mechanic's kit. */
@ApplicationScoped
public class RepairService {
    private final RepairRepository repairs;
    private final PumpQueryService pumps;
    private final PumpService pumpRegister;
    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final CurrentUser currentUser;
    private final org.depotcast.access.AuditService audit;
    private final PumpStatusService pumpStatus;
    private final RefusedRepairService refusals;

    RepairService(RepairRepository repairs, PumpQueryService pumps, PumpService pumpRegister, PartService parts,
                  LocationService locations, StockLedgerService ledger, CurrentUser currentUser,
                  org.depotcast.access.AuditService audit, PumpStatusService pumpStatus, RefusedRepairService refusals) {
        this.refusals = refusals;
        this.audit = audit;
        this.pumpStatus = pumpStatus;
        this.repairs = repairs;
        this.pumps = pumps;
        this.pumpRegister = pumpRegister;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
        this.currentUser = currentUser;
    }

    public record Recorded(RepairResponse repair, boolean replayed) {
    }

    @Transactional
    public RepairResponse get(String repairRef) {
        Repair repair = repairs.byRef(repairRef).orElseThrow(() -> new EntityMissingException(null, "repair", repairRef));
        return RepairResponse.from(repair, pumps.requireVisible(repair.pumpId), partNumbers());
    }

    /** Newest report first; {@code openOnly} keeps the repairs not fixed yet. */
    @Transactional
    public List<RepairResponse> search(String assetId, LocalDate since, int limit, boolean openOnly) {
        if (assetId != null) {
            PumpSummary pump = pumps.requireVisible("asset", assetId);
            List<Repair> found = openOnly ? repairs.open().stream().filter(r -> r.pumpId == pump.id())
                    .filter(r -> since == null || !r.reportedOn.isBefore(since)).limit(limit).toList()
                    : repairs.search(pump.id(), since, limit);
            return responses(found, Map.of(pump.id(), pump));
        }
        // Scoped callers page through their own pumps' repairs only.
        List<Repair> candidates = openOnly ? repairs.open() : repairs.search(null, since, Integer.MAX_VALUE);
        Map<Long, PumpSummary> pumpsById = pumps.summariesById(pumpIdsOf(candidates));
        var visible = pumps.visibleFilter();
        List<Repair> found = candidates.stream().filter(r -> visible.test(pumpsById.get(r.pumpId)))
                .filter(r -> !openOnly || since == null || !r.reportedOn.isBefore(since)).limit(limit).toList();
        return responses(found, pumpsById);
    }

    /** Repairs as the API shows them, with their pumps' records (by pump id) and the parts' numbers read once. */
    private List<RepairResponse> responses(List<Repair> list, Map<Long, PumpSummary> pumpsById) {
        Map<Long, String> partNumbers = partNumbers();
        return list.stream().map(r -> RepairResponse.from(r, pumpsById.get(r.pumpId), partNumbers)).toList();
    }

    private RepairResponse response(Repair repair) {
        return RepairResponse.from(repair, pumps.summariesById(List.of(repair.pumpId)).get(repair.pumpId),
                partNumbers());
    }

    private static Set<Long> pumpIdsOf(List<Repair> list) {
        Set<Long> ids = new HashSet<>();
        list.forEach(r -> ids.add(r.pumpId));
        return ids;
    }

    /** Every part's number by id (the catalogue's records; a repair line holds the part's id). */
    private Map<Long, String> partNumbers() {
        Map<Long, String> numbers = new HashMap<>();
        parts.summaries().forEach(p -> numbers.put(p.id(), p.partNumber()));
        return numbers;
    }

    /**
     * Consumption history rows for forecasting (see {@link RepairRepository#consumptionRows()}), each at its pump's
     * depot as fleet's register gives it (one query for every pump).
     */
    @Transactional
    public List<ConsumptionRow> consumptionRows() {
        Map<Long, Long> depotOfPump = new HashMap<>();
        pumpRegister.planningRows().forEach(p -> depotOfPump.put(p.pumpId(), p.depotId()));
        List<ConsumptionRow> read = repairs.consumptionRows();
        List<ConsumptionRow> rows = new ArrayList<>(read.size());
        for (ConsumptionRow row : read) {
            rows.add(row.atDepot(depotOfPump.get(row.pumpId())));
        }
        return rows;
    }

    /** Records a repair; a fixed one consumes its parts from the kit, all in one transaction (or a notice: see noting). */
    public Recorded record(RepairRequest request) {
        return refusals.noting(() -> recordWithin(request));
    }

    private Recorded recordWithin(RepairRequest request) {
        Optional<Repair> earlier = repairs.byRef(request.repairRef());
        if (earlier.isPresent()) {
            PumpSummary pump = pumps.summariesById(List.of(earlier.get().pumpId)).get(earlier.get().pumpId);
            if (!pumps.visibleFilter().test(pump)) {
                throw new ConflictException("repairRef", "repair '" + request.repairRef() + "' was recorded for another pump");
            }
            Map<Long, String> partNumbers = partNumbers();
            String differs = RepairResend.firstDifference(earlier.get(), pump.assetId(), request, partNumbers);
            if (differs != null) {
                throw new ConflictException(differs, "repair '" + request.repairRef() + "' was recorded with another "
                        + differs + "; a new repair needs a new reference");
            }
            return new Recorded(RepairResponse.from(earlier.get(), pump, partNumbers), true);
        }
        String mechanic = request.mechanic() == null || currentUser.hasRole(Roles.MECHANIC)
                ? currentUser.name() : request.mechanic();
        String dateProblem = RepairDates.dateOrderProblem(request.reportedOn(), request.diagnosedOn(), request.partsAvailableOn(),
                request.fixedOn());
        if (dateProblem != null) {
            throw new InvalidInputException(dateProblem, "dates must run reported ≤ diagnosed ≤ parts available ≤ fixed");
        }
        Repair repair = Repair.from(request, pumps.requireVisible("assetId", request.assetId()).id(), mechanic);
        addLines(repair, request.lines() == null ? List.of() : request.lines());
        repair.ledgerPosted = repair.fixedOn != null && !repair.lines.isEmpty();
        repairs.persist(repair);
        repairs.flush();
        if (repair.ledgerPosted) {
            consumeFromKit(repair);
        }
        pumpStatus.followRepairsOf(repair.pumpId);
        RepairResponse recorded = response(repair);
        audit.record("REPAIR_RECORDED", "repair", repair.repairRef, null, recorded);
        return new Recorded(recorded, false);
    }

    /**
     * Records what happened since a repair was reported (see {@link RepairProgress}): dates reached, the parts it
     * needs until it is fixed; the fix consumes them from the mechanic's kit and the pump's status follows.
     */
    public RepairResponse progress(String repairRef, RepairProgress p) {
        return refusals.noting(() -> progressWithin(repairRef, p));
    }

    private RepairResponse progressWithin(String repairRef, RepairProgress p) {
        Repair repair = repairs.byRef(repairRef).orElseThrow(() -> new EntityMissingException(null, "repair", repairRef));
        PumpSummary pump = pumps.requireVisible(repair.pumpId);
        Map<Long, String> partNumbers = partNumbers();
        RepairResponse before = RepairResponse.from(repair, pump, partNumbers);
        repair.diagnosedOn = RepairDates.keepOrSet("diagnosedOn", repair.diagnosedOn, p.diagnosedOn());
        repair.partsAvailableOn = RepairDates.keepOrSet("partsAvailableOn", repair.partsAvailableOn, p.partsAvailableOn());
        boolean fixesNow = repair.fixedOn == null && p.fixedOn() != null;
        repair.fixedOn = RepairDates.keepOrSet("fixedOn", repair.fixedOn, p.fixedOn());
        String dateProblem = RepairDates.dateOrderProblem(repair.reportedOn, repair.diagnosedOn, repair.partsAvailableOn, repair.fixedOn);
        if (dateProblem != null) {
            throw new InvalidInputException(dateProblem, "dates must run reported ≤ diagnosed ≤ parts available ≤ fixed");
        }
        if (p.fault() != null) {
            repair.fault = p.fault();
        }
        if (p.lines() != null && !RepairResend.sameLines(repair.lines, p.lines(), partNumbers)) {
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
        pumpStatus.followRepairsOf(repair.pumpId);
        RepairResponse after = response(repair);
        if (!after.equals(before)) {
            audit.record("REPAIR_PROGRESSED", "repair", repairRef, before, after);
        }
        return after;
    }

    private void addLines(Repair repair, List<RepairRequest.Line> lines) {
        for (int i = 0; i < lines.size(); i++) {
            PartSummary part = parts.requireSummary("lines[" + i + "].partNumber", lines.get(i).partNumber());
            BigDecimal quantity = Quantities.requirePositive("lines[" + i + "].quantity", lines.get(i).quantity(),
                    part.unitOfIssue().wholeUnits());
            if (repair.lines.stream().anyMatch(l -> l.partId == part.id())) {
                throw new InvalidInputException("lines[" + i + "].partNumber", "part '" + part.partNumber() + "' is listed twice");
            }
            repair.addLine(RepairLine.of(part.id(), quantity));
        }
    }

    private void consumeFromKit(Repair repair) {
        LocationSummary kit = locations.kitSummaryOf(repair.mechanic).orElseThrow(() -> new BusinessRuleException(
                "mechanic", "mechanic '" + repair.mechanic + "' carries no kit to consume parts from"));
        Map<Long, String> partNumbers = partNumbers();
        for (RepairLine line : repair.lines) {
            String partNumber = partNumbers.get(line.partId);
            MovementCommand command = new MovementCommand(MovementKind.CONSUMPTION, partNumber, kit.code(), null,
                    line.quantity, repair.fixedOn.atStartOfDay().atOffset(ZoneOffset.UTC),
                    repair.kind == RepairKind.BREAKDOWN ? "breakdown repair" : "preventive service",
                    repair.repairRef, IdempotencyKey.internal("repair", repair.repairRef + ":" + partNumber), null, repair.id);
            try {
                ledger.postWithin(command);
            } catch (NotEnoughStockException e) {
                throw RefusedRepairException.of(e, repair, kit, partNumbers);
            }
        }
        refusals.closeRecorded(repair.repairRef);
    }
}
