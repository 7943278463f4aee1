package org.depotcast.repairs;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.Collection;
import java.util.List;
import java.util.Optional;

@ApplicationScoped
class RefusedRepairRepository implements PanacheRepository<RefusedRepair> {
    Optional<RefusedRepair> byRef(String repairRef) {
        return find("repairRef", repairRef).firstResultOptional();
    }

    /** Open notices at these kits, oldest refusal first (the longest-waiting repair leads). */
    List<RefusedRepair> openAt(Collection<Long> kitIds) {
        if (kitIds.isEmpty()) {
            return List.of();
        }
        return list("state = ?1 and kitId in ?2 order by firstRefusedAt, id", RefusedRepair.State.OPEN, kitIds);
    }
}
