package org.depotcast.catalogue;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvOut;
import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvTable;
import org.depotcast.common.EntityMissingException;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
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

    PumpModelService(PumpModelRepository models, PartService parts, org.depotcast.access.AuditService audit,
                     org.depotcast.access.AccessScope scope) {
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

    /** One row per bill-of-materials line; rows sharing a model code make one model. All or nothing. */
    @Transactional
    public int importCsv(String csv) {
        CsvTable table = CsvTable.parse(csv, CSV_COLUMNS);
        Map<String, PumpModelRequest> byCode = new LinkedHashMap<>();
        Set<String> seenLines = new HashSet<>();
        for (CsvRow row : table.rows()) {
            String code = row.text("model_code");
            String name = row.text("model_name");
            Integer interval = row.integer("service_interval_hours", 1);
            String partNumber = row.text("part_number");
            if (partNumber != null && parts.find(partNumber).isEmpty()) {
                row.reject("part_number", "part '" + partNumber + "' does not exist");
            }
            if (code != null && partNumber != null && !seenLines.add(code + "\u0000" + partNumber)) {
                row.reject("part_number", "appears twice for model '" + code + "'");
            }
            PumpModelRequest.Line line = new PumpModelRequest.Line(partNumber, row.choice("basis", BomBasis.class),
                    row.decimal("quantity", BigDecimal.ZERO, true),
                    row.optionalDecimal("service_kit_quantity", BigDecimal.ZERO, false));
            if (code != null) {
                PumpModelRequest existing = byCode.get(code);
                List<PumpModelRequest.Line> lines = existing == null ? new ArrayList<>() : new ArrayList<>(existing.bom());
                lines.add(line);
                byCode.put(code, new PumpModelRequest(code, name, interval == null ? 1 : interval, lines));
            }
        }
        table.problems().throwIfAny();
        for (PumpModelRequest request : byCode.values()) {
            PumpModel model = models.byCode(request.code()).orElseGet(PumpModel::new);
            apply(model, request);
            if (model.id == null) {
                models.persist(model);
            }
        }
        return table.rows().size();
    }

    public String exportCsv() {
        List<Object[]> rows = new ArrayList<>();
        for (PumpModel m : all()) {
            for (BomLine l : m.bom) {
                rows.add(new Object[]{m.code, m.name, m.serviceIntervalHours, l.part.partNumber, l.basis,
                        l.quantity.stripTrailingZeros().toPlainString(),
                        l.serviceKitQuantity.stripTrailingZeros().toPlainString()});
            }
        }
        return CsvOut.write(CSV_COLUMNS, rows, List::of);
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
