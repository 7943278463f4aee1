package org.depotcast.sensors;

import org.depotcast.access.AccessScope;

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

    /** @param rows id, asset id, installed on, pump model id, depot id, assigned mechanic (fleet's intake rows) */
    static PumpIndex of(List<Object[]> rows, AccessScope.Scope scope) {
        Map<String, PumpFacts> index = new HashMap<>(rows.size() * 2);
        for (Object[] r : rows) {
            long depotId = (Long) r[4];
            String mechanic = (String) r[5];
            boolean visible = scope.everything()
                    || (scope.mechanic() != null ? scope.mechanic().equals(mechanic) : scope.sees(depotId));
            index.put((String) r[1], new PumpFacts((Long) r[0], (String) r[1], (LocalDate) r[2], (Long) r[3], depotId,
                    visible));
        }
        return new PumpIndex(index);
    }

    PumpFacts find(String assetId) {
        return byAssetId.get(assetId);
    }
}
