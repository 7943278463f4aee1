package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import io.quarkus.security.ForbiddenException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.core.sensors.ServiceByHours;

import java.io.InputStream;
import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Usage readings over time; the newest reading becomes the pump's current daily load. */
@ApplicationScoped
public class UsageService {
    static final List<String> CSV_COLUMNS = List.of("asset_id", "read_on", "hours_per_day", "source");

    private final UsageReadingRepository readings;
    private final PumpService pumps;
    private final org.depotcast.access.AuditService audit;
    private final CsvImporter importer;
    private final jakarta.enterprise.inject.Instance<MeasuredLoads> measured;

    UsageService(UsageReadingRepository readings, PumpService pumps, org.depotcast.access.AuditService audit,
                 CsvImporter importer, jakarta.enterprise.inject.Instance<MeasuredLoads> measured) {
        this.importer = importer;
        this.measured = measured;
        this.audit = audit;
        this.readings = readings;
        this.pumps = pumps;
    }

    public List<UsageReading> of(String assetId) {
        return readings.ofPump(pumps.requireVisible(null, assetId).id);
    }

    /**
     * The usage history of every pump, oldest first per pump: the typed-in readings, except that in a month a sensor
     * measured (see {@link MeasuredLoads}) the measured load stands in place of any estimate typed in that month.
     */
    public List<UsageReadingRow> allReadings() {
        List<UsageReadingRow> typed = readings.allReadings();
        if (measured.isUnsatisfied()) {
            return typed;
        }
        return UsageHistory.merge(typed, measured.get().monthlyLoads());
    }

    /** What sensors read per pump from its own first day up to {@code until}, not included ({@link MeasuredLoads#measuredSince}). */
    public Map<Long, ServiceByHours.Measured> measuredSince(Map<Long, LocalDate> firstDays, LocalDate until,
                                                            int lastDaysKept) {
        return measured.isUnsatisfied() || firstDays.isEmpty() ? Map.of()
                : measured.get().measuredSince(firstDays, until, lastDaysKept);
    }

    @Transactional
    public UsageReading record(String assetId, UsageReadingRequest request) {
        Pump pump = pumps.requireVisible(null, assetId);
        UsageReading reading = add(pump, request, readings.exists(pump.id, request.readOn()));
        refreshCurrentUsage(pump);
        audit.record("USAGE_RECORDED", "pump", assetId, null, request);
        return reading;
    }

    /**
     * All or nothing. Each row passes the JSON endpoint's checks (the pump exists and is the caller's, one reading a
     * day) and its write; the pumps' current load and the audit follow once for the whole history.
     */
    @Transactional
    public int importCsv(InputStream csv) {
        Map<String, Pump> pumpCache = new HashMap<>();
        Map<String, Pump> touched = new HashMap<>();
        Set<String> seen = new HashSet<>();
        Set<String> stored = new HashSet<>();
        var visible = pumps.visibleFilter();
        int[] count = {0};
        return importer.run(csv, CsvImport.of(CSV_COLUMNS, row -> read(row, seen))
                .identifiers("asset_id")
                .applyEach(row -> {
                    if (pumpCache.isEmpty()) {
                        pumps.all().forEach(p -> pumpCache.put(p.assetId, p));
                        stored.addAll(readings.keys());
                    }
                    Pump pump = pumpCache.get(row.assetId());
                    if (pump == null) {
                        throw new EntityMissingException("assetId", "pump", row.assetId());
                    }
                    if (!visible.test(pump)) {
                        throw new ForbiddenException("pump '" + row.assetId() + "' is outside your depots or assignments");
                    }
                    add(pump, row.reading(), stored.contains(pump.id + "@" + row.reading().readOn()));
                    touched.put(pump.assetId, pump);
                    count[0]++;
                })
                .afterAll(() -> {
                    readings.flush();
                    Map<Long, Object[]> latest = readings.latestPerPump();
                    for (Pump pump : touched.values()) {
                        Object[] newest = latest.get(pump.id);
                        pump.usageHoursPerDay = (BigDecimal) newest[0];
                        pump.usageSource = (UsageSource) newest[1];
                    }
                    // A history import is one change: one entry with its size, not one per reading.
                    audit.record("USAGE_IMPORTED", "usage_reading", count[0] + " rows", null,
                            Map.of("rows", count[0], "pumps", touched.size()));
                }));
    }

    private static UsageImportRow read(CsvRow row, Set<String> seen) {
        String assetId = row.text("asset_id");
        LocalDate readOn = row.date("read_on");
        if (readOn != null && assetId != null && !seen.add(assetId + "@" + readOn)) {
            row.reject("read_on", "pump '" + assetId + "' has two readings on " + readOn + " in the file");
        }
        return new UsageImportRow(assetId, new UsageReadingRequest(readOn, row.decimal("hours_per_day"),
                row.choice("source", UsageSource.class)));
    }

    public CsvExport exportCsv() {
        var visible = pumps.visibleFilter();
        List<UsageReading> all = readings.listAll(io.quarkus.panache.common.Sort.by("pump.assetId").and("readOn"))
                .stream().filter(r -> visible.test(r.pump)).toList();
        return CsvExport.of("usage-readings.csv", CSV_COLUMNS, all, r -> List.of(r.pump.assetId, r.readOn,
                r.hoursPerDay.toPlainString(), r.source));
    }

    /** The one write of a reading, from the JSON endpoint or an import row: one reading per pump and day. */
    private UsageReading add(Pump pump, UsageReadingRequest request, boolean dayAlreadyRead) {
        if (dayAlreadyRead) {
            throw new ConflictException("readOn", "pump '" + pump.assetId + "' already has a reading on "
                    + request.readOn());
        }
        UsageReading reading = new UsageReading();
        reading.pump = pump;
        reading.readOn = request.readOn();
        reading.hoursPerDay = request.hoursPerDay();
        reading.source = request.source();
        readings.persist(reading);
        return reading;
    }

    /** The newest reading is the pump's current daily load. */
    private void refreshCurrentUsage(Pump pump) {
        readings.find("pump.id = ?1 order by readOn desc", pump.id).firstResultOptional().ifPresent(latest -> {
            pump.usageHoursPerDay = latest.hoursPerDay;
            pump.usageSource = latest.source;
        });
    }
}
