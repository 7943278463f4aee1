package org.depotcast.common;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;

/**
 * The programme_setting table: programme-wide settings a lead changes through the API, one value per name, with who
 * set it and when. The feature owning a setting checks its value and its access, and audits the change.
 */
@ApplicationScoped
public class ProgrammeSettings {
    private final EntityManager em;

    ProgrammeSettings(EntityManager em) {
        this.em = em;
    }

    /** The value set under {@code name}; empty when none is (the owner's default applies). */
    public Optional<String> value(String name) {
        List<?> set = em.createNativeQuery("select setting_value from programme_setting where setting_name = ?1")
                .setParameter(1, name).getResultList();
        return set.isEmpty() ? Optional.empty() : Optional.of((String) set.get(0));
    }

    /** Replaces the value under {@code name}, inside the caller's transaction. */
    public void set(String name, String value, String setBy, OffsetDateTime setAt) {
        em.createNativeQuery("delete from programme_setting where setting_name = ?1").setParameter(1, name).executeUpdate();
        em.createNativeQuery("insert into programme_setting (setting_name, setting_value, set_by, set_at) "
                        + "values (?1, ?2, ?3, ?4)")
                .setParameter(1, name).setParameter(2, value).setParameter(3, setBy).setParameter(4, setAt)
                .executeUpdate();
    }
}
