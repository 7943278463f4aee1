package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.EntityMissingException;

import java.util.List;

/**
 * Reads jobs for polling clients. A job shows its state, progress and a safe message, never results, so officers of
 * any location may read it (as they may read a forecast run's status); results stay behind each feature's own rules.
 */
@ApplicationScoped
public class JobService {
    private final JobRepository jobs;

    JobService(JobRepository jobs) {
        this.jobs = jobs;
    }

    public JobView job(long id) {
        return QuarkusTransaction.requiringNew().call(() -> jobs.findByIdOptional(id).map(BackgroundJob::view)
                .orElseThrow(() -> new EntityMissingException(null, "job", id)));
    }

    /** Newest first; a null kind or state matches every one. */
    public List<JobView> recent(JobKind kind, JobState state, int limit) {
        return QuarkusTransaction.requiringNew().call(() -> jobs.recent(kind, state, limit).stream()
                .map(BackgroundJob::view).toList());
    }
}
