package org.depotcast.common;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.time.OffsetDateTime;

/**
 * A named row lock that makes one kind of work exclusive across instances sharing a database: updating the name's
 * row in {@code job_start_lock} holds it until the caller's transaction ends, so a second instance doing the same work
 * waits and then sees the first one's result. Used to start a background job of one kind (the jobs feature) and to
 * take a file of sensor readings (whose pump-months are read, merged and rewritten whole). An update rather than
 * {@code select ... for update}: both H2 and PostgreSQL lock the updated row the same way.
 */
@ApplicationScoped
public class ExclusiveLock {
    private final EntityManager em;

    ExclusiveLock(EntityManager em) {
        this.em = em;
    }

    /** Takes the lock named {@code kind} in the caller's transaction; creates the name's row on first use. */
    public void take(String kind, OffsetDateTime now) {
        if (update(kind, now) == 0) {
            createRow(kind);
            if (update(kind, now) == 0) {
                throw new IllegalStateException("no job_start_lock row for " + kind + " after creating it");
            }
        }
    }

    private int update(String kind, OffsetDateTime now) {
        return em.createNativeQuery("update job_start_lock set last_start_at = ?1 where kind = ?2")
                .setParameter(1, now).setParameter(2, kind).executeUpdate();
    }

    /** In its own transaction; another instance creating the same row at once makes this insert fail harmlessly. */
    private void createRow(String kind) {
        try {
            QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                    "insert into job_start_lock (kind) values (?1)").setParameter(1, kind).executeUpdate());
        } catch (RuntimeException alreadyThere) {
            // The row exists now, whoever made it; the update that follows tells.
        }
    }
}
