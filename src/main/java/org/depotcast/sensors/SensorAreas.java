package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.common.InvalidInputException;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Resolves the area of a sensor report for the caller, as the rest of the API scopes: a named depot outside the
 * caller's locations is a 403 (a mechanic's scope holds only their kit, so a mechanic naming a depot is refused too);
 * a mechanic naming none gets their own pumps and kit; anyone else must name a depot (400).
 */
@ApplicationScoped
class SensorAreas {
    private final AccessScope scope;
    private final LocationService locations;
    private final PumpQueryService pumps;
    private final DepotStock stock;

    SensorAreas(AccessScope scope, LocationService locations, PumpQueryService pumps, DepotStock stock) {
        this.scope = scope;
        this.locations = locations;
        this.pumps = pumps;
        this.stock = stock;
    }

    SensorArea resolve(String depotCode) {
        if (depotCode == null || depotCode.isBlank()) {
            String mechanic = scope.current().mechanic();
            if (mechanic == null) {
                throw new InvalidInputException("depot", "required: the depot's code");
            }
            return ofMechanic(mechanic);
        }
        LocationSummary depot = locations.requireSummary("depot", depotCode);
        scope.require(depot.id(), depot.code());
        Map<String, BigDecimal> atDepot = stock.atLocation(depot.code());
        Map<String, BigDecimal> inKits = stock.kitsOf(depot.code());
        return new SensorArea(depot.code(), null, pumps.visible(depot.code()), atDepot, inKits,
                "at " + depot.code() + " and in its mechanics' kits");
    }

    private SensorArea ofMechanic(String mechanic) {
        Optional<LocationSummary> kit = locations.kitSummaryOf(mechanic);
        String depotCode = kit.map(LocationSummary::parentCode).orElse(null);
        Map<String, BigDecimal> inKit = kit.map(k -> stock.atLocation(k.code())).orElseGet(HashMap::new);
        return new SensorArea(depotCode, mechanic, pumps.visible(null), null, inKit,
                kit.map(k -> "in your kit " + k.code()).orElse("in no kit: your account carries none"));
    }
}
