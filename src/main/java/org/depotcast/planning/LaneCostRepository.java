package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The transfer_lane_cost table: per-unit transport costs set for particular lanes between two stores. */
@ApplicationScoped
class LaneCostRepository {
    private final EntityManager em;

    LaneCostRepository(EntityManager em) {
        this.em = em;
    }

    /** The key of a lane in {@link #costsSet()}. */
    static String lane(long fromId, long toId) {
        return fromId + ">" + toId;
    }

    /** The costs set, keyed by {@link #lane}; other lanes use the distance-based default. */
    Map<String, Double> costsSet() {
        Map<String, Double> lanes = new HashMap<>();
        for (Object row : (List<?>) em.createNativeQuery("select from_id, to_id, unit_cost from transfer_lane_cost")
                .getResultList()) {
            Object[] r = (Object[]) row;
            lanes.put(lane(((Number) r[0]).longValue(), ((Number) r[1]).longValue()), ((Number) r[2]).doubleValue());
        }
        return lanes;
    }

    void set(long fromId, long toId, BigDecimal unitCost) {
        em.createNativeQuery("delete from transfer_lane_cost where from_id = ?1 and to_id = ?2")
                .setParameter(1, fromId).setParameter(2, toId).executeUpdate();
        em.createNativeQuery("insert into transfer_lane_cost (from_id, to_id, unit_cost) values (?1, ?2, ?3)")
                .setParameter(1, fromId).setParameter(2, toId).setParameter(3, unitCost).executeUpdate();
    }
}
