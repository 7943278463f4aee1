package org.depotcast.planning;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PlannedPurchaseRepository implements PanacheRepository<PlannedPurchase> {
    List<PlannedPurchase> at(long locationId) {
        return list("location.id = ?1 order by part.supplier, part.partNumber", locationId);
    }

    List<PlannedPurchase> everywhere() {
        return list("order by location.code, part.supplier, part.partNumber");
    }

    Optional<PlannedPurchase> of(long partId, long locationId) {
        return find("part.id = ?1 and location.id = ?2", partId, locationId).firstResultOptional();
    }
}
