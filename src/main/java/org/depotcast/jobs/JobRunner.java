package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.inject.Inject;
import org.depotcast.access.CurrentUser;
import org.eclipse.microprofile.context.ManagedExecutor;
import io.smallrye.context.api.ManagedExecutorConfig;
import org.eclipse.microprofile.context.ThreadContext;

import java.time.OffsetDateTime;
import java.time.ZoneOffset;

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

    @Inject
    @ManagedExecutorConfig(propagated = {}, cleared = ThreadContext.ALL_REMAINING)
    ManagedExecutor executor;

    JobRunner(JobRepository jobs, JobWorker worker, JobInstance instance, CurrentUser currentUser) {
        this.jobs = jobs;
        this.worker = worker;
        this.instance = instance;
        this.currentUser = currentUser;
    }

    /** Records a running job of {@code kind} owned by this instance, in its own transaction; answers its id. */
    public long create(JobKind kind) {
        String startedBy = currentUser.name();
        return QuarkusTransaction.requiringNew().call(() -> {
            OffsetDateTime now = OffsetDateTime.now(ZoneOffset.UTC);
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
        });
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

    /** Whether a job of this kind is running on any instance. */
    public boolean anyRunning(JobKind kind) {
        return QuarkusTransaction.requiringNew().call(() -> jobs.anyRunning(kind));
    }

    private JobKind kindOf(long jobId) {
        return QuarkusTransaction.requiringNew().call(() -> jobs.findById(jobId).kind);
    }
}
