package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.time.LocalDate;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * The pump register as other features read it: {@link PumpSummary} records read by query, scoped as
 * {@link PumpService} scopes (all for leads and admins, their depots' for officers, assigned ones for mechanics).
 */
@ApplicationScoped
public class PumpQueryService {
    /** Ids per {@code in} list; more read every pump instead (both databases bind each id as a parameter). */
    private static final int ONE_QUERY_IDS = 1000;

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
        return repository.summaries(depotId, locations.codesById()).stream()
                .filter(p -> PumpService.visible(current, p.assignedMechanic(), p.depotId())).toList();
    }

    /** The pump, or 404 when unknown, 403 when outside the caller's depots or assignments. */
    @Transactional
    public PumpSummary requireVisible(String field, String assetId) {
        return repository.summaryOf(pumps.requireVisible(field, assetId).id, locations.codesById());
    }

    /** The pump with this id (from a record the caller holds), or 403 when outside their depots or assignments. */
    @Transactional
    public PumpSummary requireVisible(long pumpId) {
        PumpSummary pump = repository.summaryOf(pumpId, locations.codesById());
        if (!visibleFilter().test(pump)) {
            throw new io.quarkus.security.ForbiddenException("pump '" + pump.assetId()
                    + "' is outside your depots or assignments");
        }
        return pump;
    }

    /** The caller's visibility as a filter on pump records, resolved once for a whole list. */
    public Predicate<PumpSummary> visibleFilter() {
        AccessScope.Scope current = scope.current();
        return p -> PumpService.visible(current, p.assignedMechanic(), p.depotId());
    }

    /** The asset ids of these pumps, keyed by pump id (whoever the caller is: the ids come from records they see). */
    @Transactional
    public Map<Long, String> assetIdsOf(Collection<Long> pumpIds) {
        Map<Long, String> assetIds = new HashMap<>();
        if (!pumpIds.isEmpty()) {
            repository.summariesOf(pumpIds, Map.of()).forEach(p -> assetIds.put(p.id(), p.assetId()));
        }
        return assetIds;
    }

    /**
     * These pumps as records keyed by pump id, with their depots' codes (whoever the caller is: the ids come from
     * records they see). One query for the pumps and one for the codes, however many ids.
     */
    @Transactional
    public Map<Long, PumpSummary> summariesById(Collection<Long> pumpIds) {
        Map<Long, PumpSummary> byId = new HashMap<>();
        if (pumpIds.size() > ONE_QUERY_IDS) {
            java.util.Set<Long> wanted = new java.util.HashSet<>(pumpIds);
            repository.summaries(null, locations.codesById()).stream().filter(p -> wanted.contains(p.id()))
                    .forEach(p -> byId.put(p.id(), p));
        } else if (!pumpIds.isEmpty()) {
            repository.summariesOf(pumpIds, locations.codesById()).forEach(p -> byId.put(p.id(), p));
        }
        return byId;
    }

    /** The day the programme's first pump on the register was installed; empty with no pump. */
    @Transactional
    public Optional<LocalDate> firstInstalled() {
        return Optional.ofNullable(repository.getEntityManager()
                .createQuery("select min(p.installedOn) from Pump p", LocalDate.class).getSingleResult());
    }

    /** Every pump, for work the system does for the whole programme, by asset id. */
    @Transactional
    public List<PumpSummary> all() {
        return repository.summaries(null, locations.codesById());
    }
}
