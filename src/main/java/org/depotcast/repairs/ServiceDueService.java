package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.core.forecast.UsageTimeline;
import org.depotcast.fleet.Pump;
import org.depotcast.fleet.PumpService;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.UsageReadingRow;
import org.depotcast.fleet.UsageService;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Preventive services due on the pumps the caller may see: operating hours since the last service (usage timeline,
 * as the forecasts count them) against the model's interval, projected at today's daily load.
 */
@ApplicationScoped
public class ServiceDueService {
    static final int SOON_DAYS = 30;

    private final PumpService pumps;
    private final UsageService usage;
    private final RepairRepository repairs;

    ServiceDueService(PumpService pumps, UsageService usage, RepairRepository repairs) {
        this.pumps = pumps;
        this.usage = usage;
        this.repairs = repairs;
    }

    /** Pumps in service, soonest due first (overdue before due soon before later; not in use last). */
    @Transactional
    public List<ServiceDue> dueAt(LocalDate today, String depotCode) {
        List<Pump> visible = pumps.search(depotCode, null).stream().filter(p -> p.status != PumpStatus.DECOMMISSIONED).toList();
        Map<Long, LocalDate> lastService = new HashMap<>();
        for (Object[] row : repairs.lastServices()) {
            lastService.put((Long) row[0], (LocalDate) row[1]);
        }
        Map<Long, List<UsageReadingRow>> readings = new HashMap<>();
        java.util.Set<Long> ids = new java.util.HashSet<>();
        visible.forEach(p -> ids.add(p.id));
        for (UsageReadingRow row : usage.allReadings()) {
            if (ids.contains(row.pumpId())) {
                readings.computeIfAbsent(row.pumpId(), k -> new ArrayList<>()).add(row);
            }
        }
        LocalDate recordsStart = repairs.firstReportedOn();
        List<ServiceDue> due = new ArrayList<>(visible.size());
        for (Pump pump : visible) {
            due.add(of(pump, lastService.get(pump.id), readings.getOrDefault(pump.id, List.of()), recordsStart, today));
        }
        due.sort(Comparator.comparing(ServiceDue::state).thenComparing(ServiceDue::hoursLeft).thenComparing(ServiceDue::assetId));
        return due;
    }

    static ServiceDue of(Pump pump, LocalDate lastService, List<UsageReadingRow> readings, LocalDate recordsStart,
                         LocalDate today) {
        long[] days = readings.stream().mapToLong(r -> r.readOn().toEpochDay()).sorted().toArray();
        double[] hours = readings.stream().sorted(Comparator.comparing(UsageReadingRow::readOn))
                .mapToDouble(r -> r.hoursPerDay().doubleValue()).toArray();
        UsageTimeline timeline = new UsageTimeline(days, hours, pump.usageHoursPerDay == null
                ? Pump.DEFAULT_HOURS_PER_DAY.doubleValue() : pump.usageHoursPerDay.doubleValue());
        boolean onRecord = lastService != null || recordsStart == null || !pump.installedOn.isBefore(recordsStart);
        LocalDate from = lastService != null ? lastService : onRecord ? pump.installedOn : recordsStart;
        int interval = pump.model.serviceIntervalHours;
        double since = timeline.hoursBetween(from.toEpochDay(), today.toEpochDay());
        double load = timeline.hoursPerDayOn(today.toEpochDay());
        double left = interval - since;
        if (load <= 0) {
            return new ServiceDue(pump.assetId, pump.model.code, interval, lastService, from, onRecord, since, load, left,
                    null, ServiceDue.State.NOT_IN_USE);
        }
        LocalDate dueOn = today.plusDays((long) Math.floor(left / load));
        ServiceDue.State state = left <= 0 ? ServiceDue.State.OVERDUE
                : dueOn.isAfter(today.plusDays(SOON_DAYS)) ? ServiceDue.State.LATER : ServiceDue.State.DUE_SOON;
        return new ServiceDue(pump.assetId, pump.model.code, interval, lastService, from, onRecord, since, load, left,
                dueOn, state);
    }
}
