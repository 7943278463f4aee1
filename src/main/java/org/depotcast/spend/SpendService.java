package org.depotcast.spend;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.NoForecastYetException;
import org.depotcast.core.spend.SpendDraws;
import org.depotcast.core.spend.SpendLine;
import org.depotcast.core.spend.SpendSimulation;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.jobs.JobFailed;
import org.depotcast.jobs.JobKind;
import org.depotcast.jobs.JobProgress;
import org.depotcast.jobs.JobRunner;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Map;

/**
 * Annual parts-spend projections: runs of saved scenarios in the background with their phase shown, as of an origin
 * (the current month's first day, or a past one), results kept per run. A failed run is marked FAILED and leaves
 * earlier runs' results untouched; the same scenario on the same data gives the same numbers (fixed seed).
 */
@ApplicationScoped
public class SpendService {
    private final Runs runs;
    private final SpendScenarioService scenarios;
    private final SpendLineService lineService;
    private final ForecastQueryService forecasts;
    private final AccessScope scope;
    private final JobRunner jobs;
    private final ObjectMapper json;
    private final FinancialYearService financialYears;

    @ApplicationScoped
    static class Runs implements PanacheRepository<SpendRun> {
    }

    private final Clock clock;

    SpendService(Runs runs, SpendScenarioService scenarios, SpendLineService lineService, ForecastQueryService forecasts,
                 AccessScope scope, JobRunner jobs, ObjectMapper json, FinancialYearService financialYears, Clock clock) {
        this.clock = clock;
        this.runs = runs;
        this.scenarios = scenarios;
        this.lineService = lineService;
        this.forecasts = forecasts;
        this.scope = scope;
        this.jobs = jobs;
        this.json = json;
        this.financialYears = financialYears;
    }

    /** The newest runs first (at most {@code limit}), of one scenario or of all. */
    public List<SpendRun> runs(Long scenarioId, int limit) {
        scope.requireProgramme();
        return QuarkusTransaction.requiringNew().call(() -> (scenarioId == null
                ? runs.findAll(io.quarkus.panache.common.Sort.descending("id"))
                : runs.find("scenarioId", io.quarkus.panache.common.Sort.descending("id"), scenarioId)).page(0, limit).list());
    }

    /**
     * Starts a run in the background; poll {@link #run(long)} for its phase and results. It reads one forecast run,
     * the newest finished one now, for its fleet models and its stock top-up alike (its notes name it).
     *
     * @param origin the projection's first day (its month's first day is used); null for the current month's. A
     *               future one is refused (400, field {@code origin}), as for a forecast run.
     */
    public SpendRun start(long scenarioId, LocalDate origin) {
        return start(scenarioId, origin, null);
    }

    /**
     * As {@link #start(long, LocalDate)}, reading forecast run {@code pinned} whichever has finished since (null: the
     * newest finished one now).
     */
    SpendRun start(long scenarioId, LocalDate origin, Long pinned) {
        scope.requireProgramme();
        LocalDate current = LocalDate.now(clock).withDayOfMonth(1);
        LocalDate from = origin == null ? current : origin.withDayOfMonth(1);
        if (from.isAfter(current)) {
            throw new InvalidInputException("origin", "must not be after the current month's first day " + current
                    + ", was " + origin);
        }
        SpendScenario scenario = scenarios.scenario(scenarioId);
        ScenarioDefinition definition = scenarios.fromJson(scenario.definition);
        // One forecast run for the whole spend run (fleet models and stock top-up): one finishing meanwhile is not read.
        long forecastRunId = pinned != null ? pinned
                : forecasts.latestRunId().orElseThrow(NoForecastYetException::new);
        FinancialYears years = financialYears.current();
        long jobId = jobs.create(JobKind.SPEND_RUN);
        SpendRun run = QuarkusTransaction.requiringNew().call(() -> {
            SpendRun r = new SpendRun();
            r.jobId = jobId;
            r.scenarioId = scenarioId;
            r.origin = from;
            r.status = SpendRun.Status.RUNNING;
            r.phase = "queued";
            r.startedAt = OffsetDateTime.now(clock);
            r.draws = definition.drawsOrDefault();
            r.seed = definition.seedOrDefault();
            runs.persist(r);
            return r;
        });
        // The caller's programme-wide view was checked above; the job runs as the system for it.
        jobs.launch(jobId, progress -> execute(run.id, scenario.name, definition, years, from, forecastRunId, progress));
        return run;
    }

    /** A failed or abandoned job fails its run, with the job's safe message. */
    void onJobFailed(@jakarta.enterprise.event.Observes JobFailed failed) {
        QuarkusTransaction.joiningExisting().run(() -> runs.update(
                "status = ?1, finishedAt = ?2, message = ?3, phase = ?4 where jobId = ?5 and status = ?6",
                SpendRun.Status.FAILED, OffsetDateTime.now(clock), failed.message(), "failed", failed.jobId(),
                SpendRun.Status.RUNNING));
    }

    /** Runs to the end in the caller's thread (tests, benchmarks), as of the current month. */
    public SpendRun runNow(long scenarioId) {
        SpendRun run = start(scenarioId, null);
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
                           LocalDate origin, long forecastRunId, JobProgress progress) {
        phase(runId, progress, "reading the fleet as of " + origin + " and forecast run " + forecastRunId);
        Map<Long, PartSummary> partsById = lineService.partsById();
        String currency = SpendLineService.currency(definition, partsById);
        SpendLineBuilder builder = lineService.build(definition, financialYears, origin, partsById, forecastRunId);
        List<FinancialYears.Period> periods = financialYears.projection(origin, definition.horizonYears());
        SpendLine[] lines = builder.lines();
        phase(runId, progress, "simulating " + definition.drawsOrDefault() + " draws over " + lines.length + " lines");
        SpendDraws draws = SpendSimulation.run(lines, periods.size(), builder.familyNames.size(),
                builder.partNumbers.size(), builder.depotCodes.size(), builder.groupLogSd, builder.groupDispersion,
                definition.drawsOrDefault(), definition.seedOrDefault());
        phase(runId, progress, "summarising");
        SpendResults results = SpendResults.summarise(name, currency, definition, financialYears, periods, builder, draws,
                forecastRunId);
        String stored = toJson(results);
        // Done in the transaction that ends its job: a poll showing it done finds the job ended too.
        progress.finishWith(() -> {
            SpendRun run = runs.findById(runId);
            run.results = stored;
            run.status = SpendRun.Status.DONE;
            run.phase = "done";
            run.finishedAt = OffsetDateTime.now(clock);
        });
        return "Spend run " + runId + ": " + periods.size() + " periods from " + origin + ", " + lines.length + " lines.";
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
}
