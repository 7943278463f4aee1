package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Broken pumps waiting for parts, read from the repairs: today's waits and the pump-days waited over a period. */
@ApplicationScoped
public class PartsWaitService {
    private final RepairRepository repairs;

    PartsWaitService(RepairRepository repairs) {
        this.repairs = repairs;
    }

    /**
     * A broken pump waiting for a part today: since it was diagnosed (or reported, when not yet diagnosed).
     *
     * @param daysWaiting whole days from {@code waitingSince} to {@code today}
     */
    public record PumpWait(String depotCode, String partNumber, String assetId, String repairRef, LocalDate waitingSince,
                           long daysWaiting) {
    }

    /** Per depot code: {repairs that waited for parts, pump-days spent waiting}, for repairs reported since a date. */
    public Map<String, long[]> waitingForPartsSince(LocalDate since) {
        Map<String, long[]> waits = new HashMap<>();
        for (Object[] row : repairs.waitsSince(since)) {
            long[] cell = waits.computeIfAbsent((String) row[0], k -> new long[2]);
            cell[0]++;
            cell[1] += ChronoUnit.DAYS.between((LocalDate) row[1], (LocalDate) row[2]);
        }
        return waits;
    }

    /** Every part that broken pumps wait for today, longest wait first. */
    public List<PumpWait> waitingNow(LocalDate today) {
        List<PumpWait> waits = new ArrayList<>();
        for (Object[] row : repairs.openWaits()) {
            LocalDate since = row[5] != null ? (LocalDate) row[5] : (LocalDate) row[4];
            waits.add(new PumpWait((String) row[0], (String) row[1], (String) row[2], (String) row[3], since,
                    Math.max(0, ChronoUnit.DAYS.between(since, today))));
        }
        waits.sort(Comparator.comparingLong(PumpWait::daysWaiting).reversed().thenComparing(PumpWait::repairRef));
        return waits;
    }
}
