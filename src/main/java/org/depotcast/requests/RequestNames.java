package org.depotcast.requests;

import org.depotcast.catalogue.PartSummary;

import java.util.Map;

/**
 * What the ids a parts request keeps stand for, read from their features as records: location codes (kits and
 * depots), catalogue parts, and pumps' asset ids. Built by {@link RequestDirectory} for the requests at hand.
 */
record RequestNames(Map<Long, String> locationCodes, Map<Long, PartSummary> parts, Map<Long, String> assetIds) {
    String locationCode(long locationId) {
        return locationCodes.get(locationId);
    }

    PartSummary part(long partId) {
        return parts.get(partId);
    }

    String partNumber(long partId) {
        return parts.get(partId).partNumber();
    }

    /** Null for a request for no pump. */
    String assetId(Long pumpId) {
        return pumpId == null ? null : assetIds.get(pumpId);
    }
}
