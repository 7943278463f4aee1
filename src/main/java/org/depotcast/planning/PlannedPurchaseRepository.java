package org.depotcast.planning;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PlannedPurchaseRepository implements PanacheRepository<PlannedPurchase> {
    List<PlannedPurchase> at(long locationId) {
        return list("locationId", locationId);
    }

    Optional<PlannedPurchase> of(long partId, long locationId) {
        return find("partId = ?1 and locationId = ?2", partId, locationId).firstResultOptional();
    }
}
