package org.depotcast.fleet;

import org.depotcast.access.AccessScope;

import java.time.LocalDate;

/**
 * One pump as sensor intake reads it, for every pump of a programme at once (tens of thousands), without loading
 * entities. {@code modelId} is the catalogue's pump model, {@code depotId} the stock location.
 */
public record PumpIntakeRow(long id, String assetId, LocalDate installedOn, long modelId, long depotId,
                            String assignedMechanic) {
    /** Whether the pump is the caller's to see: the same rule as {@link PumpService#visible(Pump)}. */
    public boolean visibleTo(AccessScope.Scope scope) {
        return PumpService.visible(scope, assignedMechanic, depotId);
    }
}
