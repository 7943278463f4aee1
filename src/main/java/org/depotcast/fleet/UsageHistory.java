package org.depotcast.fleet;

import java.time.LocalDate;
import java.time.YearMonth;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** Typed-in usage readings and sensor-measured monthly loads as one history. */
final class UsageHistory {
    private UsageHistory() {
    }

    /**
     * Both lists' points, sorted by pump then day, leaving out a typed-in reading dated in a month for which the pump
     * has a measured load: measured hours replace the estimate there, and a pump without sensors keeps its path.
     */
    static List<UsageReadingRow> merge(List<UsageReadingRow> typed, List<UsageReadingRow> measured) {
        if (measured.isEmpty()) {
            return typed;
        }
        Set<String> measuredMonths = new HashSet<>();
        measured.forEach(m -> measuredMonths.add(key(m.pumpId(), m.readOn())));
        List<UsageReadingRow> merged = new ArrayList<>(typed.size() + measured.size());
        for (UsageReadingRow r : typed) {
            if (!measuredMonths.contains(key(r.pumpId(), r.readOn()))) {
                merged.add(r);
            }
        }
        merged.addAll(measured);
        merged.sort(Comparator.comparingLong(UsageReadingRow::pumpId).thenComparing(UsageReadingRow::readOn));
        return merged;
    }

    private static String key(long pumpId, LocalDate day) {
        return pumpId + "@" + YearMonth.from(day);
    }
}
