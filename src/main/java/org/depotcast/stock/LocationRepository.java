package org.depotcast.stock;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class LocationRepository implements PanacheRepository<Location> {
    Optional<Location> byCode(String code) {
        return getSession().bySimpleNaturalId(Location.class).loadOptional(code);
    }

    List<Location> allByCode() {
        return listAll(Sort.by("code"));
    }

    List<Location> ofKind(LocationKind kind) {
        return list("kind", Sort.by("code"), kind);
    }

    Optional<Location> kitOf(String mechanicUsername) {
        return find("kind = ?1 and mechanicUsername = ?2", LocationKind.KIT, mechanicUsername).firstResultOptional();
    }
}
