package org.depotcast.catalogue;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PartRepository implements PanacheRepository<Part> {
    Optional<Part> byPartNumber(String partNumber) {
        // Natural-id lookups are served from the second-level cache: the ledger looks parts up on every movement.
        return getSession().bySimpleNaturalId(Part.class).loadOptional(partNumber);
    }

    List<Part> allByNumber() {
        return listAll(Sort.by("partNumber"));
    }

    List<Part> inFamily(ComponentFamily family) {
        return list("family", Sort.by("partNumber"), family);
    }
}
