package org.depotcast.catalogue;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

@ApplicationScoped
class PumpModelRepository implements PanacheRepository<PumpModel> {
    Optional<PumpModel> byCode(String code) {
        return find("code", code).firstResultOptional();
    }

    /** Every model's code keyed by id, without loading entities or their bills of materials. */
    Map<Long, String> codesById() {
        Map<Long, String> codes = new HashMap<>();
        getEntityManager().createQuery("select m.id, m.code from PumpModel m", Object[].class).getResultList()
                .forEach(row -> codes.put((Long) row[0], (String) row[1]));
        return codes;
    }

    List<PumpModel> allByCode() {
        return listAll(Sort.by("code"));
    }
}
