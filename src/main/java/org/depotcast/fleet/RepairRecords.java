package org.depotcast.fleet;

import java.util.Map;

/**
 * The repair records as pump status needs them. Implemented by the repairs feature, so the fleet can keep a pump's
 * status in step with its repairs without depending on that feature.
 */
public interface RepairRecords {
    RepairFacts factsOf(long pumpId);

    /** Facts of every pump that has repairs, keyed by pump id. */
    Map<Long, RepairFacts> factsOfAll();
}
