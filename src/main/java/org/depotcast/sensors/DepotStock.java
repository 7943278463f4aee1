package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.stock.BalanceView;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.StockQueryService;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.Map;

/** Units on hand per part at a location, or in a depot's mechanics' kits together, as the caller may see them. */
@ApplicationScoped
class DepotStock {
    private final LocationService locations;
    private final StockQueryService stock;

    DepotStock(LocationService locations, StockQueryService stock) {
        this.locations = locations;
        this.stock = stock;
    }

    /** The depot's mechanics' kits together (each kit's parent is the depot). */
    Map<String, BigDecimal> kitsOf(String depotCode) {
        Map<String, BigDecimal> units = new HashMap<>();
        for (LocationSummary kit : locations.summariesOfKind(LocationKind.KIT)) {
            if (depotCode.equals(kit.parentCode())) {
                add(units, kit.code());
            }
        }
        return units;
    }

    /** One location's own shelves (a depot without its kits, or one kit). */
    Map<String, BigDecimal> atLocation(String locationCode) {
        return add(new HashMap<>(), locationCode);
    }

    private Map<String, BigDecimal> add(Map<String, BigDecimal> units, String locationCode) {
        for (BalanceView balance : stock.balances(locationCode)) {
            units.merge(balance.partNumber(), balance.onHand(), BigDecimal::add);
        }
        return units;
    }
}
