package org.depotcast.repairs;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.fleet.RepairFacts;
import org.depotcast.fleet.RepairRecords;
import org.depotcast.fleet.RepairSpan;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The repair records as the fleet's pump status reads them. */
@ApplicationScoped
class RepairFactsSource implements RepairRecords {
    private final RepairRepository repairs;

    RepairFactsSource(RepairRepository repairs) {
        this.repairs = repairs;
    }

    @Override
    public RepairFacts factsOf(long pumpId) {
        return fold(repairs.openBreakdownsOf(pumpId), repairs.fixesOf(pumpId)).getOrDefault(pumpId, RepairFacts.NONE);
    }

    @Override
    public Map<Long, RepairFacts> factsOfAll() {
        return fold(repairs.openBreakdownsOf(null), repairs.fixesOf(null));
    }

    @Override
    public Map<Long, List<RepairSpan>> breakdownsBetween(LocalDate from, LocalDate to) {
        return byPump(repairs.breakdownsBetween(from, to));
    }

    @Override
    public Map<Long, List<RepairSpan>> breakdownsReportedSince(LocalDate since) {
        return byPump(repairs.breakdownsReportedSince(since));
    }

    /** Rows (pump id, reported on, fixed on) as spans per pump, in the rows' order. */
    private static Map<Long, List<RepairSpan>> byPump(List<Object[]> rows) {
        Map<Long, List<RepairSpan>> spans = new HashMap<>();
        for (Object[] row : rows) {
            spans.computeIfAbsent((Long) row[0], k -> new ArrayList<>())
                    .add(new RepairSpan((LocalDate) row[1], (LocalDate) row[2]));
        }
        return spans;
    }

    /** Rows (pump id, repair ref, date): open breakdowns earliest first, fixes latest first; the first per pump counts. */
    private static Map<Long, RepairFacts> fold(List<Object[]> open, List<Object[]> fixes) {
        Map<Long, RepairFacts> facts = new HashMap<>();
        for (Object[] row : open) {
            facts.putIfAbsent((Long) row[0], new RepairFacts((String) row[1], (LocalDate) row[2], null, null));
        }
        Map<Long, Boolean> seen = new HashMap<>();
        for (Object[] row : fixes) {
            Long pumpId = (Long) row[0];
            if (seen.putIfAbsent(pumpId, true) == null) {
                RepairFacts f = facts.getOrDefault(pumpId, RepairFacts.NONE);
                facts.put(pumpId, new RepairFacts(f.openRepairRef(), f.openSince(), (String) row[1], (LocalDate) row[2]));
            }
        }
        return facts;
    }
}
