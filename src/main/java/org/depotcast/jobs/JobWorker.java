package org.depotcast.jobs;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.context.control.ActivateRequestContext;
import jakarta.enterprise.event.Event;
import org.depotcast.access.SystemWork;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.NoForecastYetException;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Runs one job's work to its end on the current thread, inside a request context of its own (a background thread has
 * none), and records how it ended. A failure is logged once with its stack trace; the client reads only a safe
 * message. The jobs executing here are the ones this instance keeps alive with heartbeats.
 */
@ApplicationScoped
class JobWorker {
    private static final int PHASE_LENGTH = 200;
    private static final int MESSAGE_LENGTH = 1000;
    private final JobRepository jobs;
    private final JobInstance instance;
    private final SystemWork system;
    private final Event<JobFailed> failed;
    private final Clock clock;
    private final Set<Long> executing = ConcurrentHashMap.newKeySet();

    JobWorker(JobRepository jobs, JobInstance instance, SystemWork system, Event<JobFailed> failed, Clock clock) {
        this.jobs = jobs;
        this.instance = instance;
        this.system = system;
        this.failed = failed;
        this.clock = clock;
    }

    Set<Long> executing() {
        return Set.copyOf(executing);
    }

    @ActivateRequestContext
    void execute(long jobId, JobKind kind, JobWork work) {
        executing.add(jobId);
        List<Runnable> lastWrites = new ArrayList<>();
        try {
            String summary = system.call(kind.name().toLowerCase(java.util.Locale.ROOT),
                    () -> work.run(progressOf(jobId, lastWrites)));
            end(jobId, JobState.DONE, summary, () -> lastWrites.forEach(Runnable::run));
        } catch (RuntimeException | Error e) {
            Log.errorf(e, "job %d (%s) failed on instance %s", jobId, kind, instance.id());
            String message = safeMessage(kind, jobId, e);
            end(jobId, JobState.FAILED, message, () -> failed.fire(new JobFailed(jobId, kind, message)));
        } finally {
            executing.remove(jobId);
        }
    }

    /**
     * The client's view of a failure. Domain exceptions carry messages written for clients (the problem answers show
     * them too); anything else is a fault whose text may name classes, queries or data, so it stays in the log.
     */
    static String safeMessage(JobKind kind, long jobId, Throwable e) {
        if (e instanceof BusinessRuleException || e instanceof InvalidInputException || e instanceof ConflictException
                || e instanceof EntityMissingException || e instanceof NoForecastYetException) {
            return clip("The " + kind.words() + " stopped: " + e.getMessage(), MESSAGE_LENGTH);
        }
        return "The " + kind.words() + " failed on the server; the service log has the detail under job " + jobId + ".";
    }

    private JobProgress progressOf(long jobId, List<Runnable> lastWrites) {
        return new JobProgress() {
            @Override
            public long jobId() {
                return jobId;
            }

            @Override
            public void phase(String words) {
                update(jobId, job -> job.phase = clip(words, PHASE_LENGTH));
            }

            @Override
            public void progress(int done, int total) {
                update(jobId, job -> {
                    job.progressDone = done;
                    job.progressTotal = total;
                });
            }

            @Override
            public void finishWith(Runnable lastWrite) {
                lastWrites.add(lastWrite);
            }
        };
    }

    private void update(long jobId, java.util.function.Consumer<BackgroundJob> change) {
        QuarkusTransaction.requiringNew().run(() -> {
            BackgroundJob job = jobs.findById(jobId);
            change.accept(job);
            job.heartbeatAt = OffsetDateTime.now(clock);
        });
    }

    /**
     * Only a running job ends here: one already marked failed by a sweep stays failed. {@code alsoNow} runs in the same
     * transaction, so a feature's rows finish or fail together with the job (a poll never sees one without the other).
     */
    private void end(long jobId, JobState state, String message, Runnable alsoNow) {
        QuarkusTransaction.requiringNew().run(() -> {
            BackgroundJob job = jobs.findById(jobId);
            if (job.state != JobState.RUNNING) {
                return;
            }
            job.state = state;
            job.phase = state.words();
            job.message = clip(message, MESSAGE_LENGTH);
            job.finishedAt = OffsetDateTime.now(clock);
            if (state == JobState.DONE) {
                job.progressDone = job.progressTotal;
            }
            alsoNow.run();
        });
    }

    static String clip(String text, int length) {
        return text == null ? null : text.substring(0, Math.min(length, text.length()));
    }
}
