package org.depotcast.stock;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Parameters;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

@ApplicationScoped
class StockMovementRepository implements PanacheRepository<StockMovement> {
    Optional<StockMovement> byIdempotencyKey(String owner, String key) {
        return find("idempotencyOwner = ?1 and idempotencyKey = ?2", owner, key).firstResultOptional();
    }

    /** @param visibleIds locations the caller may see, null for all */
    List<StockMovement> search(Long partId, Long locationId, java.util.Set<Long> visibleIds, OffsetDateTime since, int limit) {
        List<String> clauses = new ArrayList<>();
        Parameters params = new Parameters();
        if (partId != null) {
            clauses.add("partId = :part");
            params.and("part", partId);
        }
        if (locationId != null) {
            clauses.add("(fromLocation.id = :location or toLocation.id = :location)");
            params.and("location", locationId);
        }
        if (visibleIds != null) {
            clauses.add("(fromLocation.id in :visible or toLocation.id in :visible)");
            params.and("visible", visibleIds.isEmpty() ? java.util.Set.of(-1L) : visibleIds);
        }
        if (since != null) {
            clauses.add("occurredAt >= :since");
            params.and("since", since);
        }
        String query = clauses.isEmpty() ? "1 = 1" : String.join(" and ", clauses);
        return find(query, Sort.descending("id"), params).page(0, limit).list();
    }

    /** Ledger sums per (part, location): all that came in less all that went out. Rows: part id, location id, net. */
    @SuppressWarnings("unchecked")
    List<Object[]> ledgerSums() {
        return getEntityManager().createNativeQuery("""
                select part_id, location_id, sum(quantity) from (
                    select part_id, to_location_id as location_id, quantity from stock_movement
                    where to_location_id is not null
                    union all
                    select part_id, from_location_id as location_id, -quantity from stock_movement
                    where from_location_id is not null) ledger
                group by part_id, location_id
                """).getResultList();
    }
}
