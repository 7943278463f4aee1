package org.depotcast.forecasting;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.PumpModelSummary;
import org.depotcast.core.forecast.UsageTimeline;
import org.depotcast.fleet.PumpPlanningRow;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.UsageReadingRow;
import org.depotcast.fleet.UsageService;
import org.depotcast.repairs.ConsumptionRow;
import org.depotcast.repairs.RepairKind;
import org.depotcast.repairs.RepairService;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the fleet, usage and repair history into a {@link FleetSnapshot}, in one read-only transaction, as it stood
 * at the forecast origin (see {@link #asOf}), so a forecast as of a past date can be checked against what followed.
 */
@ApplicationScoped
public class FleetSnapshotLoader {
    private final PumpService pumps;
    private final UsageService usage;
    private final RepairService repairs;
    private final LocationService locations;
    private final PartService parts;
    private final PumpModelService models;
    private final Clock clock;

    FleetSnapshotLoader(PumpService pumps, UsageService usage, RepairService repairs, LocationService locations,
                        PartService parts, PumpModelService models, Clock clock) {
        this.models = models;
        this.clock = clock;
        this.pumps = pumps;
        this.usage = usage;
        this.repairs = repairs;
        this.locations = locations;
        this.parts = parts;
    }

    /** The register and records in plain values, before any cut at an origin. */
    record Rows(List<Reading> readings, List<FleetSnapshot.Consumption> consumption, List<Pump> pumps,
                Map<String, String> kitByMechanic, Map<Long, String> locationCodes, Map<Long, String> partNumbers,
                Map<Long, ComponentFamily> partFamilies) {
    }

    record Reading(long pumpId, LocalDate readOn, double hoursPerDay) {
    }

    /** A pump as registered today; {@code decommissionedOn} null while in service. */
    record Pump(long id, long depotId, String mechanic, double depthM, LocalDate installedOn,
                LocalDate decommissionedOn, int serviceIntervalHours, double currentHoursPerDay,
                List<FleetSnapshot.BomPart> bom) {
    }

    /**
     * Reads in one transaction, so the register and the records agree: the caller's, or a new one. At 40 times the demo
     * on a machine shared with other work the read outlasted the default transaction timeout and the run failed; as
     * for storing a run, a new transaction is allowed ten minutes.
     */
    public FleetSnapshot load(LocalDate origin, int historyMonths) {
        Rows rows = QuarkusTransaction.isActive() ? rows() : QuarkusTransaction.requiringNew().timeout(600).call(this::rows);
        return asOf(origin, historyMonths, rows, LocalDate.now(clock));
    }

    private Rows rows() {
        List<Reading> readings = new ArrayList<>();
        for (UsageReadingRow row : usage.allReadings()) {
            readings.add(new Reading(row.pumpId(), row.readOn(), row.hoursPerDay().doubleValue()));
        }
        List<FleetSnapshot.Consumption> consumption = new ArrayList<>();
        for (ConsumptionRow row : repairs.consumptionRows()) {
            consumption.add(new FleetSnapshot.Consumption(row.partId(), row.pumpId(), row.depotId(), row.mechanic(),
                    row.kind() == RepairKind.BREAKDOWN, row.on(), row.quantity().doubleValue(), row.reportedOn()));
        }
        Map<Long, PumpModelSummary> modelsById = models.summariesById();
        List<Pump> register = new ArrayList<>();
        for (PumpPlanningRow row : pumps.planningRows()) {
            double depth = row.depthM().doubleValue();
            PumpModelSummary model = modelsById.get(row.modelId());
            List<FleetSnapshot.BomPart> bom = new ArrayList<>(model.bom().size());
            for (PumpModelSummary.Line line : model.bom()) {
                bom.add(new FleetSnapshot.BomPart(line.partId(), line.family(), line.serviceKitQuantity(depth)));
            }
            register.add(new Pump(row.pumpId(), row.depotId(), row.mechanic(), depth, row.installedOn(),
                    row.status() == PumpStatus.DECOMMISSIONED ? row.decommissionedOn() : null,
                    model.serviceIntervalHours(), row.usageHoursPerDay().doubleValue(), List.copyOf(bom)));
        }
        Map<String, String> kits = new HashMap<>();
        Map<Long, String> codes = new HashMap<>();
        for (LocationSummary location : locations.summaries()) {
            codes.put(location.id(), location.code());
            if (location.kind() == LocationKind.KIT) {
                kits.put(location.mechanicUsername(), location.code());
            }
        }
        Map<Long, String> partNumbers = new HashMap<>();
        Map<Long, ComponentFamily> families = new HashMap<>();
        parts.summaries().forEach(p -> {
            partNumbers.put(p.id(), p.partNumber());
            families.put(p.id(), p.family());
        });
        return new Rows(readings, consumption, register, kits, codes, partNumbers, families);
    }

    /**
     * Cuts the records at the origin (the first day of {@code origin}'s month): repairs and usage readings dated on or
     * after it are left out, pumps installed on or after it do not exist yet, and a decommissioning after it is not
     * yet known. A pump with no reading before the origin falls back to its registered daily load. A repair reported
     * before the origin and fixed after it was open on the origin: it enters dated by its report, as a run on that
     * day read it ({@link FleetSnapshot.Consumption#asKnownOn}). Leaving it out dropped the breakdowns of the last
     * days before every past origin (about 11 days of them on generated programmes, where a third of repairs wait
     * up to six weeks for parts), so a held-out forecast ran lower than one made on the day.
     */
    static FleetSnapshot asOf(LocalDate origin, int historyMonths, Rows rows) {
        return asOf(origin, historyMonths, rows, LocalDate.MAX);
    }

    /**
     * As {@link #asOf(LocalDate, int, Rows)}, and the register's plans enter too: an installation or a
     * decommissioning dated from {@code today}'s month on (or from the origin, when that is later) is a plan known
     * when the forecast is made, so the pump adds exposure from its installation and stops at its decommissioning
     * over the horizon. Dates between a past origin and today's month are history that was not known at the origin.
     */
    static FleetSnapshot asOf(LocalDate origin, int historyMonths, Rows rows, LocalDate today) {
        LocalDate historyEnd = origin.withDayOfMonth(1);
        LocalDate plansFrom = today.equals(LocalDate.MAX) ? today : today.withDayOfMonth(1);
        LocalDate knownFrom = plansFrom.isAfter(historyEnd) ? plansFrom : historyEnd;
        LocalDate historyStart = historyEnd.minusMonths(historyMonths);
        Map<Long, List<Reading>> readingsByPump = new HashMap<>();
        for (Reading r : rows.readings()) {
            if (r.readOn().isBefore(historyEnd)) {
                readingsByPump.computeIfAbsent(r.pumpId(), k -> new ArrayList<>()).add(r);
            }
        }
        List<FleetSnapshot.Consumption> consumption = rows.consumption().stream().map(c -> c.asKnownOn(historyEnd))
                .filter(java.util.Objects::nonNull).toList();
        Map<Long, Long> lastService = new HashMap<>();
        long firstRecord = Long.MAX_VALUE;
        for (FleetSnapshot.Consumption c : consumption) {
            firstRecord = Math.min(firstRecord, c.day().toEpochDay());
            if (!c.breakdown()) {
                lastService.merge(c.pumpId(), c.day().toEpochDay(), Math::max);
            }
        }
        long recordsStart = firstRecord;
        List<FleetSnapshot.PumpRecord> records = new ArrayList<>();
        for (Pump pump : rows.pumps()) {
            LocalDate decommissioned = pump.decommissionedOn();
            boolean endKnown = decommissioned != null
                    && (decommissioned.isBefore(historyEnd) || !decommissioned.isBefore(knownFrom));
            long end = endKnown ? decommissioned.toEpochDay() : Long.MAX_VALUE / 4;
            long installed = pump.installedOn().toEpochDay();
            boolean planned = !pump.installedOn().isBefore(knownFrom);
            if (end <= historyStart.toEpochDay() || !pump.installedOn().isBefore(historyEnd) && !planned) {
                continue;
            }
            List<Reading> readings = new ArrayList<>(readingsByPump.getOrDefault(pump.id(), List.of()));
            readings.sort(java.util.Comparator.comparing(Reading::readOn));
            UsageTimeline timeline = new UsageTimeline(readings.stream().mapToLong(r -> r.readOn().toEpochDay()).toArray(),
                    readings.stream().mapToDouble(Reading::hoursPerDay).toArray(), pump.currentHoursPerDay());
            records.add(new FleetSnapshot.PumpRecord(pump.id(), pump.depotId(), pump.mechanic(), pump.depthM(),
                    installed, end, pump.serviceIntervalHours(), timeline, pump.bom(),
                    lastService.getOrDefault(pump.id(), Math.max(installed, recordsStart == Long.MAX_VALUE
                            ? installed : recordsStart)),
                    lastService.containsKey(pump.id()) || installed >= recordsStart));
        }
        return new FleetSnapshot(historyStart, historyEnd, records, consumption, rows.kitByMechanic(),
                rows.locationCodes(), rows.partNumbers(), rows.partFamilies(),
                recordsStart == Long.MAX_VALUE ? historyStart.toEpochDay() : recordsStart);
    }
}
