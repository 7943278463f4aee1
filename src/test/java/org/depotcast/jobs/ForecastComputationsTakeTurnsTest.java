package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.concurrent.TimeUnit;

import static org.depotcast.TestData.as;
import static org.depotcast.TestThreads.pause;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * An accuracy report computes a forecast run of its own, so it is refused while a forecast run is going and a
 * forecast run is refused while a report is going, as a second forecast run is: two heavy computations never share
 * the machine. The same start lock and check decide it (JobKind's start lock), across instances too.
 */
@QuarkusTest
class ForecastComputationsTakeTurnsTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    JobRunner runner;
    @Inject
    EntityManager em;

    @Test
    void anAccuracyReportWaitsForAForecastRunAndTheOtherWayRound() {
        awaitNoneRunning();
        String origin = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1).minusMonths(12).toString();
        long forecastRun = runner.create(JobKind.FORECAST_RUN);
        try {
            as("lead").post("/api/forecast/accuracy-reports?origin=" + origin).then().statusCode(409).contentType(PROBLEM)
                    .body("type", equalTo("/problems/conflict"))
                    .body("detail", containsString("a forecast run is in progress"));
            assertEquals(0, running(JobKind.ACCURACY_REPORT), "no report was started");
        } finally {
            finish(forecastRun);
        }
        long report = runner.create(JobKind.ACCURACY_REPORT);
        try {
            as("lead").post("/api/forecast/runs").then().statusCode(409).contentType(PROBLEM)
                    .body("detail", containsString("an accuracy report is in progress"));
            assertEquals(0, running(JobKind.FORECAST_RUN), "no forecast run was started");
        } finally {
            finish(report);
        }
    }

    private long running(JobKind kind) {
        return QuarkusTransaction.requiringNew().call(() -> em.createQuery(
                "select count(j) from BackgroundJob j where j.kind = ?1 and j.state = ?2", Long.class)
                .setParameter(1, kind).setParameter(2, JobState.RUNNING).getSingleResult());
    }

    /** Forecast runs and reports of other tests may still be going; this test needs both idle. */
    private void awaitNoneRunning() {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(300);
        while (running(JobKind.FORECAST_RUN) + running(JobKind.ACCURACY_REPORT) > 0) {
            assertTrue(System.nanoTime() < deadline, "a forecast run or accuracy report of another test kept running");
            pause(200);
        }
    }

    /** The jobs made here do no work: end them so other tests find the kinds idle. */
    private void finish(long jobId) {
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "update background_job set state = 'DONE' where id = ?1").setParameter(1, jobId).executeUpdate());
    }
}
