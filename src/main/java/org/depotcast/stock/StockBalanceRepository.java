package org.depotcast.stock;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.LockModeType;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class StockBalanceRepository implements PanacheRepository<StockBalance> {
    Optional<StockBalance> lockedFor(long partId, long locationId) {
        return find("partId = ?1 and location.id = ?2", partId, locationId)
                .withLock(LockModeType.PESSIMISTIC_WRITE).firstResultOptional();
    }

    /** Rows: part id, location id, on hand; every balance, or those of one location. One query. */
    List<Object[]> onHand(Long locationId) {
        String where = locationId == null ? "" : " where b.location.id = :location";
        var query = getEntityManager().createQuery(
                "select b.partId, b.location.id, b.onHand from StockBalance b" + where, Object[].class);
        if (locationId != null) {
            query.setParameter("location", locationId);
        }
        return query.getResultList();
    }
}
