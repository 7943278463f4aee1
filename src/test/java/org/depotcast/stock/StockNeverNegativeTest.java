package org.depotcast.stock;

import io.quarkus.test.TestTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.common.BusinessRuleException;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The ledger's rule that stock is never issued below zero, at the service (not only through HTTP). Everything here
 * runs in the test's transaction, rolled back at its end, so the shared demo data are left as they were.
 */
@QuarkusTest
class StockNeverNegativeTest {
    @Inject
    StockLedgerService ledger;
    @Inject
    StockQueryService stock;
    @Inject
    TestData data;

    @Test
    @TestTransaction
    void anIssueOfMoreThanOnHandIsRefused() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String kit = data.kit(depot, "mechanic1");
        data.asSystem(() -> ledger.postWithin(MovementCommand.of(MovementKind.COUNT_ADJUSTMENT, part, null, depot,
                BigDecimal.valueOf(5), "counted")));

        data.asSystem(() -> ledger.postWithin(MovementCommand.of(MovementKind.ISSUE_TO_KIT, part, depot, kit,
                BigDecimal.valueOf(5), "all of it")));
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(part, depot)), "issuing exactly what is on hand is allowed");

        // Last: the refusal marks the test's transaction for rollback.
        BusinessRuleException refused = assertThrows(BusinessRuleException.class, () -> data.asSystem(() ->
                ledger.postWithin(MovementCommand.of(MovementKind.ISSUE_TO_KIT, part, depot, kit, BigDecimal.ONE,
                        "one more than on hand"))));
        assertEquals("quantity", refused.field());
    }
}
