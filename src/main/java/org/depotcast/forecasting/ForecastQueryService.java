package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.QueryParams;
import org.depotcast.core.forecast.FleetRateModel;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Reads the latest finished forecast run: per part and location, and the fleet model per family. */
@ApplicationScoped
public class ForecastQueryService {
    private final ForecastRepository repository;
    private final PartService parts;
    private final org.depotcast.stock.LocationService locations;
    private final org.depotcast.access.AccessScope scope;

    ForecastQueryService(ForecastRepository repository, PartService parts, org.depotcast.stock.LocationService locations,
                         org.depotcast.access.AccessScope scope) {
        this.locations = locations;
        this.scope = scope;
        this.repository = repository;
        this.parts = parts;
    }

    /** Planning's view: the latest stored forecast of a part at a location, if any run has finished. */
    @Transactional
    public Optional<StoredForecastResponse> latest(String partNumber, String locationCode) {
        PartSummary part = parts.requireSummary("part", partNumber);
        return repository.latestFinishedRun().flatMap(run -> repository.forecastOf(run.id, part.id(), locationCode)
                .map(f -> response(run, part.partNumber(), f)));
    }

    /** Expected demand of one part at a location, per month, as planning uses it. */
    public record DemandRate(double monthlyMean, double monthlyVariance, String method) {
    }

    /**
     * Demand per part number at a location from the latest finished run, averaged over its first {@code months}
     * forecast months (breakdowns plus scheduled services); empty when no run has finished yet.
     */
    @Transactional
    public Map<String, DemandRate> demandAt(String locationCode, int months) {
        Optional<ForecastRun> run = repository.latestFinishedRun();
        return run.isEmpty() ? new java.util.HashMap<>() : demandOf(run.get().id, locationCode, months);
    }

    /** As {@link #demandAt}, from forecast run {@code runId} whichever run is the latest (empty for an unknown run). */
    @Transactional
    public Map<String, DemandRate> demandOf(long runId, String locationCode, int months) {
        Map<String, DemandRate> rates = new java.util.HashMap<>();
        Map<Long, String> numbers = new java.util.HashMap<>();
        parts.summaries().forEach(p -> numbers.put(p.id(), p.partNumber()));
        for (PartForecast f : repository.forecastsAt(runId, locationCode)) {
            double[] monthly = f.monthlyForecast;
            int n = Math.max(1, Math.min(months, monthly.length));
            double sum = 0;
            for (int m = 0; m < n; m++) {
                sum += monthly[m];
            }
            rates.put(numbers.get(f.partId), new DemandRate(sum / n, f.variancePerMonth, f.method));
        }
        return rates;
    }

    /** The id of the run planning reads now (the newest finished one), if any has finished. */
    @Transactional
    public java.util.OptionalLong latestRunId() {
        return repository.latestFinishedRun().map(run -> java.util.OptionalLong.of(run.id))
                .orElseGet(java.util.OptionalLong::empty);
    }

    /** Whether any forecast run has finished: planning answers nothing before one has. */
    @Transactional
    public boolean anyRunFinished() {
        return repository.latestFinishedRun().isPresent();
    }

    /**
     * Breakdown demand alone per part number at a location from the latest finished run (scheduled services left
     * out): what a kit's shortfall costs in pumps without water, services being planned work.
     */
    @Transactional
    public Map<String, DemandRate> breakdownsAt(String locationCode) {
        Map<String, DemandRate> rates = new java.util.HashMap<>();
        Optional<ForecastRun> run = repository.latestFinishedRun();
        if (run.isEmpty()) {
            return rates;
        }
        Map<Long, String> numbers = new java.util.HashMap<>();
        parts.summaries().forEach(p -> numbers.put(p.id(), p.partNumber()));
        for (PartForecast f : repository.forecastsAt(run.get().id, locationCode)) {
            rates.put(numbers.get(f.partId), new DemandRate(f.breakdownPerMonth, f.variancePerMonth, f.method));
        }
        return rates;
    }

    @Transactional
    public StoredForecastResponse forPart(String partNumber, String locationCode) {
        String location = locationCode == null ? DemandAssembler.PROGRAMME : locationCode;
        requireVisible(location);
        ForecastRun run = latestRun();
        PartSummary part = parts.requireSummary(null, partNumber);
        PartForecast f = repository.forecastOf(run.id, part.id(), location).orElseThrow(() ->
                new EntityMissingException(null, "forecast of part at location", partNumber + " @ " + location));
        return response(run, part.partNumber(), f);
    }

    @Transactional
    public List<StoredForecastResponse> atLocation(String locationCode) {
        requireVisible(locationCode);
        ForecastRun run = latestRun();
        Map<Long, String> numbers = new LinkedHashMap<>();
        parts.summaries().forEach(p -> numbers.put(p.id(), p.partNumber()));
        List<StoredForecastResponse> out = new ArrayList<>();
        for (PartForecast f : repository.forecastsAt(run.id, locationCode)) {
            out.add(response(run, numbers.get(f.partId), f));
        }
        return out;
    }

    /** A programme-wide model fit: for leads, admins and central-store officers (and the system's own runs). */
    @Transactional
    public FleetModelResponse fleetModel(String family) {
        scope.requireProgramme();
        ComponentFamily parsed = QueryParams.optionalEnum("family", family, ComponentFamily.class);
        ForecastRun run = latestRun();
        FleetModelFitRecord r = repository.fitOf(run.id, parsed.name())
                .orElseThrow(() -> new EntityMissingException(null, "fleet model", family));
        List<String> terms = new ArrayList<>();
        terms.add("intercept");
        terms.addAll(r.covariates);
        return new FleetModelResponse(r.family, run.id, r.source, named(terms, r.coefficients),
                named(terms, r.standardErrors), r.deviance, r.dfResidual, r.dispersion, r.overdispersed, r.events,
                r.exposureHours, r.unitsPerEvent, Math.exp(r.coefficients[0]) * 1000);
    }

    /**
     * The latest finished run's fleet rate models as the run used them (with its depot ratios where it kept them);
     * empty before any run has finished. Programme-wide, as {@link #fleetModel}.
     */
    @Transactional
    public Optional<FleetRates> fleetRates() {
        scope.requireProgramme();
        return repository.latestFinishedRun().map(run -> {
            Map<ComponentFamily, FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
            for (FleetModelFitRecord r : repository.fitsOf(run.id)) {
                models.put(ComponentFamily.valueOf(r.family), r.rateModel());
            }
            return new FleetRates(run.id, models);
        });
    }

    /** One family's typed rate model as the run stored it (the explorer's rate points come from it). */
    @Transactional
    FleetRateModel rateModelOf(long runId, String family) {
        return repository.fitOf(runId, family).map(FleetModelFitRecord::rateModel)
                .orElseThrow(() -> new EntityMissingException(null, "fleet model", family));
    }

    /** The whole programme for leads, admins and central-store officers; a depot or kit for those it is assigned to. */
    private void requireVisible(String locationCode) {
        if (DemandAssembler.PROGRAMME.equals(locationCode)) {
            scope.requireProgramme();
            return;
        }
        org.depotcast.stock.LocationSummary location = locations.requireSummary("location", locationCode);
        scope.require(location.id(), location.code());
    }

    private ForecastRun latestRun() {
        return repository.latestFinishedRun().orElseThrow(() -> new EntityMissingException(null, "forecast run",
                "latest (no run has finished yet; POST /api/forecast/runs)"));
    }

    private static Map<String, Double> named(List<String> terms, double[] values) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < values.length && i < terms.size(); i++) {
            map.put(terms.get(i), values[i]);
        }
        return map;
    }

    private static StoredForecastResponse response(ForecastRun run, String partNumber, PartForecast f) {
        double[] monthly = f.monthlyForecast;
        double[] preventive = f.preventiveMonthly;
        double[] history = f.monthlyHistory;
        double[] variance = f.monthlyVariance == null ? new double[0] : f.monthlyVariance;
        LocalDate origin = run.historyTo.plusDays(1);
        List<StoredForecastResponse.Month> months = new ArrayList<>();
        double yearMean = 0, yearVariance = 0;
        for (int m = 0; m < monthly.length; m++) {
            // Runs made before monthly variances were kept: the breakdowns' variance plus the services as Poisson.
            double v = m < variance.length ? variance[m] : f.variancePerMonth + preventive[m];
            months.add(new StoredForecastResponse.Month(origin.plusMonths(m), monthly[m], monthly[m] - preventive[m],
                    preventive[m], ForecastRange.of(monthly[m], v)));
            if (m < 12) {
                yearMean += monthly[m];
                yearVariance += v;
            }
        }
        ForecastRange year = ForecastRange.of(yearMean, f.yearVariance != null ? f.yearVariance : yearVariance);
        List<StoredForecastResponse.HistoryMonth> past = new ArrayList<>();
        LocalDate historyFrom = f.historyFrom != null ? f.historyFrom : run.historyFrom;
        for (int m = 0; m < history.length; m++) {
            past.add(new StoredForecastResponse.HistoryMonth(historyFrom.plusMonths(m), history[m]));
        }
        return new StoredForecastResponse(partNumber, f.locationCode, run.id, run.finishedAt, f.method, f.alpha, f.beta,
                f.adi, f.cv2, f.demandClass, f.mase, f.rmsse, f.scaledBias, f.fleetRmsse, f.historyRmsse,
                historyFrom, history.length, f.methodDetail,
                f.breakdownPerMonth, f.variancePerMonth, months, past, year);
    }
}
