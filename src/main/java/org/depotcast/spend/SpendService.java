package org.depotcast.spend;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.jobs.JobFailed;
import org.depotcast.jobs.JobKind;
import org.depotcast.jobs.JobProgress;
import org.depotcast.jobs.JobRunner;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.Part;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PumpModel;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.core.spend.SpendDraws;
import org.depotcast.core.spend.SpendLine;
import org.depotcast.core.spend.SpendSimulation;
import org.depotcast.forecasting.FleetModelResponse;
import org.depotcast.forecasting.FleetSnapshot;
import org.depotcast.forecasting.FleetSnapshotLoader;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.planning.PlanningService;
import org.depotcast.planning.StockPolicy;
import org.depotcast.stock.Location;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Annual parts-spend projections: saved scenarios, runs in the background with their phase shown, results kept per
 * run. A failed run is marked FAILED and leaves earlier runs' results untouched; the same scenario on the same data
 * gives the same numbers (fixed seed).
 */
@ApplicationScoped
public class SpendService {
    private final Scenarios scenarios;
    private final Runs runs;
    private final PartService parts;
    private final PumpModelService models;
    private final LocationService locations;
    private final FleetSnapshotLoader fleet;
    private final ForecastQueryService forecasts;
    private final ForecastRunService forecastRuns;
    private final PlanningService planning;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final JobRunner jobs;
    private final ObjectMapper json;
    private final FinancialYearService financialYears;

    @ApplicationScoped
    static class Scenarios implements PanacheRepository<SpendScenario> {
    }

    @ApplicationScoped
    static class Runs implements PanacheRepository<SpendRun> {
    }

    SpendService(Scenarios scenarios, Runs runs, PartService parts, PumpModelService models, LocationService locations,
                 FleetSnapshotLoader fleet, ForecastQueryService forecasts, ForecastRunService forecastRuns,
                 PlanningService planning, AccessScope scope, CurrentUser currentUser, AuditService audit,
                 JobRunner jobs, ObjectMapper json, FinancialYearService financialYears) {
        this.financialYears = financialYears;
        this.scenarios = scenarios;
        this.runs = runs;
        this.parts = parts;
        this.models = models;
        this.locations = locations;
        this.fleet = fleet;
        this.forecasts = forecasts;
        this.forecastRuns = forecastRuns;
        this.planning = planning;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.jobs = jobs;
        this.json = json;
    }

    @Transactional
    public SpendScenario save(ScenarioDefinition definition) {
        scope.requireProgramme();
        if (scenarios.count("name", definition.name()) > 0) {
            throw new ConflictException("name", "a scenario named '" + definition.name() + "' exists");
        }
        checkInstallations(definition);
        SpendScenario scenario = new SpendScenario();
        scenario.name = definition.name();
        scenario.definition = toJson(definition);
        scenario.createdAt = OffsetDateTime.now(ZoneOffset.UTC);
        scenario.createdBy = currentUser.name();
        scenarios.persist(scenario);
        audit.record("SPEND_SCENARIO_SAVED", "spend_scenario", scenario.name, null, definition);
        return scenario;
    }

    /** Changes a saved scenario; runs made before keep the results they computed. */
    @Transactional
    public SpendScenario update(long id, ScenarioDefinition definition) {
        scope.requireProgramme();
        SpendScenario scenario = scenarios.findByIdOptional(id, jakarta.persistence.LockModeType.PESSIMISTIC_WRITE)
                .orElseThrow(() -> new EntityMissingException(null, "spend scenario", id));
        if (scenarios.count("name = ?1 and id <> ?2", definition.name(), id) > 0) {
            throw new ConflictException("name", "a scenario named '" + definition.name() + "' exists");
        }
        checkInstallations(definition);
        ScenarioDefinition before = fromJson(scenario.definition);
        scenario.name = definition.name();
        scenario.definition = toJson(definition);
        audit.record("SPEND_SCENARIO_CHANGED", "spend_scenario", scenario.name, before, definition);
        return scenario;
    }

    /** The newest runs first (at most {@code limit}), of one scenario or of all. */
    public List<SpendRun> runs(Long scenarioId, int limit) {
        scope.requireProgramme();
        return QuarkusTransaction.requiringNew().call(() -> (scenarioId == null
                ? runs.findAll(io.quarkus.panache.common.Sort.descending("id"))
                : runs.find("scenarioId", io.quarkus.panache.common.Sort.descending("id"), scenarioId)).page(0, limit).list());
    }

    private void checkInstallations(ScenarioDefinition definition) {
        List<ScenarioDefinition.Installation> installs = definition.installations() == null ? List.of() : definition.installations();
        for (int i = 0; i < installs.size(); i++) {
            ScenarioDefinition.Installation inst = installs.get(i);
            models.require("installations[" + i + "].modelCode", inst.modelCode());
            Location depot = locations.require("installations[" + i + "].depotCode", inst.depotCode());
            if (depot.kind != LocationKind.DEPOT) {
                throw new BusinessRuleException("installations[" + i + "].depotCode", "'" + inst.depotCode() + "' is not a depot");
            }
            if (inst.year() > definition.horizonYears()) {
                throw new BusinessRuleException("installations[" + i + "].year", "is after the horizon of "
                        + definition.horizonYears() + " years");
            }
        }
    }

    @Transactional
    public SpendScenario scenario(long id) {
        scope.requireProgramme();
        return scenarios.findByIdOptional(id).orElseThrow(() -> new EntityMissingException(null, "spend scenario", id));
    }

    @Transactional
    public List<SpendScenario> scenarios() {
        scope.requireProgramme();
        return scenarios.listAll(io.quarkus.panache.common.Sort.by("id"));
    }

    /** Starts a run in the background; poll {@link #run(long)} for its phase and results. */
    public SpendRun start(long scenarioId) {
        scope.requireProgramme();
        SpendScenario scenario = QuarkusTransaction.requiringNew().call(() -> scenarios.findByIdOptional(scenarioId)
                .orElseThrow(() -> new EntityMissingException(null, "spend scenario", scenarioId)));
        ScenarioDefinition definition = fromJson(scenario.definition);
        if (forecastRuns.latestFinished().isEmpty()) {
            throw new org.depotcast.common.NoForecastYetException();
        }
        FinancialYears years = financialYears.current();
        long jobId = jobs.create(JobKind.SPEND_RUN);
        SpendRun run = QuarkusTransaction.requiringNew().call(() -> {
            SpendRun r = new SpendRun();
            r.jobId = jobId;
            r.scenarioId = scenarioId;
            r.status = SpendRun.Status.RUNNING;
            r.phase = "queued";
            r.startedAt = OffsetDateTime.now(ZoneOffset.UTC);
            r.draws = definition.drawsOrDefault();
            r.seed = definition.seedOrDefault();
            runs.persist(r);
            return r;
        });
        // The caller's programme-wide view was checked above; the job runs as the system for it.
        jobs.launch(jobId, progress -> execute(run.id, scenario.name, definition, years, progress));
        return run;
    }

    /** A failed or abandoned job fails its run, with the job's safe message. */
    void onJobFailed(@jakarta.enterprise.event.Observes JobFailed failed) {
        QuarkusTransaction.joiningExisting().run(() -> runs.update(
                "status = ?1, finishedAt = ?2, message = ?3, phase = ?4 where jobId = ?5 and status = ?6",
                SpendRun.Status.FAILED, OffsetDateTime.now(ZoneOffset.UTC), failed.message(), "failed", failed.jobId(),
                SpendRun.Status.RUNNING));
    }

    /** Runs to the end in the caller's thread (tests, benchmarks). */
    public SpendRun runNow(long scenarioId) {
        SpendRun run = start(scenarioId);
        long deadline = System.currentTimeMillis() + 600_000;
        while (System.currentTimeMillis() < deadline) {
            SpendRun current = run(run.id);
            if (current.status != SpendRun.Status.RUNNING) {
                return current;
            }
            try {
                Thread.sleep(100);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                break;
            }
        }
        return run(run.id);
    }

    public SpendRun run(long id) {
        scope.requireProgramme();
        return QuarkusTransaction.requiringNew().call(() -> runs.findByIdOptional(id)
                .orElseThrow(() -> new EntityMissingException(null, "spend run", id)));
    }

    public SpendResults results(long id) {
        scope.requireProgramme();
        SpendRun run = run(id);
        if (run.status != SpendRun.Status.DONE) {
            throw new BusinessRuleException("id", "spend run " + id + " is " + run.status + ": " + (run.message == null ? run.phase : run.message));
        }
        try {
            return json.readValue(run.results, SpendResults.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored results of run " + id + " cannot be read", e);
        }
    }

    private String execute(long runId, String name, ScenarioDefinition definition, FinancialYears financialYears,
                           JobProgress progress) {
        phase(runId, progress, "reading the fleet");
        LocalDate today = LocalDate.now(ZoneOffset.UTC);
        FleetSnapshot snapshot = fleet.load(today, 24);
        List<FinancialYears.Period> periods = financialYears.projection(snapshot.historyEnd(), definition.horizonYears());
        Map<ComponentFamily, FleetModelResponse> fits = new EnumMap<>(ComponentFamily.class);
        for (ComponentFamily family : ComponentFamily.values()) {
            try {
                fits.put(family, forecasts.fleetModel(family.name()));
            } catch (EntityMissingException none) {
                // A family with no stored model contributes no breakdown demand.
            }
        }
        Map<Long, Part> partsById = new HashMap<>();
        parts.all().forEach(p -> partsById.put(p.id, p));
        String currency = checkCurrency(definition, partsById);
        SpendLineBuilder builder = new SpendLineBuilder(fits, partsById, definition, periods);
        Map<Long, String> depotCodes = new HashMap<>();
        locations.all().forEach(l -> depotCodes.put(l.id, l.code));
        builder.addFleet(snapshot, depotCodes);
        for (ScenarioDefinition.Installation inst : definition.installations() == null
                ? List.<ScenarioDefinition.Installation>of() : definition.installations()) {
            PumpModel model = QuarkusTransaction.requiringNew().call(() -> {
                PumpModel m = models.require("modelCode", inst.modelCode());
                m.bom.forEach(l -> l.part.family.name());
                return m;
            });
            builder.addInstallation(inst, model);
        }
        String central = locations.ofKind(LocationKind.CENTRAL_STORE).get(0).code;
        for (StockPolicy p : planning.programmePolicies(definition.serviceLevel())) {
            Part part = parts.require("partNumber", p.partNumber());
            builder.addTopUp(central, part.id, Math.max(0, Math.ceil(p.orderUpTo() - p.position())));
        }
        SpendLine[] lines = builder.lines();
        phase(runId, progress, "simulating " + definition.drawsOrDefault() + " draws over " + lines.length + " lines");
        SpendDraws draws = SpendSimulation.run(lines, periods.size(), builder.familyNames.size(),
                builder.partNumbers.size(), builder.depotCodes.size(), builder.groupLogSd, builder.groupDispersion,
                definition.drawsOrDefault(), definition.seedOrDefault());
        phase(runId, progress, "summarising");
        SpendResults results = summarise(name, currency, definition, financialYears, periods, builder, draws);
        String stored = toJson(results);
        QuarkusTransaction.requiringNew().run(() -> {
            SpendRun run = runs.findById(runId);
            run.results = stored;
            run.status = SpendRun.Status.DONE;
            run.phase = "done";
            run.finishedAt = OffsetDateTime.now(ZoneOffset.UTC);
        });
        return "Spend run " + runId + ": " + periods.size() + " periods, " + lines.length + " lines.";
    }

    /** Every part in one catalogue currency; the scenario converts it with its own rate. */
    private static String checkCurrency(ScenarioDefinition definition, Map<Long, Part> partsById) {
        String catalogue = partsById.values().stream().map(p -> p.currency).findFirst().orElse("USD");
        for (Part p : partsById.values()) {
            if (!p.currency.equals(catalogue)) {
                throw new BusinessRuleException("exchangeRate", "part " + p.partNumber + " is priced in " + p.currency
                        + ", others in " + catalogue + ": one catalogue currency is needed");
            }
        }
        return definition.currency() == null ? catalogue : definition.currency();
    }

    private static SpendResults summarise(String name, String currency, ScenarioDefinition definition,
                                          FinancialYears financialYears, List<FinancialYears.Period> periods,
                                          SpendLineBuilder builder, SpendDraws draws) {
        List<SpendResults.Year> years = new ArrayList<>();
        for (int y = 0; y < draws.years(); y++) {
            Map<String, SpendSimulation.Summary> families = new LinkedHashMap<>();
            for (int g = 0; g < draws.groups(); g++) {
                SpendSimulation.Summary s = SpendSimulation.Summary.of(draws.group(y, g));
                if (s.mean() > 0) {
                    families.put(builder.familyNames.get(g), s);
                }
            }
            Map<String, SpendSimulation.Summary> partSummaries = new LinkedHashMap<>();
            for (int p = 0; p < draws.parts(); p++) {
                partSummaries.put(builder.partNumbers.get(p), SpendSimulation.Summary.of(draws.part(y, p)));
            }
            Map<String, SpendSimulation.Summary> depots = new LinkedHashMap<>();
            for (int d = 0; d < draws.depots(); d++) {
                depots.put(builder.depotCodes.get(d), SpendSimulation.Summary.of(draws.depot(y, d)));
            }
            double[] total = draws.total(y);
            double[] half = java.util.Arrays.copyOf(total, total.length / 2);
            SpendSimulation.Summary all = SpendSimulation.Summary.of(total);
            SpendSimulation.Summary first = SpendSimulation.Summary.of(half);
            FinancialYears.Period period = periods.get(y);
            years.add(new SpendResults.Year(financialYears.startOfYearContaining(period.startsOn()).getYear(),
                    period.label(), period.months(), period.startsOn(), period.endsOn(), period.partial(), all, families,
                    partSummaries, depots, new SpendResults.Stability(half.length, first.p10(), first.p90(), all.p10(), all.p90())));
        }
        List<String> notes = new ArrayList<>();
        notes.add("Years are the programme's financial years, starting in "
                + java.time.Month.of(financialYears.startMonth()).getDisplayName(java.time.format.TextStyle.FULL, java.util.Locale.ENGLISH)
                + (periods.get(0).partial() ? "; the first period is the months left in the year in progress (" + periods.get(0).months()
                + "), then " + definition.horizonYears() + " whole years." : "."));
        notes.add("The first period includes the stock needed now to bring the programme to its policy levels.");
        notes.add("Intervals include the sampling uncertainty of each family's fitted rate (lognormal, σ = its "
                + "intercept's standard error) and overdispersion where the fit found it.");
        return new SpendResults(name, currency, definition.drawsOrDefault(), definition.seedOrDefault(),
                financialYears.startMonth(), years, notes);
    }

    private void phase(long runId, JobProgress progress, String phase) {
        progress.phase(phase);
        QuarkusTransaction.requiringNew().run(() -> runs.findById(runId).phase = phase);
    }

    private String toJson(Object value) {
        try {
            return json.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    ScenarioDefinition fromJson(String text) {
        try {
            return json.readValue(text, ScenarioDefinition.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored scenario cannot be read", e);
        }
    }
}
