package org.depotcast.catalogue;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PartRepository implements PanacheRepository<Part> {
    Optional<Part> byPartNumber(String partNumber) {
        return find("partNumber", partNumber).firstResultOptional();
    }

    List<Part> allByNumber() {
        return listAll(Sort.by("partNumber"));
    }

    List<Part> inFamily(ComponentFamily family) {
        return list("family", Sort.by("partNumber"), family);
    }
}
