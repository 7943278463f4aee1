package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.stock.BalanceView;
import org.depotcast.stock.Location;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.StockQueryService;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.Map;

/** Units on hand per part at a depot and in its mechanics' kits together, as the caller may see them. */
@ApplicationScoped
class DepotStock {
    private final LocationService locations;
    private final StockQueryService stock;

    DepotStock(LocationService locations, StockQueryService stock) {
        this.locations = locations;
        this.stock = stock;
    }

    Map<String, BigDecimal> depotAndKits(String depotCode) {
        Location depot = locations.require("depot", depotCode);
        Map<String, BigDecimal> units = add(new HashMap<>(), depot.code);
        for (Location kit : locations.ofKind(LocationKind.KIT)) {
            if (kit.parent != null && kit.parent.id.equals(depot.id)) {
                add(units, kit.code);
            }
        }
        return units;
    }

    Map<String, BigDecimal> depotOnly(String depotCode) {
        return add(new HashMap<>(), depotCode);
    }

    private Map<String, BigDecimal> add(Map<String, BigDecimal> units, String locationCode) {
        for (BalanceView balance : stock.balances(locationCode)) {
            units.merge(balance.partNumber(), balance.onHand(), BigDecimal::add);
        }
        return units;
    }
}
