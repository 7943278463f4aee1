package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.inject.Inject;
import jakarta.persistence.LockTimeoutException;
import jakarta.persistence.PessimisticLockException;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.ConflictException;
import org.depotcast.common.ExclusiveLock;
import org.eclipse.microprofile.context.ManagedExecutor;
import io.smallrye.context.api.ManagedExecutorConfig;
import org.eclipse.microprofile.context.ThreadContext;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.function.LongFunction;

/**
 * Starts background jobs. {@link #create} records the job (so the caller can link its own rows to it before any
 * work starts), {@link #launch} runs it on the managed executor, {@link #runHere} in the caller's thread (tests,
 * benchmarks). Nothing of the caller's request is carried to the worker thread: the work runs as the system, in a
 * request context of its own.
 */
@ApplicationScoped
public class JobRunner {
    private final JobRepository jobs;
    private final JobWorker worker;
    private final JobInstance instance;
    private final CurrentUser currentUser;
    private final ExclusiveLock startLock;
    private final Clock clock;

    @Inject
    @ManagedExecutorConfig(propagated = {}, cleared = ThreadContext.ALL_REMAINING)
    ManagedExecutor executor;

    JobRunner(JobRepository jobs, JobWorker worker, JobInstance instance, CurrentUser currentUser, ExclusiveLock startLock,
              Clock clock) {
        this.jobs = jobs;
        this.worker = worker;
        this.instance = instance;
        this.currentUser = currentUser;
        this.startLock = startLock;
        this.clock = clock;
    }

    /** Records a running job of {@code kind} owned by this instance, in its own transaction; answers its id. */
    public long create(JobKind kind) {
        String startedBy = currentUser.name();
        return QuarkusTransaction.requiringNew().call(() -> persist(kind, startedBy, OffsetDateTime.now(clock)));
    }

    /**
     * Records a running job of {@code kind} unless one of it, or of a kind taking turns with it ({@link
     * JobKind#takingTurns()}), is running on any instance (409), and in the same transaction
     * lets the caller insert its own rows linked to the new job's id ({@code linkedRows} answers what the caller
     * needs back). The check and the insert happen under the kind's row lock in the database, so two instances (or
     * two threads) starting at once cannot both pass the check.
     */
    public <T> T createExclusive(JobKind kind, LongFunction<T> linkedRows) {
        String startedBy = currentUser.name();
        try {
            return QuarkusTransaction.requiringNew().call(() -> {
                OffsetDateTime now = OffsetDateTime.now(clock);
                startLock.take(kind.startLock(), now);
                java.util.Optional<JobKind> running = jobs.runningOf(kind.takingTurns());
                if (running.isPresent()) {
                    throw new ConflictException(null, kind.busyWords(running.get()));
                }
                return linkedRows.apply(persist(kind, startedBy, now));
            });
        } catch (PessimisticLockException | LockTimeoutException waitedTooLong) {
            throw new ConflictException(null, "another " + kind.words() + " is being started; try again shortly");
        }
    }

    /**
     * Who started the job: in the transaction that created it (rows linked by {@link #createExclusive}) or any later
     * one, so work done for a job (an accuracy check's forecast run) is credited to the person who asked for it.
     */
    public String startedBy(long jobId) {
        return QuarkusTransaction.joiningExisting().call(() -> jobs.findById(jobId).startedBy);
    }

    private long persist(JobKind kind, String startedBy, OffsetDateTime now) {
        BackgroundJob job = new BackgroundJob();
        job.kind = kind;
        job.state = JobState.RUNNING;
        job.phase = "queued";
        job.startedBy = JobWorker.clip(startedBy, 80);
        job.startedAt = now;
        job.ownerInstance = instance.id();
        job.heartbeatAt = now;
        jobs.persist(job);
        return job.id;
    }

    /** Runs the job's work in the background; answers at once. */
    public void launch(long jobId, JobWork work) {
        JobKind kind = kindOf(jobId);
        executor.runAsync(() -> worker.execute(jobId, kind, work));
    }

    /** Runs the job's work to its end in the caller's thread. */
    public JobView runHere(long jobId, JobWork work) {
        worker.execute(jobId, kindOf(jobId), work);
        return QuarkusTransaction.requiringNew().call(() -> jobs.findById(jobId).view());
    }

    private JobKind kindOf(long jobId) {
        return QuarkusTransaction.requiringNew().call(() -> jobs.findById(jobId).kind);
    }
}
