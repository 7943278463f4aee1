package org.depotcast.stock;

import java.math.BigDecimal;

/**
 * A stock location as other features see it: a record, not the entity, so they hold no managed object of this
 * feature and no lazy parent. {@code parentCode} is the depot of a kit (null elsewhere); {@code mechanicUsername} is
 * the mechanic who carries a kit; {@code latitude} and {@code longitude} are decimal degrees, null when not recorded.
 */
public record LocationSummary(long id, String code, LocationKind kind, String parentCode, String mechanicUsername,
                              BigDecimal latitude, BigDecimal longitude) {
    static LocationSummary from(Location location) {
        return new LocationSummary(location.id, location.code, location.kind,
                location.parent == null ? null : location.parent.code, location.mechanicUsername, location.latitude,
                location.longitude);
    }
}
