package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.LogRecord;
import java.util.logging.Logger;

import static org.depotcast.TestData.as;
import static org.depotcast.TestThreads.await;
import static org.depotcast.TestThreads.pause;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A forecast run shown done has ended its job: the run's last write and the job's end are one transaction, so a
 * second run started right after a poll shows the first done is accepted, not refused (409) for a job still ending.
 * The seam: the run's "series done" log line, written after its forecasts are stored and before its job ends, holds
 * the job there while the test polls. Were the run marked done before that point, the poll would show it done while
 * its job still held the start.
 */
@QuarkusTest
class DoneRunFreesTheStartLockTest {
    @Inject
    EntityManager em;

    @Test
    void aForecastRunStartedRightAfterThePollShowsTheLastDoneIsAccepted() throws InterruptedException {
        awaitNoneRunning();
        CountDownLatch between = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        Logger log = Logger.getLogger(ForecastRunService.class.getName());
        Level level = log.getLevel();
        Handler seam = new Handler() {
            @Override
            public void publish(LogRecord record) {
                if (record.getMessage() != null && record.getMessage().contains("series done in")) {
                    between.countDown();
                    await(release);
                }
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        log.setLevel(Level.INFO); // the test profile logs warnings only
        log.addHandler(seam);
        try {
            long first = as("lead").post("/api/forecast/runs").then().statusCode(202).extract().jsonPath().getLong("id");
            assertTrue(between.await(300, TimeUnit.SECONDS), "run " + first + " reached the seam");
            assertTrue(storedForecasts(first) > 0, "the seam lies after the run's forecasts were written");
            String status = status(first);
            while (!"DONE".equals(status)) {
                release.countDown();
                pause(20);
                status = status(first);
            }
            as("lead").post("/api/forecast/runs").then().statusCode(202);
        } finally {
            release.countDown();
            log.removeHandler(seam);
            log.setLevel(level);
            awaitNoneRunning();
        }
    }

    private static String status(long run) {
        return as("lead").get("/api/forecast/runs/" + run).then().statusCode(200).extract().jsonPath().getString("status");
    }

    private long storedForecasts(long run) {
        return QuarkusTransaction.requiringNew().call(() -> ((Number) em.createNativeQuery(
                "select count(*) from part_forecast where run_id = ?1").setParameter(1, run).getSingleResult()).longValue());
    }

    private long running() {
        return QuarkusTransaction.requiringNew().call(() -> em.createQuery(
                        "select count(j) from BackgroundJob j where j.kind in ?1 and j.state = ?2", Long.class)
                .setParameter(1, JobKind.FORECAST_RUN.takingTurns()).setParameter(2, JobState.RUNNING).getSingleResult());
    }

    /** Forecast runs and reports of other tests may still be going; this test needs them idle, and leaves them so. */
    private void awaitNoneRunning() {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(300);
        while (running() > 0) {
            assertTrue(System.nanoTime() < deadline, "a forecast run or accuracy report kept running");
            pause(200);
        }
    }
}
