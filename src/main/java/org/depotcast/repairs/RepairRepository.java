package org.depotcast.repairs;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

@ApplicationScoped
class RepairRepository implements PanacheRepository<Repair> {
    Optional<Repair> byRef(String repairRef) {
        return find("repairRef", repairRef).firstResultOptional();
    }

    List<Repair> search(Long pumpId, LocalDate since, int limit) {
        Sort newestFirst = Sort.descending("reportedOn").and("id", Sort.Direction.Descending);
        if (pumpId != null) {
            return since == null ? find("pumpId", newestFirst, pumpId).page(0, limit).list()
                    : find("pumpId = ?1 and reportedOn >= ?2", newestFirst, pumpId, since).page(0, limit).list();
        }
        return since == null ? findAll(newestFirst).page(0, limit).list()
                : find("reportedOn >= ?1", newestFirst, since).page(0, limit).list();
    }

    java.util.Set<String> allRefs() {
        return new java.util.HashSet<>(getEntityManager().createQuery("select r.repairRef from Repair r", String.class)
                .getResultList());
    }

    /**
     * Parts that broken pumps wait for today: rows pump id, part id, repair ref, reported on, diagnosed on, one per
     * line of an open repair whose parts have not come.
     */
    List<Object[]> openWaits() {
        return getEntityManager().createQuery("""
                select r.pumpId, l.partId, r.repairRef, r.reportedOn, r.diagnosedOn
                from RepairLine l join l.repair r
                where r.fixedOn is null and r.partsAvailableOn is null
                order by r.reportedOn, r.id""", Object[].class).getResultList();
    }

    /** Repairs reported since a date that waited for parts: rows pump id, diagnosed on, parts available on. */
    List<Object[]> waitsSince(LocalDate since) {
        return getEntityManager().createQuery("""
                select r.pumpId, r.diagnosedOn, r.partsAvailableOn from Repair r
                where r.reportedOn >= :since and r.diagnosedOn is not null and r.partsAvailableOn > r.diagnosedOn""",
                Object[].class).setParameter("since", since).getResultList();
    }

    /** The latest preventive service fixed, per pump: rows pump id, fixed on. */
    List<Object[]> lastServices() {
        return getEntityManager().createQuery("""
                select r.pumpId, max(r.fixedOn) from Repair r
                where r.kind = org.depotcast.repairs.RepairKind.PREVENTIVE and r.fixedOn is not null
                group by r.pumpId""", Object[].class).getResultList();
    }

    /** Breakdowns reported up to {@code to} and not fixed before {@code from}: rows pump id, reported on, fixed on. */
    List<Object[]> breakdownsBetween(LocalDate from, LocalDate to) {
        return getEntityManager().createQuery("""
                select r.pumpId, r.reportedOn, r.fixedOn from Repair r
                where r.kind = org.depotcast.repairs.RepairKind.BREAKDOWN and r.reportedOn <= :to
                and (r.fixedOn is null or r.fixedOn >= :from) order by r.reportedOn, r.id""", Object[].class)
                .setParameter("from", from).setParameter("to", to).getResultList();
    }

    /** Rows (pump id, reported on, fixed on) of breakdown repairs reported on or after {@code since}, latest first. */
    List<Object[]> breakdownsReportedSince(LocalDate since) {
        return getEntityManager().createQuery("""
                select r.pumpId, r.reportedOn, r.fixedOn from Repair r
                where r.kind = org.depotcast.repairs.RepairKind.BREAKDOWN and r.reportedOn >= :since
                order by r.reportedOn desc, r.id desc""", Object[].class)
                .setParameter("since", since).getResultList();
    }

    /** The day of the earliest repair on record, or null with none. */
    LocalDate firstReportedOn() {
        return getEntityManager().createQuery("select min(r.reportedOn) from Repair r", LocalDate.class).getSingleResult();
    }

    /** Repairs not fixed yet, newest report first. */
    List<Repair> open() {
        return find("fixedOn is null", Sort.descending("reportedOn").and("id", Sort.Direction.Descending)).list();
    }

    /** Open breakdown repairs, earliest reported first: rows pump id, repair ref, reported on. All pumps when null. */
    List<Object[]> openBreakdownsOf(Long pumpId) {
        String query = """
                select r.pumpId, r.repairRef, r.reportedOn from Repair r
                where r.fixedOn is null and r.kind = org.depotcast.repairs.RepairKind.BREAKDOWN %s
                order by r.reportedOn, r.id""";
        return onePumpOrAll(query, pumpId);
    }

    /** Fixed repairs, latest fix first: rows pump id, repair ref, fixed on. All pumps when null. */
    List<Object[]> fixesOf(Long pumpId) {
        String query = """
                select r.pumpId, r.repairRef, r.fixedOn from Repair r
                where r.fixedOn is not null %s
                order by r.fixedOn desc, r.id desc""";
        return onePumpOrAll(query, pumpId);
    }

    private List<Object[]> onePumpOrAll(String query, Long pumpId) {
        if (pumpId == null) {
            return getEntityManager().createQuery(query.formatted(""), Object[].class).getResultList();
        }
        return getEntityManager().createQuery(query.formatted("and r.pumpId = :pump"), Object[].class)
                .setParameter("pump", pumpId).getResultList();
    }

    List<Repair> allInOrder() {
        return listAll(Sort.by("repairRef"));
    }

    /**
     * Every part replaced, one row per repair line: part id, pump id, mechanic, repair kind, date fixed (reported when
     * not yet fixed), quantity, date reported, without the pump's depot (fleet's). The raw demand history for
     * forecasting.
     */
    List<ConsumptionRow> consumptionRows() {
        return getEntityManager().createQuery("""
                select new org.depotcast.repairs.ConsumptionRow(l.partId, r.pumpId, r.mechanic,
                       r.kind, coalesce(r.fixedOn, r.reportedOn), l.quantity, r.reportedOn)
                from RepairLine l join l.repair r
                """, ConsumptionRow.class).getResultList();
    }
}
