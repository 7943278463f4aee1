package org.depotcast.forecasting;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CredibilityWeight;
import org.depotcast.core.forecast.FleetRateModel;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.LocalDate;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A {@link FleetOutlook} as a forecast run as of the same origin sees it: the snapshot over the run's history window,
 * the declared families' rate models, and each depot series' credibility ratio. When a run as of that origin has
 * finished, its stored models and ratios are used as they were (so a projection agrees with the forecast the officers
 * plan from, and no model is fitted twice); otherwise they are fitted here as such a run would. The spend projection
 * and its back-check read demand through it. Nothing is stored.
 */
@ApplicationScoped
public class FleetOutlooks {
    private static final String NONE_AS_OF = "no forecast run as of that day has finished";
    private final ForecastModelFiles files;
    private final FleetSnapshotLoader loader;
    private final ForecastRepository repository;
    private final int historyMonths;

    FleetOutlooks(ForecastModelFiles files, FleetSnapshotLoader loader, ForecastRepository repository,
                  @ConfigProperty(name = "depotcast.forecast.history-months") int historyMonths) {
        this.files = files;
        this.loader = loader;
        this.repository = repository;
        this.historyMonths = historyMonths;
    }

    /** As of {@code origin}'s month's first day, over {@code months} months ahead. */
    public FleetOutlook asOf(LocalDate origin, int months) {
        FleetSnapshot snapshot = loader.load(origin, historyMonths);
        return stored(snapshot, months).orElseGet(() -> fitted(snapshot, months, NONE_AS_OF));
    }

    /**
     * As of {@code origin} from forecast run {@code forecastRunId} alone, whichever run has finished since: its stored
     * models and ratios when it is as of that origin and kept its ratios, else fitted afresh as such a run would (no
     * other stored run is read). A spend run pins the run it starts with, so its fleet and its top-up agree.
     */
    public FleetOutlook asOf(LocalDate origin, int months, long forecastRunId) {
        FleetSnapshot snapshot = loader.load(origin, historyMonths);
        return QuarkusTransaction.requiringNew().call(() -> repository.run(forecastRunId)
                        .filter(run -> snapshot.historyEnd().equals(run.origin))
                        .flatMap(run -> stored(run, snapshot, months)))
                .orElseGet(() -> fitted(snapshot, months, "forecast run " + forecastRunId + " is not as of that day or "
                        + "kept no depot ratios"));
    }

    /** Fitted afresh, whatever runs are stored. */
    public FleetOutlook fittedAsOf(LocalDate origin, int months) {
        return fitted(loader.load(origin, historyMonths), months, NONE_AS_OF);
    }

    private FleetOutlook fitted(FleetSnapshot snapshot, int months, String why) {
        Map<ComponentFamily, ForecastModelDefinition> definitions = files.load();
        Map<ComponentFamily, FleetRateModel> models = FleetModelFitter.fitAll(definitions, snapshot, 0);
        DemandAssembler run = new DemandAssembler(snapshot, definitions, models, Map.of(), 1);
        return new FleetOutlook(snapshot, definitions, models, months, depotRatios(snapshot, run.weigh()),
                "fitted for this projection as a forecast run as of " + snapshot.historyEnd() + " would (" + why + ")");
    }

    /**
     * The newest finished run as of the snapshot's origin, when it kept its credibility ratios (runs stored before they
     * were kept are fitted again).
     */
    private java.util.Optional<FleetOutlook> stored(FleetSnapshot snapshot, int months) {
        return QuarkusTransaction.requiringNew().call(() -> repository.latestFinishedRunAsOf(snapshot.historyEnd())
                .flatMap(run -> stored(run, snapshot, months)));
    }

    /** The run's stored models and ratios, in the caller's transaction; empty when it kept no ratios. */
    private java.util.Optional<FleetOutlook> stored(ForecastRun run, FleetSnapshot snapshot, int months) {
        List<ForecastRepository.StoredRatio> ratios = repository.credibilityRatios(run.id);
        if (ratios.isEmpty()) {
            return java.util.Optional.empty();
        }
        Map<ComponentFamily, FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
        repository.fitsOf(run.id).forEach(r -> models.put(ComponentFamily.valueOf(r.family), r.rateModel()));
        return java.util.Optional.of(new FleetOutlook(snapshot, files.load(), models, months,
                depotRatios(snapshot, ratios), "the fleet models and depot ratios of forecast run " + run.id
                + " as of " + run.origin + " (finished " + run.finishedAt.toLocalDate() + ")"));
    }

    /** The credibility ratio of each depot series (programme and kit series left out), by {@link FleetOutlook#seriesKey}. */
    private static Map<Long, Double> depotRatios(FleetSnapshot snapshot, Map<String, CredibilityWeight> weights) {
        List<ForecastRepository.StoredRatio> ratios = new java.util.ArrayList<>();
        weights.forEach((key, weight) -> {
            int bar = key.indexOf('|');
            ratios.add(new ForecastRepository.StoredRatio(Long.parseLong(key.substring(0, bar)), key.substring(bar + 1),
                    weight.ratio()));
        });
        return depotRatios(snapshot, ratios);
    }

    private static Map<Long, Double> depotRatios(FleetSnapshot snapshot, List<ForecastRepository.StoredRatio> stored) {
        Map<String, Long> depotIds = new HashMap<>();
        snapshot.locationCodes().forEach((id, code) -> depotIds.put(code, id));
        Set<String> kits = new HashSet<>(snapshot.kitByMechanic().values());
        Map<Long, Double> ratios = new HashMap<>();
        for (ForecastRepository.StoredRatio r : stored) {
            String location = r.locationCode();
            if (!location.equals(DemandAssembler.PROGRAMME) && !kits.contains(location) && r.ratio() != 1.0
                    && depotIds.containsKey(location)) {
                ratios.put(FleetOutlook.seriesKey(r.partId(), depotIds.get(location)), r.ratio());
            }
        }
        return ratios;
    }
}
