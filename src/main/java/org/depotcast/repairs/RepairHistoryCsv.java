package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AuditService;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpStatusService;
import org.depotcast.fleet.PumpSummary;

import java.io.InputStream;
import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.repairs.RepairDates.dateOrderProblem;

/** Repair history in and out as CSV, through the one import path and the one export writer. */
@ApplicationScoped
public class RepairHistoryCsv {
    static final List<String> CSV_COLUMNS = List.of("repair_ref", "asset_id", "mechanic", "kind", "reported_on",
            "diagnosed_on", "parts_available_on", "fixed_on", "fault", "part_number", "quantity");

    private final RepairRepository repairs;
    private final PumpQueryService pumps;
    private final PartService parts;
    private final AuditService audit;
    private final PumpStatusService pumpStatus;
    private final CsvImporter importer;

    RepairHistoryCsv(RepairRepository repairs, PumpQueryService pumps, PartService parts, AuditService audit,
                     PumpStatusService pumpStatus, CsvImporter importer) {
        this.repairs = repairs;
        this.pumps = pumps;
        this.parts = parts;
        this.audit = audit;
        this.pumpStatus = pumpStatus;
        this.importer = importer;
    }

    /**
     * Imports repair history (one row per replaced part; rows sharing a reference make one repair), each repair
     * checked as {@link #record} checks it (the pump is the caller's, the reference new, dates in order, parts known).
     * History is kept for forecasting and reporting and is not posted to the ledger: opening stock is counted after it.
     */
    @Transactional
    public int importCsv(InputStream csv) {
        HistoryImport history = new HistoryImport();
        Map<String, String> pumpOfRef = new HashMap<>();
        return importer.run(csv, CsvImport.of(CSV_COLUMNS.subList(0, 5), row -> read(row, pumpOfRef))
                .identifiers("repair_ref", "asset_id", "mechanic", "part_number")
                .scopeColumn("asset_id")
                .applyGrouped(RepairRequest::repairRef, RepairHistoryCsv::joined, "lines",
                        r -> r.lines() == null ? List.of() : r.lines(), history::add)
                .afterAll(history::finish));
    }

    private static RepairRequest read(CsvRow row, Map<String, String> pumpOfRef) {
        String ref = row.text("repair_ref");
        String assetId = row.text("asset_id");
        if (ref != null && assetId != null && !assetId.equals(pumpOfRef.computeIfAbsent(ref, r -> assetId))) {
            row.reject("asset_id", "repair '" + ref + "' names another pump on an earlier row");
        }
        String partNumber = row.optionalText("part_number");
        List<RepairRequest.Line> lines = partNumber == null ? List.of()
                : List.of(new RepairRequest.Line(partNumber, row.decimal("quantity")));
        return new RepairRequest(ref, assetId, row.text("mechanic"), row.choice("kind", RepairKind.class),
                row.date("reported_on"), row.optionalDate("diagnosed_on"), row.optionalDate("parts_available_on"),
                row.optionalDate("fixed_on"), row.optionalText("fault"), lines);
    }

    /** The repair as its first row gives it, with every row's part. */
    private static RepairRequest joined(RepairRequest first, RepairRequest next) {
        List<RepairRequest.Line> lines = new ArrayList<>(first.lines());
        lines.addAll(next.lines());
        return new RepairRequest(first.repairRef(), first.assetId(), first.mechanic(), first.kind(), first.reportedOn(),
                first.diagnosedOn(), first.partsAvailableOn(), first.fixedOn(), first.fault(), lines);
    }

    /** One history import: pumps, parts and stored references read once, so thousands of repairs cost no lookups. */
    private final class HistoryImport {
        private final Map<String, PumpSummary> pumpsById = new HashMap<>();
        private final Map<String, PartSummary> partsByNumber = new HashMap<>();
        private final java.util.Set<Long> touched = new java.util.HashSet<>();
        private java.util.Set<String> storedRefs;
        private java.util.function.Predicate<PumpSummary> visible;
        private int written;

        void add(RepairRequest request) {
            if (storedRefs == null) {
                pumps.all().forEach(p -> pumpsById.put(p.assetId(), p));
                parts.summaries().forEach(p -> partsByNumber.put(p.partNumber(), p));
                storedRefs = repairs.allRefs();
                visible = pumps.visibleFilter();
            }
            PumpSummary pump = pumpsById.get(request.assetId());
            if (pump == null) {
                throw new EntityMissingException("assetId", "pump", request.assetId());
            }
            if (!visible.test(pump)) {
                throw new io.quarkus.security.ForbiddenException("pump '" + request.assetId()
                        + "' is outside your depots or assignments");
            }
            if (storedRefs.contains(request.repairRef())) {
                throw new ConflictException("repairRef", "repair '" + request.repairRef() + "' is already recorded");
            }
            String dateProblem = dateOrderProblem(request.reportedOn(), request.diagnosedOn(),
                    request.partsAvailableOn(), request.fixedOn());
            if (dateProblem != null) {
                throw new InvalidInputException(dateProblem, "dates must run reported ≤ diagnosed ≤ parts available ≤ fixed");
            }
            Repair repair = Repair.from(request, pump.id(), request.mechanic());
            repair.ledgerPosted = false;
            for (int i = 0; i < request.lines().size(); i++) {
                RepairRequest.Line l = request.lines().get(i);
                PartSummary part = partsByNumber.get(l.partNumber());
                if (part == null) {
                    throw new EntityMissingException("lines[" + i + "].partNumber", "part", l.partNumber());
                }
                BigDecimal quantity = Quantities.requirePositive("lines[" + i + "].quantity", l.quantity(),
                        part.unitOfIssue().wholeUnits());
                if (repair.lines.stream().anyMatch(existing -> existing.partId == part.id())) {
                    throw new InvalidInputException("lines[" + i + "].partNumber", "part '" + part.partNumber()
                            + "' appears twice in repair '" + request.repairRef() + "'");
                }
                repair.addLine(RepairLine.of(part.id(), quantity));
            }
            touched.add(pump.id());
            repairs.persist(repair);
            if (++written % 500 == 0) {
                repairs.flush();
                repairs.getEntityManager().clear();
            }
        }

        void finish() {
            repairs.flush();
            audit.record("REPAIRS_IMPORTED", "repair", written + " repairs", null, Map.of("repairs", written));
            // Each pump takes the status its repairs imply (an open breakdown: broken; else working since the last fix).
            pumpStatus.followRepairsOf(touched);
        }
    }

    public CsvExport exportCsv() {
        List<List<?>> rows = new ArrayList<>();
        var visible = pumps.visibleFilter();
        Map<Long, PumpSummary> pumpsById = new HashMap<>();
        pumps.all().forEach(p -> pumpsById.put(p.id(), p));
        Map<Long, String> partNumbers = new HashMap<>();
        parts.summaries().forEach(p -> partNumbers.put(p.id(), p.partNumber()));
        for (Repair r : repairs.allInOrder().stream().filter(r -> visible.test(pumpsById.get(r.pumpId))).toList()) {
            List<RepairLine> lines = r.lines.isEmpty() ? java.util.Collections.singletonList(null) : r.lines;
            for (RepairLine l : lines) {
                rows.add(java.util.Arrays.asList(r.repairRef, pumpsById.get(r.pumpId).assetId(), r.mechanic, r.kind, r.reportedOn,
                        blank(r.diagnosedOn), blank(r.partsAvailableOn), blank(r.fixedOn), r.fault == null ? "" : r.fault,
                        l == null ? "" : partNumbers.get(l.partId), l == null ? "" : l.quantity.stripTrailingZeros().toPlainString()));
            }
        }
        return new CsvExport("repairs.csv", CSV_COLUMNS, rows);
    }

    private static Object blank(LocalDate date) {
        return date == null ? "" : date;
    }
}
