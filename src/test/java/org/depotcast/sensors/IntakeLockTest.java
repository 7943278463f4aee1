package org.depotcast.sensors;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.access.SystemWork;
import org.junit.jupiter.api.Test;

import java.time.OffsetDateTime;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import static org.depotcast.TestThreads.await;
import static org.depotcast.TestThreads.pause;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A file of readings rewrites its pump-months whole, so a second instance sharing the database must wait for the
 * first file's transaction: the file holds the database row lock {@link SensorIntakeService#INTAKE_LOCK} from its
 * first row to its commit. Here another transaction (what a second instance's file would do) tries to take the lock
 * while a file is half read: it gets it only after that file is committed. One JVM's lock could not do this.
 */
@QuarkusTest
class IntakeLockTest {
    @Inject
    SensorIntakeService intake;
    @Inject
    SystemWork system;
    @Inject
    EntityManager em;

    @Test
    void aSecondInstancesFileWaitsForTheFirstFilesCommit() throws Exception {
        CountDownLatch halfRead = new CountDownLatch(1);
        CountDownLatch otherTrying = new CountDownLatch(1);
        long[] fileReadAt = new long[1];
        CompletableFuture<IntakeResult> file = CompletableFuture.supplyAsync(() -> system.call("test-intake",
                () -> {
                    IntakeResult result = intake.intake(rows -> {
                        halfRead.countDown();
                        await(otherTrying);
                        pause(600); // the other transaction is now waiting on the lock, if the file holds it
                        rows.accept(new RawReading(2, "OB-00001", "2026-03-02", "4.5", null, null, null));
                        fileReadAt[0] = System.nanoTime();
                    });
                    return result;
                }));
        await(halfRead);
        CompletableFuture<Long> other = CompletableFuture.supplyAsync(() -> {
            otherTrying.countDown();
            QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                            "update job_start_lock set last_start_at = ?1 where kind = ?2")
                    .setParameter(1, OffsetDateTime.now()).setParameter(2, SensorIntakeService.INTAKE_LOCK)
                    .executeUpdate());
            return System.nanoTime();
        });
        Thread.sleep(300);
        assertFalse(other.isDone(), "the other transaction waits while the file is being read");
        IntakeResult taken = file.get(30, TimeUnit.SECONDS);
        long lockTakenAt = other.get(30, TimeUnit.SECONDS);
        assertEquals(1, taken.taken(), "the file's one reading was taken: " + taken);
        assertTrue(lockTakenAt > fileReadAt[0], "the other transaction got the lock only after the whole file was "
                + "read, at its commit: " + (lockTakenAt - fileReadAt[0]) / 1_000_000 + " ms after");
    }
}
