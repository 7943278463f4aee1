package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.AccessScope;
import org.depotcast.common.EntityMissingException;

import java.util.List;

/** Reads jobs for polling clients. Jobs compute for the whole programme, so reading them needs the programme view. */
@ApplicationScoped
public class JobService {
    private final JobRepository jobs;
    private final AccessScope scope;

    JobService(JobRepository jobs, AccessScope scope) {
        this.jobs = jobs;
        this.scope = scope;
    }

    public JobView job(long id) {
        scope.requireProgramme();
        return QuarkusTransaction.requiringNew().call(() -> jobs.findByIdOptional(id).map(BackgroundJob::view)
                .orElseThrow(() -> new EntityMissingException(null, "job", id)));
    }

    /** Newest first; a null kind or state matches every one. */
    public List<JobView> recent(JobKind kind, JobState state, int limit) {
        scope.requireProgramme();
        return QuarkusTransaction.requiringNew().call(() -> jobs.recent(kind, state, limit).stream()
                .map(BackgroundJob::view).toList());
    }
}
