package org.depotcast.stock;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.common.BusinessRuleException;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Many mechanics drawing the last units at once: exactly as many succeed as there were units. */
@QuarkusTest
class ConcurrentDrawTest {
    @Inject
    TestData data;
    @Inject
    StockLedgerService ledger;
    @Inject
    StockQueryService queries;

    @Test
    void onlyAsManyDrawsSucceedAsThereAreUnits() throws Exception {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String kit = data.kit(depot, "mechanic2");
        data.stock(part, depot, 5);
        int threads = 24;
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<Boolean>> results = new ArrayList<>();
        for (int i = 0; i < threads; i++) {
            results.add(pool.submit(() -> {
                start.await();
                try {
                    data.asSystem(() -> ledger.post(MovementCommand.of(MovementKind.ISSUE_TO_KIT, part, depot, kit,
                            BigDecimal.ONE, "race")));
                    return true;
                } catch (BusinessRuleException refused) {
                    return false;
                }
            }));
        }
        start.countDown();
        int succeeded = 0;
        for (Future<Boolean> result : results) {
            succeeded += result.get(60, TimeUnit.SECONDS) ? 1 : 0;
        }
        pool.shutdown();
        assertEquals(5, succeeded);
        assertEquals(0, queries.onHand(part, depot).signum());
        assertEquals(0, new BigDecimal(5).compareTo(queries.onHand(part, kit)));
        assertTrue(data.asSystem(queries::reconcile).consistent());
    }

    @Test
    void concurrentFirstReceiptsIntoANewBalanceAllLand() throws Exception {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        ExecutorService pool = Executors.newFixedThreadPool(8);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<?>> results = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            results.add(pool.submit(() -> {
                start.await();
                return data.asSystem(() -> ledger.post(MovementCommand.of(MovementKind.COUNT_ADJUSTMENT, part, null,
                        depot, BigDecimal.ONE, "found")));
            }));
        }
        start.countDown();
        for (Future<?> result : results) {
            result.get(60, TimeUnit.SECONDS);
        }
        pool.shutdown();
        assertEquals(0, new BigDecimal(8).compareTo(queries.onHand(part, depot)));
    }
}
