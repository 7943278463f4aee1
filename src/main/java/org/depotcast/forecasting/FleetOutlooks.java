package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CredibilityWeight;
import org.depotcast.core.forecast.FleetRateModel;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * A {@link FleetOutlook} as a forecast run as of the same origin would see it: the snapshot over the run's history
 * window, the declared families' rate models fitted on it, and each depot series' credibility ratio. The spend
 * projection and its back-check read demand through it. Nothing is stored.
 */
@ApplicationScoped
public class FleetOutlooks {
    private final ForecastModelFiles files;
    private final FleetSnapshotLoader loader;
    private final int historyMonths;

    FleetOutlooks(ForecastModelFiles files, FleetSnapshotLoader loader,
                  @ConfigProperty(name = "depotcast.forecast.history-months") int historyMonths) {
        this.files = files;
        this.loader = loader;
        this.historyMonths = historyMonths;
    }

    /** As of {@code origin}'s month's first day, over {@code months} months ahead. */
    public FleetOutlook asOf(LocalDate origin, int months) {
        return of(loader.load(origin, historyMonths), files.load(), months);
    }

    static FleetOutlook of(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions, int months) {
        Map<ComponentFamily, FleetRateModel> models = FleetModelFitter.fitAll(definitions, snapshot, 0);
        DemandAssembler run = new DemandAssembler(snapshot, definitions, models, Map.of(), 1);
        return new FleetOutlook(snapshot, definitions, models, months, depotRatios(snapshot, run.weigh()));
    }

    /** The credibility ratio of each depot series (programme and kit series left out), by {@link FleetOutlook#seriesKey}. */
    private static Map<Long, Double> depotRatios(FleetSnapshot snapshot, Map<String, CredibilityWeight> weights) {
        Map<String, Long> depotIds = new HashMap<>();
        snapshot.locationCodes().forEach((id, code) -> depotIds.put(code, id));
        Set<String> kits = new HashSet<>(snapshot.kitByMechanic().values());
        Map<Long, Double> ratios = new HashMap<>();
        weights.forEach((key, weight) -> {
            int bar = key.indexOf('|');
            String location = key.substring(bar + 1);
            if (!location.equals(DemandAssembler.PROGRAMME) && !kits.contains(location) && weight.ratio() != 1.0) {
                ratios.put(FleetOutlook.seriesKey(Long.parseLong(key.substring(0, bar)), depotIds.get(location)),
                        weight.ratio());
            }
        });
        return ratios;
    }
}
