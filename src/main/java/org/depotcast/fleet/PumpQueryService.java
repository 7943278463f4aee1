package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The pump register as other features read it: {@link PumpSummary} records read by query, scoped as
 * {@link PumpService} scopes (all for leads and admins, their depots' for officers, assigned ones for mechanics).
 */
@ApplicationScoped
public class PumpQueryService {
    private final PumpService pumps;
    private final PumpRepository repository;
    private final LocationService locations;
    private final AccessScope scope;

    PumpQueryService(PumpService pumps, PumpRepository repository, LocationService locations, AccessScope scope) {
        this.pumps = pumps;
        this.repository = repository;
        this.locations = locations;
        this.scope = scope;
    }

    /**
     * The pumps the caller may see at one depot (a 422 when unknown, 403 when not the caller's) or, with null,
     * wherever, by asset id.
     */
    @Transactional
    public List<PumpSummary> visible(String depotCode) {
        Long depotId = null;
        if (depotCode != null) {
            LocationSummary depot = locations.requireSummary("depot", depotCode);
            scope.require(depot.id(), depot.code());
            depotId = depot.id();
        }
        AccessScope.Scope current = scope.current();
        return repository.summaries(depotId).stream()
                .filter(p -> PumpService.visible(current, p.assignedMechanic(), p.depotId())).toList();
    }

    /** The pump, or 404 when unknown, 403 when outside the caller's depots or assignments. */
    @Transactional
    public PumpSummary requireVisible(String field, String assetId) {
        return repository.summaryOf(pumps.requireVisible(field, assetId).id);
    }

    /** The asset ids of these pumps, keyed by pump id (whoever the caller is: the ids come from records they see). */
    @Transactional
    public Map<Long, String> assetIdsOf(Collection<Long> pumpIds) {
        Map<Long, String> assetIds = new HashMap<>();
        if (!pumpIds.isEmpty()) {
            repository.summariesOf(pumpIds).forEach(p -> assetIds.put(p.id(), p.assetId()));
        }
        return assetIds;
    }

    /** Every pump, for work the system does for the whole programme, by asset id. */
    @Transactional
    public List<PumpSummary> all() {
        return repository.summaries(null);
    }
}
