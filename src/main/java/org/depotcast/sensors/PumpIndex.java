package org.depotcast.sensors;

import org.depotcast.access.AccessScope;
import org.depotcast.fleet.PumpIntakeRow;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The pumps an intake file may name, read once per file as plain rows (a programme may have tens of thousands), with
 * whether the caller may write readings for each (the pumps they may see).
 */
final class PumpIndex {
    record PumpFacts(long id, String assetId, LocalDate installedOn, long modelId, long depotId, boolean visible) {
    }

    private final Map<String, PumpFacts> byAssetId;

    private PumpIndex(Map<String, PumpFacts> byAssetId) {
        this.byAssetId = byAssetId;
    }

    static PumpIndex of(List<PumpIntakeRow> rows, AccessScope.Scope scope) {
        Map<String, PumpFacts> index = new HashMap<>(rows.size() * 2);
        for (PumpIntakeRow r : rows) {
            index.put(r.assetId(), new PumpFacts(r.id(), r.assetId(), r.installedOn(), r.modelId(), r.depotId(),
                    r.visibleTo(scope)));
        }
        return new PumpIndex(index);
    }

    PumpFacts find(String assetId) {
        return byAssetId.get(assetId);
    }
}
