package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.stock.LocationSummary;

import java.io.InputStream;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** The pump register as a spreadsheet: the all-or-nothing import and the export of the pumps the caller sees. */
@ApplicationScoped
public class PumpCsv {
    static final List<String> COLUMNS = List.of("asset_id", "model_code", "depth_m", "installed_on", "latitude",
            "longitude", "depot_code", "assigned_mechanic", "status", "status_since", "usage_hours_per_day",
            "usage_source");

    private final PumpService pumps;
    private final PumpStatusService status;
    private final CsvImporter importer;

    PumpCsv(PumpService pumps, PumpStatusService status, CsvImporter importer) {
        this.pumps = pumps;
        this.status = status;
        this.importer = importer;
    }

    /**
     * All or nothing. A new asset id is registered, a known one replaced, each as {@link PumpService#register} does
     * (the same scope check on the depot the pump leaves and the one it goes to).
     */
    @Transactional
    public int importCsv(InputStream csv) {
        Map<String, Pump> registered = new HashMap<>();
        Map<String, Long> modelCache = new HashMap<>();
        Map<String, LocationSummary> depotCache = new HashMap<>();
        Set<String> seen = new HashSet<>();
        List<Pump> updated = new ArrayList<>();
        return importer.run(csv, CsvImport.of(COLUMNS.subList(0, 4), row -> read(row, seen))
                .identifiers("asset_id", "model_code", "depot_code", "assigned_mechanic")
                .scopeColumn("depot_code")
                .applyEach(request -> {
                    if (registered.isEmpty()) {
                        pumps.all().forEach(p -> registered.put(p.assetId, p));
                    }
                    Pump pump = registered.getOrDefault(request.assetId(), new Pump());
                    if (pump.id != null) {
                        updated.add(pump);
                    }
                    pumps.save(pump, request, modelCache.computeIfAbsent(request.modelCode(),
                                    c -> pumps.modelId("modelCode", c)),
                            depotCache.computeIfAbsent(request.depotCode(), c -> pumps.depot("depotCode", c)));
                })
                // A row cannot make a pump WORKING while one of its breakdown repairs is open: the repairs decide.
                .afterAll(() -> status.followRepairs(updated)));
    }

    private static PumpRequest read(CsvRow row, Set<String> seen) {
        String assetId = row.text("asset_id");
        if (assetId != null && !seen.add(assetId)) {
            row.reject("asset_id", "appears twice in the file");
        }
        return new PumpRequest(assetId, row.text("model_code"), row.decimal("depth_m"), row.date("installed_on"),
                row.optionalDecimal("latitude"), row.optionalDecimal("longitude"), row.text("depot_code"),
                row.optionalText("assigned_mechanic"), row.optionalChoice("status", PumpStatus.class),
                row.optionalDate("status_since"), row.optionalDecimal("usage_hours_per_day"),
                row.optionalChoice("usage_source", UsageSource.class));
    }

    public CsvExport exportCsv() {
        PumpCodes codes = pumps.codes();
        return CsvExport.of("pumps.csv", COLUMNS, pumps.search(null, null), p -> Arrays.asList(p.assetId,
                codes.modelCode(p.modelId), p.depthM.toPlainString(), p.installedOn, plain(p.latitude),
                plain(p.longitude), codes.depotCode(p.depotId), p.assignedMechanic == null ? "" : p.assignedMechanic,
                p.status, p.statusSince == null ? "" : p.statusSince, p.usageHoursPerDay.toPlainString(), p.usageSource));
    }

    private static String plain(BigDecimal value) {
        return value == null ? "" : value.toPlainString();
    }
}
