package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.common.InvalidInputException;
import org.depotcast.fleet.PumpService;
import org.depotcast.stock.Location;
import org.depotcast.stock.LocationService;

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
    private final PumpService pumps;
    private final DepotStock stock;

    SensorAreas(AccessScope scope, LocationService locations, PumpService pumps, DepotStock stock) {
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
        Location depot = locations.require("depot", depotCode);
        scope.require(depot.id, depot.code);
        Map<String, BigDecimal> atDepot = stock.atLocation(depot.code);
        Map<String, BigDecimal> inKits = stock.kitsOf(depot);
        return new SensorArea(depot.code, null, pumps.search(depot.code, null), atDepot, inKits,
                "at " + depot.code + " and in its mechanics' kits");
    }

    private SensorArea ofMechanic(String mechanic) {
        Optional<Location> kit = locations.kitOf(mechanic);
        Location depot = kit.map(Location::depot).orElse(null);
        Map<String, BigDecimal> inKit = kit.map(k -> stock.atLocation(k.code)).orElseGet(HashMap::new);
        return new SensorArea(depot == null ? null : depot.code, mechanic, pumps.search(null, null), null, inKit,
                kit.map(k -> "in your kit " + k.code).orElse("in no kit: your account carries none"));
    }
}
