package org.depotcast.fleet;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;

@ApplicationScoped
class PumpRepository implements PanacheRepository<Pump> {
    Optional<Pump> byAssetId(String assetId) {
        return find("assetId", assetId).firstResultOptional();
    }

    /** One row per pump for planning runs, without loading entities. See {@link PumpService#planningRows()}. */
    List<PumpPlanningRow> planningRows() {
        return getEntityManager().createQuery("""
                select new org.depotcast.fleet.PumpPlanningRow(p.id, p.depotId, p.assignedMechanic, p.depthM,
                       p.installedOn, p.status, p.decommissionedOn, p.modelId, p.usageHoursPerDay) from Pump p""",
                PumpPlanningRow.class).getResultList();
    }

    private static final String SUMMARY = """
            select new org.depotcast.fleet.PumpSummary(p.id, p.assetId, p.modelId, p.depotId, p.assignedMechanic,
                   p.depthM, p.installedOn, p.status, p.usageHoursPerDay) from Pump p
            """;

    /**
     * The pumps at one depot, or (null) every pump, as records by asset id, the depot codes from {@code depotCodes}
     * (stock's, by id). See {@link PumpQueryService}.
     */
    List<PumpSummary> summaries(Long depotId, Map<Long, String> depotCodes) {
        if (depotId == null) {
            return withCodes(getEntityManager().createQuery(SUMMARY + "order by p.assetId", PumpSummary.class)
                    .getResultList(), depotCodes);
        }
        return withCodes(getEntityManager().createQuery(SUMMARY + "where p.depotId = :depotId order by p.assetId",
                PumpSummary.class).setParameter("depotId", depotId).getResultList(), depotCodes);
    }

    List<PumpSummary> summariesOf(Collection<Long> ids, Map<Long, String> depotCodes) {
        return withCodes(getEntityManager().createQuery(SUMMARY + "where p.id in :ids", PumpSummary.class)
                .setParameter("ids", ids).getResultList(), depotCodes);
    }

    PumpSummary summaryOf(long id, Map<Long, String> depotCodes) {
        return withCodes(List.of(getEntityManager().createQuery(SUMMARY + "where p.id = :id", PumpSummary.class)
                .setParameter("id", id).getSingleResult()), depotCodes).get(0);
    }

    private static List<PumpSummary> withCodes(List<PumpSummary> read, Map<Long, String> depotCodes) {
        return read.stream().map(p -> p.withDepotCode(depotCodes.get(p.depotId()))).toList();
    }

    /** One row per pump for sensor intake. See {@link PumpService#intakeRows()}. */
    List<PumpIntakeRow> intakeRows() {
        return getEntityManager().createQuery("""
                select new org.depotcast.fleet.PumpIntakeRow(p.id, p.assetId, p.installedOn, p.modelId, p.depotId,
                       p.assignedMechanic) from Pump p""", PumpIntakeRow.class).getResultList();
    }

    List<Pump> search(Long depotId, PumpStatus status) {
        if (depotId == null && status == null) {
            return listAll(Sort.by("assetId"));
        }
        if (depotId == null) {
            return list("status", Sort.by("assetId"), status);
        }
        return status == null ? list("depotId", Sort.by("assetId"), depotId)
                : list("depotId = ?1 and status = ?2", Sort.by("assetId"), depotId, status);
    }
}
