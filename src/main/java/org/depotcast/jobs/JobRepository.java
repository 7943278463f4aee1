package org.depotcast.jobs;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.time.OffsetDateTime;
import java.util.List;

@ApplicationScoped
class JobRepository implements PanacheRepository<BackgroundJob> {

    List<BackgroundJob> recent(JobKind kind, JobState state, int limit) {
        StringBuilder query = new StringBuilder("1 = 1");
        io.quarkus.panache.common.Parameters params = new io.quarkus.panache.common.Parameters();
        if (kind != null) {
            query.append(" and kind = :kind");
            params.and("kind", kind);
        }
        if (state != null) {
            query.append(" and state = :state");
            params.and("state", state);
        }
        return find(query.toString(), Sort.descending("id"), params).page(0, limit).list();
    }

    /** The kind of a running job among {@code kinds}, if any. */
    java.util.Optional<JobKind> runningOf(List<JobKind> kinds) {
        return find("kind in ?1 and state = ?2", kinds, JobState.RUNNING).firstResultOptional().map(j -> j.kind);
    }

    /** Running jobs whose heartbeat is older than {@code before}, whichever instance owns them. */
    List<BackgroundJob> silentSince(OffsetDateTime before) {
        return list("state = ?1 and heartbeatAt < ?2", JobState.RUNNING, before);
    }
}
