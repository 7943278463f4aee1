package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.core.forecast.UsageTimeline;
import org.depotcast.core.sensors.ServiceByHours;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.PumpModelSummary;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.fleet.UsageReadingRow;
import org.depotcast.fleet.UsageService;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Preventive services due on the pumps the caller may see: operating hours since the last service against the
 * model's interval, projected at today's daily load, as {@link ServiceByHours} counts them: the usage timeline (as
 * the forecasts count it) for a pump without a sensor, the days its sensor read where it has one. The sensor service
 * plan takes its figures from here, so the two agree.
 */
@ApplicationScoped
public class ServiceDueService {
    static final int SOON_DAYS = 30;

    private final PumpQueryService pumps;
    private final PumpModelService models;
    private final UsageService usage;
    private final RepairRepository repairs;

    ServiceDueService(PumpQueryService pumps, PumpModelService models, UsageService usage, RepairRepository repairs) {
        this.pumps = pumps;
        this.models = models;
        this.usage = usage;
        this.repairs = repairs;
    }

    /** A pump's service due with what its sensor read since the service (null for a pump without one). */
    public record Counted(ServiceDue due, ServiceByHours.Measured measured) {
    }

    /** Pumps in service, soonest due first (overdue before due soon before later; not in use last). */
    @Transactional
    public List<ServiceDue> dueAt(LocalDate today, String depotCode) {
        return countedAt(today, depotCode).stream().map(Counted::due).toList();
    }

    /** As {@link #dueAt}, with each pump's sensor readings since its service, for the sensor service plan. */
    @Transactional
    public List<Counted> countedAt(LocalDate today, String depotCode) {
        List<PumpSummary> visible = pumps.visible(depotCode).stream()
                .filter(p -> p.status() != PumpStatus.DECOMMISSIONED).toList();
        Map<Long, PumpModelSummary> modelsById = models.summariesById();
        Map<Long, LocalDate> lastService = new HashMap<>();
        for (Object[] row : repairs.lastServices()) {
            lastService.put((Long) row[0], (LocalDate) row[1]);
        }
        Map<Long, List<UsageReadingRow>> readings = new HashMap<>();
        Set<Long> ids = new HashSet<>();
        visible.forEach(p -> ids.add(p.id()));
        for (UsageReadingRow row : usage.allReadings()) {
            if (ids.contains(row.pumpId())) {
                readings.computeIfAbsent(row.pumpId(), k -> new ArrayList<>()).add(row);
            }
        }
        LocalDate recordsStart = repairs.firstReportedOn();
        Map<Long, LocalDate> countedFrom = new HashMap<>();
        visible.forEach(p -> countedFrom.put(p.id(), countedFrom(p, lastService.get(p.id()), recordsStart)));
        Map<Long, ServiceByHours.Measured> measured = usage.measuredSince(countedFrom, today,
                ServiceByHours.RECENT_DAYS);
        List<Counted> due = new ArrayList<>(visible.size());
        for (PumpSummary pump : visible) {
            due.add(new Counted(of(pump, modelsById.get(pump.modelId()), lastService.get(pump.id()),
                    readings.getOrDefault(pump.id(), List.of()), recordsStart, today, measured.get(pump.id())),
                    measured.get(pump.id())));
        }
        due.sort(Comparator.comparing((Counted c) -> c.due().state()).thenComparing(c -> c.due().hoursLeft())
                .thenComparing(c -> c.due().assetId()));
        return due;
    }

    /** The last service, else installation when within the records, else the first day on record. */
    private static LocalDate countedFrom(PumpSummary pump, LocalDate lastService, LocalDate recordsStart) {
        return lastService != null ? lastService : onRecord(pump, lastService, recordsStart) ? pump.installedOn()
                : recordsStart;
    }

    private static boolean onRecord(PumpSummary pump, LocalDate lastService, LocalDate recordsStart) {
        return lastService != null || recordsStart == null || !pump.installedOn().isBefore(recordsStart);
    }

    /** Hours since the service as {@link ServiceByHours#project(LocalDate, ServiceByHours.PumpUsage)} counts them. */
    static ServiceDue of(PumpSummary pump, PumpModelSummary model, LocalDate lastService,
                         List<UsageReadingRow> readings, LocalDate recordsStart, LocalDate today,
                         ServiceByHours.Measured measured) {
        long[] days = readings.stream().mapToLong(r -> r.readOn().toEpochDay()).sorted().toArray();
        double[] hours = readings.stream().sorted(Comparator.comparing(UsageReadingRow::readOn))
                .mapToDouble(r -> r.hoursPerDay().doubleValue()).toArray();
        UsageTimeline timeline = new UsageTimeline(days, hours, pump.usageHoursPerDay().doubleValue());
        LocalDate from = countedFrom(pump, lastService, recordsStart);
        int interval = model.serviceIntervalHours();
        ServiceByHours.Projection p = ServiceByHours.project(today, new ServiceByHours.PumpUsage(from, interval,
                timeline.hoursBetween(from.toEpochDay(), today.toEpochDay()),
                timeline.hoursPerDayOn(today.toEpochDay()), measured));
        ServiceDue.State state = p.dueOn() == null ? ServiceDue.State.NOT_IN_USE
                : p.hoursLeft() <= 0 ? ServiceDue.State.OVERDUE
                : p.dueOn().isAfter(today.plusDays(SOON_DAYS)) ? ServiceDue.State.LATER : ServiceDue.State.DUE_SOON;
        return new ServiceDue(pump.assetId(), model.code(), interval, lastService, from,
                onRecord(pump, lastService, recordsStart), p.hoursSinceService(), p.recentHoursPerDay(),
                p.hoursLeft(), p.dueOn(), state);
    }
}
