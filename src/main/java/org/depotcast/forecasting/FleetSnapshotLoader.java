package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.BomLine;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PumpModel;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.core.forecast.UsageTimeline;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.UsageService;
import org.depotcast.repairs.RepairKind;
import org.depotcast.repairs.RepairService;
import org.depotcast.stock.Location;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads the fleet, usage and repair history into a {@link FleetSnapshot}, in one read-only transaction. */
@ApplicationScoped
public class FleetSnapshotLoader {
    private final PumpService pumps;
    private final UsageService usage;
    private final RepairService repairs;
    private final LocationService locations;
    private final PartService parts;
    private final PumpModelService models;

    FleetSnapshotLoader(PumpService pumps, UsageService usage, RepairService repairs, LocationService locations,
                        PartService parts, PumpModelService models) {
        this.models = models;
        this.pumps = pumps;
        this.usage = usage;
        this.repairs = repairs;
        this.locations = locations;
        this.parts = parts;
    }

    @Transactional
    public FleetSnapshot load(LocalDate origin, int historyMonths) {
        LocalDate historyEnd = origin.withDayOfMonth(1);
        LocalDate historyStart = historyEnd.minusMonths(historyMonths);
        Map<Long, List<long[]>> readingDays = new HashMap<>();
        Map<Long, List<Double>> readingHours = new HashMap<>();
        for (Object[] row : usage.allReadings()) {
            long pumpId = (Long) row[0];
            readingDays.computeIfAbsent(pumpId, k -> new ArrayList<>()).add(new long[]{((LocalDate) row[1]).toEpochDay()});
            readingHours.computeIfAbsent(pumpId, k -> new ArrayList<>()).add(((BigDecimal) row[2]).doubleValue());
        }
        List<FleetSnapshot.Consumption> consumption = new ArrayList<>();
        Map<Long, Long> lastService = new HashMap<>();
        long firstRecord = Long.MAX_VALUE;
        for (Object[] row : repairs.consumptionRows()) {
            LocalDate day = (LocalDate) row[5];
            firstRecord = Math.min(firstRecord, day.toEpochDay());
            boolean breakdown = row[4] == RepairKind.BREAKDOWN;
            long pumpId = (Long) row[1];
            consumption.add(new FleetSnapshot.Consumption((Long) row[0], pumpId, (Long) row[2], (String) row[3],
                    breakdown, day, ((BigDecimal) row[6]).doubleValue()));
            // Only services before the origin count: a back-check as of a past date must not see later ones.
            if (!breakdown && day.isBefore(historyEnd)) {
                lastService.merge(pumpId, day.toEpochDay(), Math::max);
            }
        }
        Map<Long, PumpModel> modelsById = new HashMap<>();
        models.all().forEach(m -> modelsById.put(m.id, m));
        List<FleetSnapshot.PumpRecord> records = new ArrayList<>();
        long recordsStart = firstRecord;
        for (Object[] row : pumps.planningRows()) {
            long pumpId = (Long) row[0];
            LocalDate installed = (LocalDate) row[4];
            long end = row[5] == PumpStatus.DECOMMISSIONED && row[6] != null
                    ? ((LocalDate) row[6]).toEpochDay() : Long.MAX_VALUE / 4;
            if (end <= historyStart.toEpochDay()) {
                continue;
            }
            List<long[]> days = readingDays.getOrDefault(pumpId, List.of());
            List<Double> hours = readingHours.getOrDefault(pumpId, List.of());
            UsageTimeline timeline = new UsageTimeline(days.stream().mapToLong(d -> d[0]).toArray(),
                    hours.stream().mapToDouble(Double::doubleValue).toArray(), ((BigDecimal) row[8]).doubleValue());
            double depth = ((BigDecimal) row[3]).doubleValue();
            PumpModel model = modelsById.get((Long) row[7]);
            List<FleetSnapshot.BomPart> bom = new ArrayList<>(model.bom.size());
            for (BomLine line : model.bom) {
                bom.add(new FleetSnapshot.BomPart(line.part.id, line.part.family, line.serviceKitQuantity(depth)));
            }
            records.add(new FleetSnapshot.PumpRecord(pumpId, (Long) row[1], (String) row[2], depth,
                    installed.toEpochDay(), end, model.serviceIntervalHours, timeline, List.copyOf(bom),
                    lastService.getOrDefault(pumpId, Math.max(installed.toEpochDay(), recordsStart == Long.MAX_VALUE
                            ? installed.toEpochDay() : recordsStart)),
                    lastService.containsKey(pumpId) || installed.toEpochDay() >= recordsStart));
        }
        Map<String, String> kits = new HashMap<>();
        Map<Long, String> codes = new HashMap<>();
        for (Location location : locations.all()) {
            codes.put(location.id, location.code);
            if (location.kind == LocationKind.KIT) {
                kits.put(location.mechanicUsername, location.code);
            }
        }
        Map<Long, String> partNumbers = new HashMap<>();
        Map<Long, ComponentFamily> families = new HashMap<>();
        parts.all().forEach(p -> {
            partNumbers.put(p.id, p.partNumber);
            families.put(p.id, p.family);
        });
        return new FleetSnapshot(historyStart, historyEnd, records, consumption, kits, codes, partNumbers, families,
                recordsStart == Long.MAX_VALUE ? historyStart.toEpochDay() : recordsStart);
    }
}
