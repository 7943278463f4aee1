package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.StockedParts;

import java.util.Set;
import java.util.stream.Collectors;

/** A location stocks by policy every part with forecast demand there in the latest run (it has a reorder point). */
@ApplicationScoped
class PolicyStockedParts implements StockedParts {
    private final ForecastQueryService forecasts;

    PolicyStockedParts(ForecastQueryService forecasts) {
        this.forecasts = forecasts;
    }

    @Override
    public Set<String> stockedAt(LocationSummary location) {
        if (location.kind() == LocationKind.IN_TRANSIT) {
            return Set.of();
        }
        String key = location.kind() == LocationKind.CENTRAL_STORE ? PlanningService.PROGRAMME : location.code();
        return forecasts.demandAt(key, location.kind() == LocationKind.KIT ? 2 : 3).entrySet().stream()
                .filter(e -> e.getKey() != null && e.getValue().monthlyMean() > 0).map(java.util.Map.Entry::getKey)
                .collect(Collectors.toSet());
    }
}
