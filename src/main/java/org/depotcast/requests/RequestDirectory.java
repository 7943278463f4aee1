package org.depotcast.requests;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.util.Collection;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Reads what parts requests point at from the features that own it (stock locations, catalogue parts, the pump
 * register), as records: the requests keep ids only. Locations and parts are read whole (hundreds of rows, and an
 * approval may name any part as a substitute); pumps only those the requests name.
 */
@ApplicationScoped
class RequestDirectory {
    private final LocationService locations;
    private final PartService parts;
    private final PumpQueryService pumps;

    RequestDirectory(LocationService locations, PartService parts, PumpQueryService pumps) {
        this.locations = locations;
        this.parts = parts;
        this.pumps = pumps;
    }

    @Transactional
    RequestNames of(Collection<PartsRequest> requests) {
        Map<Long, String> codes = new HashMap<>();
        locations.summariesById().forEach((id, location) -> codes.put(id, location.code()));
        Map<Long, PartSummary> byId = new HashMap<>();
        parts.summaries().forEach(part -> byId.put(part.id(), part));
        Set<Long> pumpIds = requests.stream().map(r -> r.pumpId).filter(Objects::nonNull).collect(Collectors.toSet());
        return new RequestNames(codes, byId, pumps.assetIdsOf(pumpIds));
    }

    /** The code of one location, for a message. */
    @Transactional
    String locationCode(long locationId) {
        LocationSummary location = locations.summariesById().get(locationId);
        return location == null ? String.valueOf(locationId) : location.code();
    }
}
