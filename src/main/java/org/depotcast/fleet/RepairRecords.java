package org.depotcast.fleet;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * The repair records as pump status needs them. Implemented by the repairs feature, so the fleet can keep a pump's
 * status in step with its repairs without depending on that feature.
 */
public interface RepairRecords {
    RepairFacts factsOf(long pumpId);

    /** Facts of every pump that has repairs, keyed by pump id. */
    Map<Long, RepairFacts> factsOfAll();

    /** Per pump, its breakdown repairs reported up to {@code to} and not fixed before {@code from}, earliest first. */
    Map<Long, List<RepairSpan>> breakdownsBetween(LocalDate from, LocalDate to);

    /** Per pump, its breakdown repairs reported on or after {@code since}, the latest reported first. */
    Map<Long, List<RepairSpan>> breakdownsReportedSince(LocalDate since);
}
