package org.depotcast.catalogue;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PumpModelRepository implements PanacheRepository<PumpModel> {
    Optional<PumpModel> byCode(String code) {
        return find("code", code).firstResultOptional();
    }

    List<PumpModel> allByCode() {
        return listAll(Sort.by("code"));
    }
}
