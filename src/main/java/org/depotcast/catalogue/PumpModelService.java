package org.depotcast.catalogue;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.EntityMissingException;

import java.io.InputStream;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Pump models and their bills of materials. */
@ApplicationScoped
public class PumpModelService {
    static final List<String> CSV_COLUMNS = List.of("model_code", "model_name", "service_interval_hours",
            "part_number", "basis", "quantity", "service_kit_quantity");

    private final PumpModelRepository models;
    private final PartService parts;
    private final org.depotcast.access.AuditService audit;
    private final org.depotcast.access.AccessScope scope;
    private final CsvImporter importer;

    PumpModelService(PumpModelRepository models, PartService parts, org.depotcast.access.AuditService audit,
                     org.depotcast.access.AccessScope scope, CsvImporter importer) {
        this.importer = importer;
        this.scope = scope;
        this.audit = audit;
        this.models = models;
        this.parts = parts;
    }

    public List<PumpModel> all() {
        return models.allByCode();
    }

    public Optional<PumpModel> find(String code) {
        return models.byCode(code);
    }

    public PumpModel require(String field, String code) {
        return models.byCode(code).orElseThrow(() -> new EntityMissingException(field, "pump model", code));
    }

    /** Every pump model with its bill of materials, as records keyed by model id. */
    @Transactional
    public Map<Long, PumpModelSummary> summariesById() {
        Map<Long, PumpModelSummary> byId = new HashMap<>();
        models.allByCode().forEach(model -> byId.put(model.id, PumpModelSummary.from(model)));
        return byId;
    }

    /** Every model's code keyed by its id (one light query, no bills of materials). */
    @Transactional
    public Map<Long, String> codesById() {
        return models.codesById();
    }

    /** The model with this code as a record; a 422 naming {@code field} when there is none. */
    @Transactional
    public PumpModelSummary requireSummary(String field, String code) {
        return PumpModelSummary.from(require(field, code));
    }

    /** The service kit of a pump of this model at this depth; a 422 naming {@code field} when the model is unknown. */
    @Transactional
    public ServiceKit serviceKit(String field, String code, double depthM) {
        return ServiceKit.of(require(field, code), depthM);
    }

    @Transactional
    public PumpModel create(PumpModelRequest request) {
        if (models.byCode(request.code()).isPresent()) {
            throw new ConflictException("code", "pump model '" + request.code() + "' already exists");
        }
        PumpModel model = new PumpModel();
        apply(model, request);
        models.persist(model);
        return model;
    }

    @Transactional
    public PumpModel update(String code, PumpModelRequest request) {
        PumpModel model = models.byCode(code).orElseThrow(() -> new EntityMissingException(null, "pump model", code));
        if (!code.equals(request.code())) {
            throw new ConflictException("code", "the model code in the body must match the one in the path");
        }
        apply(model, request);
        return model;
    }

    /**
     * One row per bill-of-materials line; rows sharing a model code make one model, created or replaced as POST or
     * PUT would. All or nothing.
     */
    @Transactional
    public int importCsv(InputStream csv) {
        scope.requireCatalogue();
        Set<String> seenLines = new HashSet<>();
        return importer.run(csv, CsvImport.of(CSV_COLUMNS, row -> read(row, seenLines))
                .identifiers("model_code", "part_number")
                .column("code", "model_code").column("name", "model_name").column("basis", "basis")
                .applyGrouped(PumpModelRequest::code, PumpModelService::joined, "bom", PumpModelRequest::bom, request -> {
                    if (models.byCode(request.code()).isPresent()) {
                        update(request.code(), request);
                    } else {
                        create(request);
                    }
                }));
    }

    private static PumpModelRequest read(CsvRow row, Set<String> seenLines) {
        String code = row.text("model_code");
        String partNumber = row.text("part_number");
        if (code != null && partNumber != null && !seenLines.add(code + "\u0000" + partNumber)) {
            row.reject("part_number", "appears twice for model '" + code + "'");
        }
        Integer interval = row.integer("service_interval_hours");
        PumpModelRequest.Line line = new PumpModelRequest.Line(partNumber, row.choice("basis", BomBasis.class),
                row.decimal("quantity"), row.optionalDecimal("service_kit_quantity"));
        return new PumpModelRequest(code, row.text("model_name"), interval == null ? 1 : interval, List.of(line));
    }

    /** The model as its first row names it, with the bill of materials of every row. */
    private static PumpModelRequest joined(PumpModelRequest first, PumpModelRequest next) {
        List<PumpModelRequest.Line> lines = new ArrayList<>(first.bom());
        lines.addAll(next.bom());
        return new PumpModelRequest(first.code(), first.name(), first.serviceIntervalHours(), lines);
    }

    public CsvExport exportCsv() {
        List<List<?>> rows = new ArrayList<>();
        for (PumpModel m : all()) {
            for (BomLine l : m.bom) {
                rows.add(List.of(m.code, m.name, m.serviceIntervalHours, l.part.partNumber, l.basis,
                        l.quantity.stripTrailingZeros().toPlainString(),
                        l.serviceKitQuantity.stripTrailingZeros().toPlainString()));
            }
        }
        return new CsvExport("pump-models.csv", CSV_COLUMNS, rows);
    }

    /** Every change of a model (JSON or an import row) passes here: only those who keep the catalogue may make it. */
    private void apply(PumpModel model, PumpModelRequest request) {
        scope.requireCatalogue();
        audit.record(model.id == null ? "PUMP_MODEL_CREATED" : "PUMP_MODEL_UPDATED", "pump_model", request.code(),
                model.id == null ? null : PumpModelResponse.from(model), request);
        model.code = request.code();
        model.name = request.name();
        model.serviceIntervalHours = request.serviceIntervalHours();
        List<BomLine> lines = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < request.bom().size(); i++) {
            PumpModelRequest.Line l = request.bom().get(i);
            if (!seen.add(l.partNumber())) {
                throw new ConflictException("bom[" + i + "].partNumber", "part '" + l.partNumber() + "' is listed twice");
            }
            BomLine line = new BomLine();
            line.part = parts.require("bom[" + i + "].partNumber", l.partNumber());
            line.basis = l.basis();
            line.quantity = l.quantity();
            line.serviceKitQuantity = l.serviceKitQuantity() == null ? BigDecimal.ZERO : l.serviceKitQuantity();
            lines.add(line);
        }
        model.replaceBom(lines);
    }
}
