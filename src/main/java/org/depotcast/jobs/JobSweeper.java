package org.depotcast.jobs;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.runtime.StartupEvent;
import io.quarkus.scheduler.Scheduled;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Event;
import jakarta.enterprise.event.Observes;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Set;

/**
 * Keeps this instance's running jobs alive (a heartbeat on each job it is executing) and marks failed the running
 * jobs of any instance that has gone silent for longer than {@code depotcast.jobs.dead-after}: at start-up and
 * periodically. Two instances sweeping at once mark a job once (the update is conditional on the old heartbeat).
 */
@ApplicationScoped
public class JobSweeper {
    private final JobRepository jobs;
    private final JobWorker worker;
    private final JobInstance instance;
    private final Event<JobFailed> failed;
    private final Clock clock;

    JobSweeper(JobRepository jobs, JobWorker worker, JobInstance instance, Event<JobFailed> failed, Clock clock) {
        this.jobs = jobs;
        this.worker = worker;
        this.instance = instance;
        this.failed = failed;
        this.clock = clock;
    }

    void atStart(@Observes StartupEvent event) {
        sweep();
    }

    @Scheduled(every = "{depotcast.jobs.heartbeat-every}", concurrentExecution = Scheduled.ConcurrentExecution.SKIP)
    void heartbeat() {
        Set<Long> executing = worker.executing();
        if (executing.isEmpty()) {
            return;
        }
        QuarkusTransaction.requiringNew().run(() -> jobs.update("heartbeatAt = ?1 where id in ?2 and state = ?3",
                OffsetDateTime.now(clock), executing, JobState.RUNNING));
    }

    @Scheduled(every = "{depotcast.jobs.sweep-every}", concurrentExecution = Scheduled.ConcurrentExecution.SKIP)
    void periodicSweep() {
        sweep();
    }

    /** Marks failed every running job whose heartbeat is older than the limit; answers how many. */
    public int sweep() {
        OffsetDateTime limit = OffsetDateTime.now(clock).minus(instance.deadAfter());
        List<BackgroundJob> silent = QuarkusTransaction.requiringNew().call(() -> jobs.silentSince(limit));
        int marked = 0;
        for (BackgroundJob job : silent) {
            String message = "The " + job.kind.words() + " stopped: the service instance running it (" + job.ownerInstance
                    + ") has not answered since " + job.heartbeatAt.withNano(0) + "; start it again.";
            // The job and the feature's rows (observers join this transaction) fail together.
            boolean changed = QuarkusTransaction.requiringNew().call(() -> {
                int rows = jobs.update("state = ?1, phase = ?2, message = ?3, finishedAt = ?4 "
                                + "where id = ?5 and state = ?6 and heartbeatAt < ?7", JobState.FAILED,
                        JobState.FAILED.words(), message, OffsetDateTime.now(clock), job.id, JobState.RUNNING, limit);
                if (rows == 1) {
                    failed.fire(new JobFailed(job.id, job.kind, message));
                }
                return rows == 1;
            });
            if (changed) {
                Log.warnf("job %d (%s) of instance %s marked failed: no heartbeat since %s", job.id, job.kind,
                        job.ownerInstance, job.heartbeatAt);
                marked++;
            }
        }
        return marked;
    }
}
