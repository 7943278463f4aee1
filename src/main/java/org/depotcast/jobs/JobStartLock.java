package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.time.OffsetDateTime;

/**
 * The row lock that makes starting a job of one kind exclusive across instances: updating the kind's row in
 * {@code job_start_lock} holds it until the caller's transaction ends, so a second instance's start waits and then
 * sees the first one's job. An update rather than {@code select ... for update}: both H2 and PostgreSQL lock the
 * updated row the same way.
 */
@ApplicationScoped
class JobStartLock {
    private final EntityManager em;

    JobStartLock(EntityManager em) {
        this.em = em;
    }

    /** Takes the lock of {@code kind} in the caller's transaction; creates the kind's row on first use. */
    void take(JobKind kind, OffsetDateTime now) {
        if (update(kind, now) == 0) {
            createRow(kind);
            if (update(kind, now) == 0) {
                throw new IllegalStateException("no job_start_lock row for " + kind + " after creating it");
            }
        }
    }

    private int update(JobKind kind, OffsetDateTime now) {
        return em.createNativeQuery("update job_start_lock set last_start_at = ?1 where kind = ?2")
                .setParameter(1, now).setParameter(2, kind.name()).executeUpdate();
    }

    /** In its own transaction; another instance creating the same row at once makes this insert fail harmlessly. */
    private void createRow(JobKind kind) {
        try {
            QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                    "insert into job_start_lock (kind) values (?1)").setParameter(1, kind.name()).executeUpdate());
        } catch (RuntimeException alreadyThere) {
            // The row exists now, whoever made it; the update that follows tells.
        }
    }
}
