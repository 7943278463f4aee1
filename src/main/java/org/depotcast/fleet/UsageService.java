package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvOut;
import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvTable;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.ArrayList;
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

    UsageService(UsageReadingRepository readings, PumpService pumps, org.depotcast.access.AuditService audit) {
        this.audit = audit;
        this.readings = readings;
        this.pumps = pumps;
    }

    public List<UsageReading> of(String assetId) {
        return readings.ofPump(pumps.requireVisible(null, assetId).id);
    }

    /** Readings of every pump, oldest first per pump; rows: pump id, read on, hours per day. */
    public List<Object[]> allReadings() {
        return readings.allReadings();
    }

    @Transactional
    public UsageReading record(String assetId, UsageReadingRequest request) {
        Pump pump = pumps.requireVisible(null, assetId);
        if (readings.exists(pump.id, request.readOn())) {
            throw new ConflictException("readOn", "pump '" + assetId + "' already has a reading on " + request.readOn());
        }
        UsageReading reading = add(pump, request.readOn(), request.hoursPerDay(), request.source());
        refreshCurrentUsage(pump);
        audit.record("USAGE_RECORDED", "pump", assetId, null, request);
        return reading;
    }

    /** All or nothing. */
    @Transactional
    public int importCsv(String csv) {
        CsvTable table = CsvTable.parse(csv, CSV_COLUMNS);
        Map<String, Pump> pumpCache = new HashMap<>();
        Set<String> seen = new HashSet<>();
        Set<String> stored = readings.keys();
        var visible = pumps.visibleFilter();
        record Row(String assetId, LocalDate readOn, BigDecimal hours, UsageSource source) {
        }
        List<Row> rows = new ArrayList<>();
        for (CsvRow row : table.rows()) {
            String assetId = row.text("asset_id");
            Pump pump = assetId == null ? null : pumpCache.computeIfAbsent(assetId, a -> pumps.find(a).orElse(null));
            if (assetId != null && pump == null) {
                row.reject("asset_id", "pump '" + assetId + "' does not exist");
            } else if (pump != null && !visible.test(pump)) {
                row.reject("asset_id", "pump '" + assetId + "' is outside your depots or assignments");
            }
            LocalDate readOn = row.date("read_on");
            BigDecimal hours = row.decimal("hours_per_day", BigDecimal.ZERO, false);
            if (hours != null && hours.compareTo(BigDecimal.valueOf(24)) > 0) {
                row.reject("hours_per_day", "must be at most 24");
            }
            if (readOn != null && assetId != null && !seen.add(assetId + "@" + readOn)) {
                row.reject("read_on", "pump '" + assetId + "' has two readings on " + readOn + " in the file");
            } else if (pump != null && readOn != null && stored.contains(pump.id + "@" + readOn)) {
                row.reject("read_on", "pump '" + assetId + "' already has a reading on " + readOn);
            }
            rows.add(new Row(assetId, readOn, hours, row.choice("source", UsageSource.class)));
        }
        table.problems().throwIfAny();
        for (Row row : rows) {
            add(pumpCache.get(row.assetId()), row.readOn(), row.hours(), row.source());
        }
        readings.flush();
        Map<Long, Object[]> latest = readings.latestPerPump();
        for (Pump pump : pumpCache.values()) {
            Object[] newest = latest.get(pump.id);
            pump.usageHoursPerDay = (BigDecimal) newest[0];
            pump.usageSource = (UsageSource) newest[1];
        }
        // A history import is one change: one entry with its size, not one per reading.
        audit.record("USAGE_IMPORTED", "usage_reading", rows.size() + " rows", null, java.util.Map.of("rows", rows.size(),
                "pumps", pumpCache.size()));
        return rows.size();
    }

    public String exportCsv() {
        var visible = pumps.visibleFilter();
        List<UsageReading> all = readings.listAll(io.quarkus.panache.common.Sort.by("pump.assetId").and("readOn"))
                .stream().filter(r -> visible.test(r.pump)).toList();
        return CsvOut.write(CSV_COLUMNS, all, r -> List.of(r.pump.assetId, r.readOn, r.hoursPerDay.toPlainString(),
                r.source));
    }

    private UsageReading add(Pump pump, LocalDate readOn, BigDecimal hours, UsageSource source) {
        UsageReading reading = new UsageReading();
        reading.pump = pump;
        reading.readOn = readOn;
        reading.hoursPerDay = hours;
        reading.source = source;
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
