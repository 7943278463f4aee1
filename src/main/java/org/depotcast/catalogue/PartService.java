package org.depotcast.catalogue;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.EntityMissingException;

import java.io.InputStream;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** The parts catalogue. Other features look parts up here by part number. */
@ApplicationScoped
public class PartService {
    static final List<String> CSV_COLUMNS = List.of("part_number", "description", "family", "unit_of_issue",
            "pack_size", "min_order_qty", "unit_cost", "currency", "supplier", "lead_time_days", "shelf_life_days",
            "critical");

    private final PartRepository parts;
    private final AuditService audit;
    private final AccessScope scope;
    private final CsvImporter importer;

    PartService(PartRepository parts, AuditService audit, AccessScope scope, CsvImporter importer) {
        this.importer = importer;
        this.parts = parts;
        this.audit = audit;
        this.scope = scope;
    }

    public List<Part> all() {
        return parts.allByNumber();
    }

    public List<Part> inFamily(ComponentFamily family) {
        return parts.inFamily(family);
    }

    public Optional<Part> find(String partNumber) {
        return parts.byPartNumber(partNumber);
    }

    /** The part, or a 422 naming {@code field} when a request body names a part that does not exist. */
    public Part require(String field, String partNumber) {
        return parts.byPartNumber(partNumber).orElseThrow(() -> new EntityMissingException(field, "part", partNumber));
    }

    /** Every part as a record, in part-number order. */
    @Transactional
    public List<PartSummary> summaries() {
        return parts.allByNumber().stream().map(PartSummary::from).toList();
    }

    /** Every part as a record, keyed by id (for records that hold a part's id). */
    @Transactional
    public Map<Long, PartSummary> summariesById() {
        Map<Long, PartSummary> byId = new HashMap<>();
        parts.allByNumber().forEach(p -> byId.put(p.id, PartSummary.from(p)));
        return byId;
    }

    /** The part as a record, or a 422 naming {@code field} when there is no part of that number. */
    @Transactional
    public PartSummary requireSummary(String field, String partNumber) {
        return PartSummary.from(require(field, partNumber));
    }

    public Part byId(long id) {
        return parts.findById(id);
    }

    /** Part numbers that may be issued in place of this part (the compatibility list). */
    @Transactional
    public java.util.Set<String> substitutesOf(String partNumber) {
        Part part = require("partNumber", partNumber);
        @SuppressWarnings("unchecked")
        List<String> numbers = parts.getEntityManager().createNativeQuery("""
                select p.part_number from part_substitute s join part p on p.id = s.substitute_id where s.part_id = ?1""")
                .setParameter(1, part.id).getResultList();
        return new java.util.TreeSet<>(numbers);
    }

    /** Declares that {@code substitute} may be issued for {@code partNumber} (one direction). */
    @Transactional
    public void addSubstitute(String partNumber, String substitute) {
        scope.requireCatalogue();
        Part part = parts.byPartNumber(partNumber).orElseThrow(() -> new EntityMissingException(null, "part", partNumber));
        Part other = require("partNumber", substitute);
        if (part.id.equals(other.id)) {
            throw new org.depotcast.common.BusinessRuleException("partNumber", "a part does not substitute for itself");
        }
        if (!substitutesOf(partNumber).contains(substitute)) {
            parts.getEntityManager().createNativeQuery("insert into part_substitute (part_id, substitute_id) values (?1, ?2)")
                    .setParameter(1, part.id).setParameter(2, other.id).executeUpdate();
            audit.record("SUBSTITUTE_ADDED", "part", partNumber, null, java.util.Map.of("substitute", substitute));
        }
    }

    @Transactional
    public Part create(PartRequest request) {
        scope.requireCatalogue();
        if (parts.byPartNumber(request.partNumber()).isPresent()) {
            throw new ConflictException("partNumber", "part '" + request.partNumber() + "' already exists");
        }
        Part part = new Part();
        apply(part, request);
        parts.persist(part);
        audit.record("PART_CREATED", "part", part.partNumber, null, PartResponse.from(part));
        return part;
    }

    @Transactional
    public Part update(String partNumber, PartRequest request) {
        scope.requireCatalogue();
        Part part = parts.byPartNumber(partNumber).orElseThrow(() -> new EntityMissingException(null, "part", partNumber));
        if (!partNumber.equals(request.partNumber())) {
            throw new ConflictException("partNumber", "the part number in the body must match the one in the path");
        }
        if (request.version() != null && request.version() != part.version) {
            throw new ConflictException("version", "part '" + partNumber + "' was changed since version "
                    + request.version() + "; reload it");
        }
        PartResponse before = PartResponse.from(part);
        apply(part, request);
        audit.record("PART_UPDATED", "part", part.partNumber, before, request);
        return part;
    }

    /** Creates or updates every part in the file (as POST or PUT would), or, if any row is wrong, changes nothing. */
    @Transactional
    public int importCsv(InputStream csv) {
        scope.requireCatalogue();
        Set<String> seen = new HashSet<>();
        return importer.run(csv, CsvImport.of(CSV_COLUMNS.subList(0, 11), row -> read(row, seen))
                .identifiers("part_number")
                .applyEach(request -> {
                    if (parts.byPartNumber(request.partNumber()).isPresent()) {
                        update(request.partNumber(), request);
                    } else {
                        create(request);
                    }
                }));
    }

    public CsvExport exportCsv() {
        return CsvExport.of("parts.csv", CSV_COLUMNS, all(), p -> List.of(p.partNumber, p.description, p.family,
                p.unitOfIssue, p.packSize, p.minOrderQty, p.unitCost.toPlainString(), p.currency, p.supplier,
                p.leadTimeDays, p.shelfLifeDays == null ? "" : p.shelfLifeDays, p.critical));
    }

    private static PartRequest read(CsvRow row, Set<String> seen) {
        String number = row.text("part_number");
        if (number != null && !seen.add(number)) {
            row.reject("part_number", "appears twice in the file");
        }
        Integer pack = row.optionalInteger("pack_size");
        Integer moq = row.optionalInteger("min_order_qty");
        Integer lead = row.optionalInteger("lead_time_days");
        return new PartRequest(number, row.text("description"), row.choice("family", ComponentFamily.class),
                row.choice("unit_of_issue", UnitOfIssue.class), pack == null ? 1 : pack, moq == null ? 1 : moq,
                row.decimal("unit_cost"), row.text("currency"), row.text("supplier"), lead == null ? 0 : lead,
                row.optionalInteger("shelf_life_days"), Boolean.TRUE.equals(row.optionalBoolean("critical")), null);
    }

    private static void apply(Part part, PartRequest r) {
        part.partNumber = r.partNumber();
        part.description = r.description();
        part.family = r.family();
        part.unitOfIssue = r.unitOfIssue();
        part.packSize = r.packSize();
        part.minOrderQty = r.minOrderQty();
        part.unitCost = r.unitCost();
        part.currency = r.currency();
        part.supplier = r.supplier();
        part.leadTimeDays = r.leadTimeDays();
        part.shelfLifeDays = r.shelfLifeDays();
        part.critical = r.critical();
    }
}
