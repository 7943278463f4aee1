package org.depotcast.planning;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;

@ApplicationScoped
class AlertActionRepository implements PanacheRepository<AlertAction> {
    /** Actions at a location (or everywhere), oldest first, so the latest per alert wins when folded. */
    List<AlertAction> at(String locationCode) {
        return locationCode == null ? list("order by id") : list("locationCode = ?1 order by id", locationCode);
    }
}
