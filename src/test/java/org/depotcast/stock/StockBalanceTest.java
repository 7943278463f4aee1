package org.depotcast.stock;

import org.depotcast.common.Bounds;
import org.depotcast.common.BusinessRuleException;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class StockBalanceTest {
    @Test
    void aBalanceBeyondWhatTheColumnHoldsIsARuleViolationNamingTheQuantity() {
        StockBalance balance = new StockBalance();
        balance.onHand = Bounds.BALANCE_CAPACITY.subtract(new BigDecimal("5"));
        balance.add(new BigDecimal("5"));
        assertEquals(0, balance.onHand.compareTo(Bounds.BALANCE_CAPACITY));
        BusinessRuleException e = assertThrows(BusinessRuleException.class, () -> balance.add(new BigDecimal("0.001")));
        assertEquals("quantity", e.field());
        assertEquals(0, balance.onHand.compareTo(Bounds.BALANCE_CAPACITY), "unchanged");
    }
}
