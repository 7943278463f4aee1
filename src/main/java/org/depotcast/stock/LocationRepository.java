package org.depotcast.stock;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
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

    /** Every location's code keyed by id, without loading entities. */
    Map<Long, String> codesById() {
        Map<Long, String> codes = new HashMap<>();
        getEntityManager().createQuery("select l.id, l.code from Location l", Object[].class).getResultList()
                .forEach(row -> codes.put((Long) row[0], (String) row[1]));
        return codes;
    }

    Optional<Location> kitOf(String mechanicUsername) {
        return find("kind = ?1 and mechanicUsername = ?2", LocationKind.KIT, mechanicUsername).firstResultOptional();
    }
}
