package org.depotcast.forecasting;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.scheduler.Scheduled;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.depotcast.access.AccessScope;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.common.ConflictException;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.jobs.JobFailed;
import org.depotcast.jobs.JobKind;
import org.depotcast.jobs.JobProgress;
import org.depotcast.jobs.JobRunner;
import org.depotcast.jobs.ScheduleClaims;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Recomputes every forecast: on demand and nightly, as a background job (jobs/) with progress on the job and on the
 * run row. One run at a time across instances; the nightly run happens once a day across instances (a schedule
 * claim). A run that fails is marked FAILED and leaves earlier runs as they were; readers see the latest finished run.
 */
@ApplicationScoped
public class ForecastRunService {
    /** Trigger of a run as of a past origin: kept for checking accuracy, never the run planning uses. */
    public static final String AS_OF_TRIGGER = "as-of";
    static final String NIGHTLY_SCHEDULE = "forecast-nightly";
    private static final int PROGRESS_EVERY = 500;

    private final ForecastModelFiles modelFiles;
    private final FleetSnapshotLoader loader;
    private final ForecastRepository repository;
    private final JobRunner jobs;
    private final ScheduleClaims claims;
    private final SystemWork system;
    private final AccessScope scope;
    private final int historyMonths;
    private final int horizonMonths;
    private final Clock clock;
    private final PastOrigins pastOrigins;

    ForecastRunService(ForecastModelFiles modelFiles, FleetSnapshotLoader loader, ForecastRepository repository,
                       JobRunner jobs, ScheduleClaims claims, SystemWork system, AccessScope scope,
                       @ConfigProperty(name = "depotcast.forecast.history-months") int historyMonths,
                       @ConfigProperty(name = "depotcast.forecast.horizon-months") int horizonMonths, Clock clock,
                       PastOrigins pastOrigins) {
        this.pastOrigins = pastOrigins;
        if (historyMonths < 24) {
            throw new IllegalStateException("depotcast.forecast.history-months must be at least 24, was " + historyMonths);
        }
        if (horizonMonths < 1 || horizonMonths > 60) {
            throw new IllegalStateException("depotcast.forecast.horizon-months must be 1..60, was " + horizonMonths);
        }
        this.modelFiles = modelFiles;
        this.loader = loader;
        this.repository = repository;
        this.jobs = jobs;
        this.claims = claims;
        this.system = system;
        this.scope = scope;
        this.historyMonths = historyMonths;
        this.horizonMonths = horizonMonths;
        this.clock = clock;
    }

    /** Every instance fires the schedule; only the one that claims today's run starts it. */
    @Scheduled(cron = "{depotcast.forecast.schedule}", concurrentExecution = Scheduled.ConcurrentExecution.SKIP)
    void nightly() {
        if (claims.claim(NIGHTLY_SCHEDULE, LocalDate.now(clock))) {
            system.run("forecast-schedule", () -> {
                try {
                    startExclusive("schedule", currentOrigin());
                } catch (ConflictException running) {
                    Log.warnf("nightly forecast run skipped: %s", running.getMessage());
                }
            });
        }
    }

    /**
     * Starts a run in the background and returns its id at once; 409 while another run is going. A run recomputes
     * the whole programme, so it is for the lead, admins and officers of the central store (403 otherwise).
     *
     * @param origin the forecast origin (its month's first day is used); null for the first day of the current month.
     *               A past origin makes an {@link #AS_OF_TRIGGER} run that uses nothing dated on or after it and that
     *               planning never reads; a future one is refused (400, field {@code origin}).
     */
    public long start(String trigger, LocalDate origin) {
        scope.requireProgramme();
        LocalDate current = currentOrigin();
        LocalDate from = origin == null ? current : origin.withDayOfMonth(1);
        if (from.isAfter(current)) {
            throw new org.depotcast.common.InvalidInputException("origin",
                    "must not be after the current month's first day " + current + ", was " + origin);
        }
        if (origin != null) {
            pastOrigins.requireHistoryBefore(from, origin);
        }
        return startExclusive(from.isBefore(current) ? AS_OF_TRIGGER : trigger, from);
    }

    private long startExclusive(String trigger, LocalDate origin) {
        RunIds ids = createExclusive(trigger, origin);
        jobs.launch(ids.jobId(), progress -> execute(ids.runId(), origin, progress));
        return ids.runId();
    }

    private record RunIds(long jobId, long runId) {
    }

    /** One run at a time across instances: the job runner checks and inserts under a database lock (409 otherwise). */
    private RunIds createExclusive(String trigger, LocalDate origin) {
        return jobs.createExclusive(JobKind.FORECAST_RUN, jobId -> new RunIds(jobId, createRun(trigger, origin, jobId)));
    }

    /** The first day of the current month by the service's clock: the origin of a run made now. */
    public LocalDate currentOrigin() {
        return LocalDate.now(clock).withDayOfMonth(1);
    }

    /** Runs to the end in the caller's thread, with the forecast origin at the start of {@code today}'s month. */
    public ForecastRun runNow(String trigger, LocalDate today) {
        RunIds ids = createExclusive(trigger, today.withDayOfMonth(1));
        jobs.runHere(ids.jobId(), progress -> execute(ids.runId(), today, progress));
        return run(ids.runId());
    }

    /**
     * Inside another job (the accuracy report): an {@link #AS_OF_TRIGGER} run as of {@code origin}, computed in the
     * caller's thread, linked to the caller's job and done when it ends; answers its id. A failure fails that job.
     */
    public long runAsOfWithin(JobProgress progress, LocalDate origin) {
        long runId = QuarkusTransaction.requiringNew().call(() -> createRun(AS_OF_TRIGGER, origin.withDayOfMonth(1),
                progress.jobId()));
        execute(runId, origin.withDayOfMonth(1), progress);
        return runId;
    }

    /** A failed or abandoned job fails the run it was computing, with the job's safe message. */
    void onJobFailed(@Observes JobFailed failed) {
        QuarkusTransaction.joiningExisting().run(() -> repository.getEntityManager().createQuery(
                        "update ForecastRun r set r.status = :failed, r.finishedAt = :now, r.message = :message "
                                + "where r.jobId = :job and r.status = :running")
                .setParameter("failed", ForecastRun.Status.FAILED).setParameter("now", OffsetDateTime.now(clock))
                .setParameter("message", failed.message()).setParameter("job", failed.jobId())
                .setParameter("running", ForecastRun.Status.RUNNING).executeUpdate());
    }

    public java.util.Optional<ForecastRun> latestFinished() {
        return QuarkusTransaction.requiringNew().call(repository::latestFinishedRun);
    }

    /** Newest first; {@code status} null for every state; {@code planningOnly} leaves out as-of runs. */
    public java.util.List<ForecastRun> recent(ForecastRun.Status status, boolean planningOnly, int limit) {
        return QuarkusTransaction.requiringNew().call(() -> repository.recentRuns(status, planningOnly, limit));
    }

    public ForecastRun run(long id) {
        return QuarkusTransaction.requiringNew().call(() -> repository.run(id)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "forecast run", id)));
    }

    /** In the caller's transaction. */
    private long createRun(String trigger, LocalDate origin, long jobId) {
        ForecastRun run = new ForecastRun();
        run.triggerKind = trigger;
        run.origin = origin;
        run.status = ForecastRun.Status.RUNNING;
        run.startedAt = OffsetDateTime.now(clock);
        run.horizonMonths = horizonMonths;
        run.jobId = jobId;
        run.startedBy = jobs.startedBy(jobId);
        repository.getEntityManager().persist(run);
        return run.id;
    }

    /** Computes and stores the run; answers the job's summary. A failure propagates to the job runner. */
    private String execute(long runId, LocalDate today, JobProgress progress) {
        long started = System.nanoTime();
        progress.phase("reading the fleet and the repair records");
        Map<ComponentFamily, ForecastModelDefinition> definitions = modelFiles.load();
        FleetSnapshot snapshot = loader.load(today, historyMonths);
        Log.infof("forecast run %d: %d pumps, %d consumption lines read in %d ms", runId, snapshot.pumps().size(),
                snapshot.consumption().size(), (System.nanoTime() - started) / 1_000_000);
        progress.phase("fitting the fleet models");
        // Families fit independently, one per core; each family's rows serve its full and its holdout fit.
        FleetModelFitter.Fits fits = FleetModelFitter.fitBoth(definitions, snapshot, 1);
        Map<ComponentFamily, FleetRateModel> models = fits.full();
        Map<ComponentFamily, FleetRateModel> holdout = fits.holdout();
        DemandAssembler assembler = new DemandAssembler(snapshot, definitions, models, holdout, horizonMonths);
        int total = assembler.seriesCount();
        progress.phase("forecasting each part at each location");
        updateProgress(runId, 0, total, snapshot, progress);
        List<PartForecastResult> results = assembler.assemble(done -> {
            if (done % PROGRESS_EVERY == 0) {
                // Read by clients polling GET /api/jobs/{id} or GET /api/forecast/runs/{id}, on any instance.
                updateProgress(runId, done, total, snapshot, progress);
            }
        });
        progress.phase("storing the forecasts");
        QuarkusTransaction.requiringNew().timeout(600).run(() -> store(runId, models, results));
        progress.finishWith(() -> markDone(runId, results));
        Log.infof("forecast run %d: %d series done in %d ms", runId, results.size(), (System.nanoTime() - started) / 1_000_000);
        return "Forecast run " + runId + ": " + results.size() + " series as of " + today.withDayOfMonth(1) + ".";
    }

    private void updateProgress(long runId, int done, int total, FleetSnapshot snapshot, JobProgress progress) {
        progress.progress(done, total);
        QuarkusTransaction.requiringNew().run(() -> {
            ForecastRun run = repository.run(runId).orElseThrow();
            run.seriesDone = done;
            run.seriesTotal = total;
            run.historyFrom = snapshot.historyStart();
            run.historyTo = snapshot.historyEnd().minusDays(1);
        });
    }

    private void store(long runId, Map<ComponentFamily, FleetRateModel> models, List<PartForecastResult> results) {
        var em = repository.getEntityManager();
        models.forEach((family, model) -> em.persist(FleetModelFitRecord.of(runId, family, model)));
        int written = 0;
        for (PartForecastResult result : results) {
            em.persist(ForecastRecords.forecast(runId, result));
            if (++written % 500 == 0) {
                em.flush();
                em.clear();
            }
        }
    }

    /** In the transaction that ends the run's job (JobProgress.finishWith): shown done, its job has ended. */
    private void markDone(long runId, List<PartForecastResult> results) {
        ForecastRun run = repository.getEntityManager().find(ForecastRun.class, runId);
        run.seriesDone = results.size();
        run.seriesTotal = results.size();
        run.status = ForecastRun.Status.DONE;
        run.finishedAt = OffsetDateTime.now(clock);
        run.message = results.stream().collect(Collectors.groupingBy(PartForecastResult::method, Collectors.counting()))
                .toString();
    }
}
