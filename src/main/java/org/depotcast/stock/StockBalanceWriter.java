package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.NotEnoughStockException;
import org.depotcast.common.Quantities;

import java.math.BigDecimal;

/**
 * The balance side of a movement, for {@link StockLedgerService} alone: each balance row is locked before it is read
 * ({@code SELECT … FOR UPDATE}), in location-id order so two opposite transfers of one part cannot wait on each other;
 * a balance never goes below zero, and a location's first stock of a part creates its row.
 */
@ApplicationScoped
class StockBalanceWriter {
    private final StockBalanceRepository balances;

    StockBalanceWriter(StockBalanceRepository balances) {
        this.balances = balances;
    }

    /** Takes {@code quantity} from {@code from} and gives it to {@code to}; either may be null (outside the programme). */
    @Transactional(Transactional.TxType.MANDATORY)
    void move(PartSummary part, Location from, Location to, BigDecimal quantity) {
        boolean fromFirst = to == null || (from != null && from.id < to.id);
        if (fromFirst) {
            take(part, from, quantity);
            give(part, to, quantity);
        } else {
            give(part, to, quantity);
            take(part, from, quantity);
        }
    }

    private void take(PartSummary part, Location from, BigDecimal quantity) {
        if (from == null) {
            return;
        }
        // A part never held there is a draw of more than the books show (0), answered as any other such draw.
        StockBalance balance = balances.lockedFor(part.id(), from.id).orElseThrow(() -> new NotEnoughStockException("quantity",
                "only 0 of part '" + part.partNumber() + "' on hand at '" + from.code + "', cannot take "
                        + quantity.stripTrailingZeros().toPlainString()));
        balance.take(quantity, part.partNumber(), from.code);
    }

    private void give(PartSummary part, Location to, BigDecimal quantity) {
        if (to == null) {
            return;
        }
        StockBalance balance = balances.lockedFor(part.id(), to.id).orElseGet(() -> {
            StockBalance created = new StockBalance();
            created.partId = part.id();
            created.location = to;
            created.onHand = BigDecimal.ZERO.setScale(Quantities.SCALE);
            balances.persist(created);
            balances.flush();
            return created;
        });
        balance.add(quantity);
    }
}
