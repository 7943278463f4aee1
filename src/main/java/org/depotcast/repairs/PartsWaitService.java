package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.PartService;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpSummary;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Broken pumps waiting for parts, read from the repairs: today's waits and the pump-days waited over a period. */
@ApplicationScoped
public class PartsWaitService {
    private final RepairRepository repairs;
    private final PumpQueryService pumps;
    private final PartService parts;

    PartsWaitService(RepairRepository repairs, PumpQueryService pumps, PartService parts) {
        this.repairs = repairs;
        this.pumps = pumps;
        this.parts = parts;
    }

    /**
     * A broken pump waiting for a part today: since it was diagnosed (or reported, when not yet diagnosed).
     *
     * @param daysWaiting whole days from {@code waitingSince} to {@code today}
     */
    public record PumpWait(String depotCode, String partNumber, String assetId, String repairRef, LocalDate waitingSince,
                           long daysWaiting) {
    }

    /**
     * Per depot code (the pump's depot): {repairs that waited for parts, pump-days spent waiting}, for repairs reported
     * since a date.
     */
    @Transactional
    public Map<String, long[]> waitingForPartsSince(LocalDate since) {
        List<Object[]> rows = repairs.waitsSince(since);
        Map<Long, PumpSummary> pumpsById = pumps.summariesById(pumpIds(rows));
        Map<String, long[]> waits = new HashMap<>();
        for (Object[] row : rows) {
            long[] cell = waits.computeIfAbsent(pumpsById.get((Long) row[0]).depotCode(), k -> new long[2]);
            cell[0]++;
            cell[1] += ChronoUnit.DAYS.between((LocalDate) row[1], (LocalDate) row[2]);
        }
        return waits;
    }

    /** Every part that broken pumps wait for today, longest wait first. */
    @Transactional
    public List<PumpWait> waitingNow(LocalDate today) {
        List<Object[]> rows = repairs.openWaits();
        Map<Long, PumpSummary> pumpsById = pumps.summariesById(pumpIds(rows));
        Map<Long, String> partNumbers = new HashMap<>();
        parts.summaries().forEach(p -> partNumbers.put(p.id(), p.partNumber()));
        List<PumpWait> waits = new ArrayList<>();
        for (Object[] row : rows) {
            PumpSummary pump = pumpsById.get((Long) row[0]);
            LocalDate since = row[4] != null ? (LocalDate) row[4] : (LocalDate) row[3];
            waits.add(new PumpWait(pump.depotCode(), partNumbers.get((Long) row[1]), pump.assetId(), (String) row[2], since,
                    Math.max(0, ChronoUnit.DAYS.between(since, today))));
        }
        waits.sort(Comparator.comparingLong(PumpWait::daysWaiting).reversed().thenComparing(PumpWait::repairRef));
        return waits;
    }

    /** The pump ids of rows that start with one. */
    private static Set<Long> pumpIds(List<Object[]> rows) {
        Set<Long> ids = new HashSet<>();
        rows.forEach(row -> ids.add((Long) row[0]));
        return ids;
    }
}
