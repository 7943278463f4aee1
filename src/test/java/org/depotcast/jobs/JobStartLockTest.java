package org.depotcast.jobs;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.common.ConflictException;
import org.junit.jupiter.api.Test;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import static org.depotcast.TestThreads.await;
import static org.depotcast.TestThreads.pause;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Starting a job of an exclusive kind is decided by the database, not by one JVM's lock: a second start that checks
 * while the first one's insert is not yet committed (what a second instance could do) waits for it and is refused.
 * Without the row lock the second start would find no running job and insert its own.
 */
@QuarkusTest
class JobStartLockTest {
    @Inject
    JobRunner runner;
    @Inject
    EntityManager em;

    @Test
    void aStartThatChecksDuringAnotherStartsTransactionIsRefused() throws Exception {
        awaitNoneRunning(JobKind.SPEND_RUN);
        CountDownLatch firstInside = new CountDownLatch(1);
        CountDownLatch secondCalling = new CountDownLatch(1);
        CompletableFuture<Long> first = CompletableFuture.supplyAsync(() -> runner.createExclusive(JobKind.SPEND_RUN, jobId -> {
            firstInside.countDown();
            await(secondCalling);
            pause(400); // the second start reaches its check while this transaction is still open
            return jobId;
        }));
        CompletableFuture<Long> second = CompletableFuture.supplyAsync(() -> {
            await(firstInside);
            secondCalling.countDown();
            return runner.createExclusive(JobKind.SPEND_RUN, jobId -> jobId);
        });
        try {
            first.get(30, TimeUnit.SECONDS);
            Throwable refused = assertThrowsFrom(second);
            assertInstanceOf(ConflictException.class, refused);
            assertTrue(refused.getMessage().contains("another is already in progress"), refused.getMessage());
            assertEquals(1L, runningCount(JobKind.SPEND_RUN), "exactly one job was recorded");
        } finally {
            finishRunning(JobKind.SPEND_RUN);
        }
    }

    @Test
    void aKindWithoutItsLockRowGetsOneOnFirstUse() {
        awaitNoneRunning(JobKind.SPEND_RUN);
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "delete from job_start_lock where kind = 'SPEND_RUN'").executeUpdate());
        try {
            runner.createExclusive(JobKind.SPEND_RUN, id -> id);
            long rows = QuarkusTransaction.requiringNew().call(() -> ((Number) em.createNativeQuery(
                    "select count(*) from job_start_lock where kind = 'SPEND_RUN'").getSingleResult()).longValue());
            assertEquals(1, rows);
        } finally {
            finishRunning(JobKind.SPEND_RUN);
        }
    }

    private static Throwable assertThrowsFrom(CompletableFuture<?> future) throws InterruptedException {
        try {
            future.get(30, TimeUnit.SECONDS);
        } catch (java.util.concurrent.ExecutionException e) {
            return e.getCause();
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("the second start never answered", e);
        }
        throw new AssertionError("the second start was accepted while the first was being recorded");
    }

    private long runningCount(JobKind kind) {
        return QuarkusTransaction.requiringNew().call(() -> em.createQuery(
                "select count(j) from BackgroundJob j where j.kind = ?1 and j.state = ?2", Long.class)
                .setParameter(1, kind).setParameter(2, JobState.RUNNING).getSingleResult());
    }

    /** Background spend runs of other tests may still be going; this test needs the kind idle. */
    private void awaitNoneRunning(JobKind kind) {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (runningCount(kind) > 0) {
            assertTrue(System.nanoTime() < deadline, "a " + kind.words() + " of another test kept running");
            pause(100);
        }
    }

    /** The jobs made here do no work: end them so other tests find the kind idle. */
    private void finishRunning(JobKind kind) {
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "update background_job set state = 'DONE' where kind = ?1 and state = 'RUNNING'")
                .setParameter(1, kind.name()).executeUpdate());
    }
}
