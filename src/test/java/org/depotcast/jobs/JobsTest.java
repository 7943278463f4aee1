package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.depotcast.common.BusinessRuleException;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The job runner's own rules: the schedule claim, the dead-instance sweep, safe failure messages, the poll shape. */
@QuarkusTest
class JobsTest {
    @Inject
    ScheduleClaims claims;
    @Inject
    JobSweeper sweeper;
    @Inject
    JobRunner runner;
    @Inject
    JobInstance instance;
    @Inject
    EntityManager em;

    @Test
    void aScheduleIsClaimedOncePerDay() {
        LocalDate day = LocalDate.of(2026, 3, 4);
        assertTrue(claims.claim("test-schedule", day), "the first claim wins");
        assertFalse(claims.claim("test-schedule", day), "a second claim of the same day loses");
        assertEquals(instance.id(), claims.holder("test-schedule", day));
        assertTrue(claims.claim("test-schedule", day.plusDays(1)), "the next day is a new claim");
        assertTrue(claims.claim("other-schedule", day), "another schedule is its own claim");
    }

    @Test
    void aJobOfASilentInstanceIsMarkedFailedWithItsRun() {
        OffsetDateTime old = OffsetDateTime.now(ZoneOffset.UTC).minus(instance.deadAfter()).minusSeconds(5);
        long dead = insertJob(JobKind.FORECAST_RUN, "gone-host-1-abc", old);
        long alive = insertJob(JobKind.ACCURACY_REPORT, "other-host-2-def", OffsetDateTime.now(ZoneOffset.UTC));
        long runId = QuarkusTransaction.requiringNew().call(() -> {
            em.createNativeQuery("insert into forecast_run (trigger_kind, status, started_at, horizon_months, job_id) "
                    + "values ('request', 'RUNNING', ?1, 24, ?2)").setParameter(1, old).setParameter(2, dead).executeUpdate();
            return ((Number) em.createNativeQuery("select max(id) from forecast_run").getSingleResult()).longValue();
        });

        sweeper.sweep(); // the periodic sweep may have been first: the state below is what counts

        BackgroundJob swept = job(dead);
        assertEquals(JobState.FAILED, swept.state);
        assertNotNull(swept.finishedAt);
        assertTrue(swept.message.contains("has not answered since"), swept.message);
        assertEquals(JobState.RUNNING, job(alive).state, "a job with a fresh heartbeat stays running");
        TestData.as("lead").get("/api/forecast/runs/" + runId).then().statusCode(200)
                .body("status", equalTo("FAILED")).body("jobId", equalTo((int) dead));
        assertEquals(0, sweeper.sweep(), "a swept job is not swept twice");
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "update background_job set state = 'DONE' where id = ?1").setParameter(1, alive).executeUpdate());
    }

    @Test
    void aFailureReachesTheClientWithoutExceptionText() {
        long jobId = runner.create(JobKind.ACCURACY_REPORT);
        JobView view = runner.runHere(jobId, progress -> {
            throw new IllegalStateException("select secret_column from account at org.depotcast.Hidden");
        });
        assertEquals(JobState.FAILED, view.state());
        assertEquals("failed", view.stateWords());
        assertFalse(view.message().contains("IllegalStateException") || view.message().contains("secret")
                || view.message().contains("org.depotcast"), view.message());
        assertTrue(view.message().contains("job " + jobId), view.message());
        TestData.as("lead").get("/api/jobs/" + jobId).then().statusCode(200)
                .body("state", equalTo("FAILED")).body("kind", equalTo("ACCURACY_REPORT"))
                .body("message", equalTo(view.message()));
    }

    @Test
    void aRuleBrokenInsideAJobIsReportedInItsOwnWords() {
        long jobId = runner.create(JobKind.SPEND_RUN);
        JobView view = runner.runHere(jobId, progress -> {
            throw new BusinessRuleException("exchangeRate", "part X is priced in EUR, others in USD");
        });
        assertEquals("The spend run stopped: part X is priced in EUR, others in USD", view.message());
    }

    @Test
    void progressAndSummaryArePolledInOneShape() {
        long jobId = runner.create(JobKind.ACCURACY_REPORT);
        JobView view = runner.runHere(jobId, progress -> {
            progress.phase("counting");
            progress.progress(3, 7);
            return "seven things counted";
        });
        assertEquals(JobState.DONE, view.state());
        assertEquals(7, view.progressDone());
        TestData.as("officer").get("/api/jobs/" + jobId).then().statusCode(200)
                .body("stateWords", equalTo("done")).body("progressTotal", equalTo(7))
                .body("message", equalTo("seven things counted")).body("ownerInstance", equalTo(instance.id()));
        TestData.as("lead").get("/api/jobs?kind=accuracy_report&state=done&limit=100").then().statusCode(200)
                .body("find { it.id == " + jobId + " }.message", equalTo("seven things counted"));
        TestData.as("lead").get("/api/jobs?state=sleeping").then().statusCode(400)
                .contentType("application/problem+json").body("errors[0].field", equalTo("state"));
        TestData.as("mechanic1").get("/api/jobs/" + jobId).then().statusCode(403);
        TestData.as("officer2").get("/api/jobs/" + jobId).then().statusCode(200).body("state", equalTo("DONE"));
        TestData.as("lead").get("/api/jobs/987654321").then().statusCode(404);
    }

    private long insertJob(JobKind kind, String owner, OffsetDateTime heartbeat) {
        return QuarkusTransaction.requiringNew().call(() -> {
            BackgroundJob job = new BackgroundJob();
            job.kind = kind;
            job.state = JobState.RUNNING;
            job.phase = "forecasting";
            job.startedBy = "lead";
            job.startedAt = heartbeat;
            job.ownerInstance = owner;
            job.heartbeatAt = heartbeat;
            em.persist(job);
            return job.id;
        });
    }

    private BackgroundJob job(long id) {
        return QuarkusTransaction.requiringNew().call(() -> em.find(BackgroundJob.class, id));
    }
}
