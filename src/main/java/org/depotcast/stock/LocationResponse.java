package org.depotcast.stock;

import java.math.BigDecimal;

public record LocationResponse(String code, String name, LocationKind kind, String parentCode, BigDecimal latitude,
                               BigDecimal longitude, String mechanicUsername) {
    static LocationResponse from(Location l) {
        return new LocationResponse(l.code, l.name, l.kind, l.parent == null ? null : l.parent.code, l.latitude,
                l.longitude, l.mechanicUsername);
    }
}
