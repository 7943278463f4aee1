package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.time.OffsetDateTime;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The service_level table: the target cycle service level the lead set per part class (CRITICAL, STANDARD). */
@ApplicationScoped
class ServiceLevelRepository {
    private final EntityManager em;

    ServiceLevelRepository(EntityManager em) {
        this.em = em;
    }

    /** The levels set, by part class; classes not set are absent (their configured default applies). */
    Map<String, Double> levelsSet() {
        Map<String, Double> set = new HashMap<>();
        for (Object row : (List<?>) em.createNativeQuery("select part_class, level from service_level").getResultList()) {
            Object[] r = (Object[]) row;
            set.put((String) r[0], ((Number) r[1]).doubleValue());
        }
        return set;
    }

    void set(String partClass, double level, String setBy, OffsetDateTime setAt) {
        em.createNativeQuery("delete from service_level where part_class = ?1").setParameter(1, partClass).executeUpdate();
        em.createNativeQuery("insert into service_level (part_class, level, set_by, set_at) values (?1, ?2, ?3, ?4)")
                .setParameter(1, partClass).setParameter(2, level).setParameter(3, setBy).setParameter(4, setAt)
                .executeUpdate();
    }
}
