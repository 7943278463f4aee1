package org.depotcast.stock;

import java.math.BigDecimal;
import java.util.List;

/** Proof that every stored balance equals the sum of its ledger lines, with any pair that does not. */
public record ReconcileReport(int balancesChecked, long movementsCounted, boolean consistent, List<Mismatch> mismatches) {
    public record Mismatch(String partNumber, String locationCode, BigDecimal balance, BigDecimal ledgerSum) {
    }
}
