package org.depotcast.forecasting;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.scheduler.Scheduled;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.common.ConflictException;
import org.eclipse.microprofile.config.inject.ConfigProperty;
import org.eclipse.microprofile.context.ManagedExecutor;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Collectors;

/**
 * Recomputes every forecast: on demand (in the background, with progress on the run row) and nightly. A run that
 * fails is marked FAILED and leaves earlier runs as they were; readers always see the latest finished run.
 */
@ApplicationScoped
public class ForecastRunService {
    /** Trigger of a run as of a past origin: kept for checking accuracy, never the run planning uses. */
    public static final String AS_OF_TRIGGER = "as-of";
    private static final int PROGRESS_EVERY = 500;

    private final ForecastModelFiles modelFiles;
    private final FleetSnapshotLoader loader;
    private final ForecastRepository repository;
    private final ManagedExecutor executor;
    private final SystemWork system;
    private final AccessScope scope;
    private final int historyMonths;
    private final int horizonMonths;
    private final AtomicBoolean running = new AtomicBoolean();

    ForecastRunService(ForecastModelFiles modelFiles, FleetSnapshotLoader loader, ForecastRepository repository,
                       ManagedExecutor executor, SystemWork system, AccessScope scope,
                       @ConfigProperty(name = "depotcast.forecast.history-months") int historyMonths,
                       @ConfigProperty(name = "depotcast.forecast.horizon-months") int horizonMonths) {
        if (historyMonths < 24) {
            throw new IllegalStateException("depotcast.forecast.history-months must be at least 24, was " + historyMonths);
        }
        if (horizonMonths < 1 || horizonMonths > 60) {
            throw new IllegalStateException("depotcast.forecast.horizon-months must be 1..60, was " + horizonMonths);
        }
        this.modelFiles = modelFiles;
        this.loader = loader;
        this.repository = repository;
        this.executor = executor;
        this.system = system;
        this.scope = scope;
        this.historyMonths = historyMonths;
        this.horizonMonths = horizonMonths;
    }

    @Scheduled(cron = "{depotcast.forecast.schedule}", concurrentExecution = Scheduled.ConcurrentExecution.SKIP)
    void nightly() {
        if (running.compareAndSet(false, true)) {
            LocalDate origin = currentOrigin();
            system.run("forecast-schedule", () -> execute(createRun("schedule", origin), origin));
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
        if (!running.compareAndSet(false, true)) {
            throw new ConflictException(null, "a forecast run is already in progress");
        }
        long runId = createRun(from.isBefore(current) ? AS_OF_TRIGGER : trigger, from);
        executor.runAsync(() -> system.run("forecast-run", () -> execute(runId, from)));
        return runId;
    }

    private static LocalDate currentOrigin() {
        return LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1);
    }

    /** Runs to the end in the caller's thread, with the forecast origin at the start of {@code today}'s month. */
    public ForecastRun runNow(String trigger, LocalDate today) {
        if (!running.compareAndSet(false, true)) {
            throw new ConflictException(null, "a forecast run is already in progress");
        }
        long runId = createRun(trigger, today.withDayOfMonth(1));
        system.run("forecast-run", () -> execute(runId, today));
        return QuarkusTransaction.requiringNew().call(() -> repository.run(runId).orElseThrow());
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

    private long createRun(String trigger, LocalDate origin) {
        return QuarkusTransaction.requiringNew().call(() -> {
            ForecastRun run = new ForecastRun();
            run.triggerKind = trigger;
            run.origin = origin;
            run.status = ForecastRun.Status.RUNNING;
            run.startedAt = OffsetDateTime.now(ZoneOffset.UTC);
            run.horizonMonths = horizonMonths;
            repository.getEntityManager().persist(run);
            return run.id;
        });
    }

    private void execute(long runId, LocalDate today) {
        long started = System.nanoTime();
        try {
            Map<ComponentFamily, ForecastModelDefinition> definitions = modelFiles.load();
            FleetSnapshot snapshot = loader.load(today, historyMonths);
            Log.infof("forecast run %d: %d pumps, %d consumption lines read in %d ms", runId, snapshot.pumps().size(),
                    snapshot.consumption().size(), (System.nanoTime() - started) / 1_000_000);
            // Families fit independently: one per core.
            Map<ComponentFamily, FleetModel> models = new EnumMap<>(ComponentFamily.class);
            Map<ComponentFamily, FleetModel> holdout = new EnumMap<>(ComponentFamily.class);
            Map<ComponentFamily, FleetModelFitter.Breakdowns> breakdowns = FleetModelFitter.Breakdowns.of(snapshot);
            definitions.values().parallelStream()
                    .map(d -> new FleetModel[]{FleetModelFitter.fit(d, snapshot, breakdowns.get(d.family()), 0),
                            FleetModelFitter.fit(d, snapshot, breakdowns.get(d.family()), 1)})
                    .toList().forEach(pair -> {
                        models.put(pair[0].family(), pair[0]);
                        holdout.put(pair[1].family(), pair[1]);
                    });
            DemandAssembler assembler = new DemandAssembler(snapshot, definitions, models, holdout, horizonMonths);
            int total = assembler.seriesCount();
            updateProgress(runId, 0, total, snapshot);
            List<PartForecastResult> results = assembler.assemble(done -> {
                if (done % PROGRESS_EVERY == 0) {
                    // Progress is read from the run row by a client polling GET /api/forecast/runs/{id}.
                    updateProgress(runId, done, total, snapshot);
                    Log.infof("forecast run %d: %d of %d series", runId, done, total);
                }
            });
            QuarkusTransaction.requiringNew().timeout(600).run(() -> store(runId, models, results));
            Log.infof("forecast run %d: %d series done in %d ms", runId, results.size(), (System.nanoTime() - started) / 1_000_000);
        } catch (RuntimeException e) {
            Log.error("forecast run " + runId + " failed", e);
            finish(runId, ForecastRun.Status.FAILED, e.getMessage());
        } finally {
            running.set(false);
        }
    }

    private void updateProgress(long runId, int done, int total, FleetSnapshot snapshot) {
        QuarkusTransaction.requiringNew().run(() -> {
            ForecastRun run = repository.run(runId).orElseThrow();
            run.seriesDone = done;
            run.seriesTotal = total;
            run.historyFrom = snapshot.historyStart();
            run.historyTo = snapshot.historyEnd().minusDays(1);
        });
    }

    private void finish(long runId, ForecastRun.Status status, String message) {
        QuarkusTransaction.requiringNew().run(() -> {
            ForecastRun run = repository.run(runId).orElseThrow();
            run.status = status;
            run.finishedAt = OffsetDateTime.now(ZoneOffset.UTC);
            run.message = message == null ? null : message.substring(0, Math.min(1000, message.length()));
        });
    }

    private void store(long runId, Map<ComponentFamily, FleetModel> models, List<PartForecastResult> results) {
        var em = repository.getEntityManager();
        for (FleetModel model : models.values()) {
            em.persist(ForecastRecords.fit(runId, model));
        }
        int written = 0;
        for (PartForecastResult result : results) {
            em.persist(ForecastRecords.forecast(runId, result));
            if (++written % 500 == 0) {
                em.flush();
                em.clear();
            }
        }
        ForecastRun run = em.find(ForecastRun.class, runId);
        run.seriesDone = results.size();
        run.seriesTotal = results.size();
        run.status = ForecastRun.Status.DONE;
        run.finishedAt = OffsetDateTime.now(ZoneOffset.UTC);
        run.message = results.stream().collect(Collectors.groupingBy(PartForecastResult::method, Collectors.counting()))
                .toString();
    }
}
