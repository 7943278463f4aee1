package org.depotcast.fleet;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PumpRepository implements PanacheRepository<Pump> {
    Optional<Pump> byAssetId(String assetId) {
        return find("assetId", assetId).firstResultOptional();
    }

    /** One row per pump for planning runs, without loading entities. See {@link PumpService#planningRows()}. */
    List<PumpPlanningRow> planningRows() {
        return getEntityManager().createQuery("""
                select new org.depotcast.fleet.PumpPlanningRow(p.id, p.depot.id, p.assignedMechanic, p.depthM,
                       p.installedOn, p.status, p.decommissionedOn, p.model.id, p.usageHoursPerDay) from Pump p""",
                PumpPlanningRow.class).getResultList();
    }

    private static final String SUMMARY = """
            select new org.depotcast.fleet.PumpSummary(p.id, p.assetId, p.model.id, p.depot.id, p.depot.code,
                   p.assignedMechanic, p.depthM, p.installedOn, p.status, p.usageHoursPerDay) from Pump p
            """;

    /** The pumps at one depot, or (null) every pump, as records by asset id. See {@link PumpQueryService}. */
    List<PumpSummary> summaries(Long depotId) {
        if (depotId == null) {
            return getEntityManager().createQuery(SUMMARY + "order by p.assetId", PumpSummary.class).getResultList();
        }
        return getEntityManager().createQuery(SUMMARY + "where p.depot.id = :depotId order by p.assetId",
                PumpSummary.class).setParameter("depotId", depotId).getResultList();
    }

    List<PumpSummary> summariesOf(java.util.Collection<Long> ids) {
        return getEntityManager().createQuery(SUMMARY + "where p.id in :ids", PumpSummary.class)
                .setParameter("ids", ids).getResultList();
    }

    PumpSummary summaryOf(long id) {
        return getEntityManager().createQuery(SUMMARY + "where p.id = :id", PumpSummary.class).setParameter("id", id)
                .getSingleResult();
    }

    /** One row per pump for sensor intake. See {@link PumpService#intakeRows()}. */
    List<PumpIntakeRow> intakeRows() {
        return getEntityManager().createQuery("""
                select new org.depotcast.fleet.PumpIntakeRow(p.id, p.assetId, p.installedOn, p.model.id, p.depot.id,
                       p.assignedMechanic) from Pump p""", PumpIntakeRow.class).getResultList();
    }

    List<Pump> search(Long depotId, PumpStatus status) {
        if (depotId == null && status == null) {
            return listAll(Sort.by("assetId"));
        }
        if (depotId == null) {
            return list("status", Sort.by("assetId"), status);
        }
        return status == null ? list("depot.id", Sort.by("assetId"), depotId)
                : list("depot.id = ?1 and status = ?2", Sort.by("assetId"), depotId, status);
    }
}
