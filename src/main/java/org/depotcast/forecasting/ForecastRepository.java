package org.depotcast.forecasting;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class ForecastRepository implements PanacheRepository<PartForecast> {
    /** The run planning uses: the newest finished one, leaving out runs as of a past date (checks of accuracy). */
    Optional<ForecastRun> latestFinishedRun() {
        return getEntityManager().createQuery(
                        "select r from ForecastRun r where r.status = :done and r.triggerKind <> :asOf order by r.id desc",
                        ForecastRun.class)
                .setParameter("done", ForecastRun.Status.DONE).setParameter("asOf", ForecastRunService.AS_OF_TRIGGER).setMaxResults(1).getResultStream().findFirst();
    }

    /** Newest first; {@code status} null for every state; {@code planningOnly} leaves out runs as of a past date. */
    List<ForecastRun> recentRuns(ForecastRun.Status status, boolean planningOnly, int limit) {
        String where = (status == null ? "1 = 1" : "r.status = :status") + (planningOnly ? " and r.triggerKind <> :asOf" : "");
        var query = getEntityManager().createQuery("select r from ForecastRun r where " + where + " order by r.id desc",
                ForecastRun.class);
        if (status != null) {
            query.setParameter("status", status);
        }
        if (planningOnly) {
            query.setParameter("asOf", ForecastRunService.AS_OF_TRIGGER);
        }
        return query.setMaxResults(limit).getResultList();
    }

    /** The newest finished run as of {@code origin} (a month's first day), past-date checks included. */
    Optional<ForecastRun> latestFinishedRunAsOf(java.time.LocalDate origin) {
        return getEntityManager().createQuery(
                        "select r from ForecastRun r where r.status = :done and r.origin = :origin order by r.id desc",
                        ForecastRun.class)
                .setParameter("done", ForecastRun.Status.DONE).setParameter("origin", origin).setMaxResults(1)
                .getResultStream().findFirst();
    }

    /** A series' stored credibility ratio. */
    record StoredRatio(Long partId, String locationCode, Double ratio) {
    }

    /** The credibility ratio of each of the run's series that kept one (none in runs stored before it was kept). */
    List<StoredRatio> credibilityRatios(long runId) {
        return getEntityManager().createQuery("select f.partId, f.locationCode, f.credibilityRatio from PartForecast f "
                        + "where f.runId = :run and f.credibilityRatio is not null", StoredRatio.class)
                .setParameter("run", runId).getResultList();
    }

    Optional<ForecastRun> run(long id) {
        return Optional.ofNullable(getEntityManager().find(ForecastRun.class, id));
    }

    Optional<PartForecast> forecastOf(long runId, long partId, String locationCode) {
        return find("runId = ?1 and partId = ?2 and locationCode = ?3", runId, partId, locationCode).firstResultOptional();
    }

    List<PartForecast> forecastsAt(long runId, String locationCode) {
        return list("runId = ?1 and locationCode = ?2 order by partId", runId, locationCode);
    }

    Optional<FleetModelFitRecord> fitOf(long runId, String family) {
        return getEntityManager().createQuery("select f from FleetModelFitRecord f where f.runId = :run and f.family = :family",
                        FleetModelFitRecord.class).setParameter("run", runId).setParameter("family", family)
                .getResultStream().findFirst();
    }

    List<FleetModelFitRecord> fitsOf(long runId) {
        return getEntityManager().createQuery("select f from FleetModelFitRecord f where f.runId = :run order by f.family",
                FleetModelFitRecord.class).setParameter("run", runId).getResultList();
    }
}
