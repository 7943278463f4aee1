package org.depotcast.jobs;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;

/**
 * Makes a scheduled run happen once across instances that share the database: each instance tries to insert
 * (schedule, day) and only the one whose insert succeeds runs it (the primary key refuses the others). Plain SQL
 * that H2 and PostgreSQL both take; no clock agreement needed beyond the day.
 */
@ApplicationScoped
public class ScheduleClaims {
    private final EntityManager em;
    private final JobInstance instance;
    private final Clock clock;
    /** Set once every start-up step (the demo loading among them) is over: a schedule may fire before that. */
    private volatile boolean started;

    ScheduleClaims(EntityManager em, JobInstance instance, Clock clock) {
        this.em = em;
        this.instance = instance;
        this.clock = clock;
    }

    void afterStartUp(@jakarta.enterprise.event.Observes @jakarta.annotation.Priority(Integer.MAX_VALUE)
                      io.quarkus.runtime.StartupEvent event) {
        started = true;
    }

    /**
     * True for exactly one caller per (schedule, day) across every instance on the database; false on an instance
     * still starting (its data may be half loaded), which leaves the day to another instance or a later firing.
     */
    public boolean claim(String schedule, LocalDate day) {
        if (!started) {
            Log.infof("schedule %s fired during start-up: not claimed", schedule);
            return false;
        }
        String before = holder(schedule, day);
        if (before != null) {
            Log.infof("schedule %s on %s already claimed by %s", schedule, day, before);
            return false; // the common case after the first instance: no failed insert to log
        }
        try {
            QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                            "insert into schedule_claim (schedule_name, run_on, instance_id, claimed_at) values (?1, ?2, ?3, ?4)")
                    .setParameter(1, schedule).setParameter(2, day).setParameter(3, instance.id())
                    .setParameter(4, OffsetDateTime.now(clock)).executeUpdate());
            Log.infof("schedule %s on %s claimed by this instance %s", schedule, day, instance.id());
            return true;
        } catch (RuntimeException refused) {
            String holder = holder(schedule, day);
            if (holder == null) {
                throw refused; // not a lost race: a real fault
            }
            Log.infof("schedule %s on %s already claimed by %s", schedule, day, holder);
            return false;
        }
    }

    /** The instance that claimed (schedule, day), or null. */
    public String holder(String schedule, LocalDate day) {
        return QuarkusTransaction.requiringNew().call(() -> {
            java.util.List<?> holders = em.createNativeQuery(
                            "select instance_id from schedule_claim where schedule_name = ?1 and run_on = ?2")
                    .setParameter(1, schedule).setParameter(2, day).getResultList();
            return holders.isEmpty() ? null : holders.get(0).toString();
        });
    }
}
