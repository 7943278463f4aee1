package org.depotcast.stock;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.common.BusinessRuleException;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * 10,000 random movements of every kind, some of which must be refused; afterwards every balance equals both an
 * independent in-test model and the ledger sum, and none is negative.
 */
@QuarkusTest
class RandomLedgerTest {
    @Inject
    TestData data;
    @Inject
    StockLedgerService ledger;
    @Inject
    StockQueryService queries;

    @Test
    void balancesEqualLedgerSumsAfterTenThousandMovements() {
        SplittableRandom random = new SplittableRandom(7);
        List<String> parts = List.of(data.part(UnitOfIssue.EACH), data.part(UnitOfIssue.EACH), data.part(UnitOfIssue.EACH));
        String depotA = data.depot(), depotB = data.depot();
        String kitA = data.kit(depotA, "mechanic3"), kitB = data.kit(depotB, "mechanic4");
        Map<String, Integer> model = new HashMap<>();
        int refused = 0;
        for (int i = 0; i < 10_000; i++) {
            String part = parts.get(random.nextInt(parts.size()));
            int quantity = 1 + random.nextInt(4);
            MovementCommand command = switch (random.nextInt(7)) {
                case 0 -> MovementCommand.of(MovementKind.COUNT_ADJUSTMENT, part, null, pick(random, depotA, depotB), BigDecimal.valueOf(quantity + 3), "r");
                case 1 -> random.nextBoolean() ? MovementCommand.of(MovementKind.TRANSFER, part, depotA, depotB, BigDecimal.valueOf(quantity), "r")
                        : MovementCommand.of(MovementKind.TRANSFER, part, depotB, depotA, BigDecimal.valueOf(quantity), "r");
                case 2 -> random.nextBoolean() ? MovementCommand.of(MovementKind.ISSUE_TO_KIT, part, depotA, kitA, BigDecimal.valueOf(quantity), "r")
                        : MovementCommand.of(MovementKind.ISSUE_TO_KIT, part, depotB, kitB, BigDecimal.valueOf(quantity), "r");
                case 3 -> MovementCommand.of(MovementKind.CONSUMPTION, part, pick(random, kitA, kitB), null, BigDecimal.valueOf(quantity), "r");
                case 4 -> random.nextBoolean() ? MovementCommand.of(MovementKind.RETURN, part, kitA, depotA, BigDecimal.valueOf(quantity), "r")
                        : MovementCommand.of(MovementKind.RETURN, part, kitB, depotB, BigDecimal.valueOf(quantity), "r");
                case 5 -> MovementCommand.of(MovementKind.WRITE_OFF, part, pick(random, depotA, depotB, kitA), null, BigDecimal.valueOf(quantity), "r");
                default -> MovementCommand.of(MovementKind.RECEIPT, part, null, pick(random, depotA, depotB), BigDecimal.valueOf(quantity), "r");
            };
            String fromKey = command.fromCode() == null ? null : part + "@" + command.fromCode();
            boolean enough = fromKey == null || model.getOrDefault(fromKey, 0) >= quantityOf(command);
            try {
                data.asSystem(() -> ledger.post(command));
                assertTrue(enough, "ledger accepted a draw the model says is short");
                if (fromKey != null) {
                    model.merge(fromKey, -quantityOf(command), Integer::sum);
                }
                if (command.toCode() != null) {
                    model.merge(part + "@" + command.toCode(), quantityOf(command), Integer::sum);
                }
            } catch (BusinessRuleException e) {
                assertTrue(!enough, "ledger refused a draw the model says is covered: " + e.getMessage());
                refused++;
            }
        }
        assertTrue(refused > 100, "the sequence should include refused draws, had " + refused);
        for (Map.Entry<String, Integer> cell : model.entrySet()) {
            String[] key = cell.getKey().split("@");
            assertEquals(cell.getValue().intValue(), queries.onHand(key[0], key[1]).intValueExact(), cell.getKey());
            assertTrue(cell.getValue() >= 0);
        }
        ReconcileReport report = data.asSystem(queries::reconcile);
        assertTrue(report.consistent(), () -> "mismatches: " + report.mismatches());
    }

    private static int quantityOf(MovementCommand command) {
        return command.quantity().intValueExact();
    }

    private static String pick(SplittableRandom random, String... options) {
        return options[random.nextInt(options.length)];
    }
}
