package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.LockModeType;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.common.Quantities;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.Objects;
import java.util.Optional;

import static org.depotcast.planning.TransferOrderService.IN_TRANSIT;

/**
 * Arrivals of transfers ({@link TransferOrderService} dispatches them): each receipt books what was received into
 * the destination and writes off what was lost or damaged out of transit, through the ledger, in one transaction
 * with the receipt. A receipt sent again under its key changes nothing; receiving a transfer that has ended answers
 * it as it is.
 */
@ApplicationScoped
public class TransferReceiptService {
    private final TransferOrderService.Orders orders;
    private final StockLedgerService ledger;
    private final CurrentUser currentUser;
    private final AccessScope scope;
    private final AuditService audit;
    private final Clock clock;
    private final TransferNames.Reader names;

    TransferReceiptService(TransferOrderService.Orders orders, StockLedgerService ledger, CurrentUser currentUser,
                           AccessScope scope, AuditService audit, Clock clock, TransferNames.Reader names) {
        this.names = names;
        this.orders = orders;
        this.ledger = ledger;
        this.currentUser = currentUser;
        this.scope = scope;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * Books an arrival: {@code received} into the destination, {@code writtenOff} (with its reason) out of transit
     * as lost or damaged. Without quantities, everything still outstanding is received. A transfer that has ended
     * is answered as it is; a receipt sent again under its key changes nothing.
     */
    @Transactional
    public TransferResponses.Order receive(long id, PlanningRequests.ReceiveRequest r) {
        TransferOrder order = orders.findById(id, LockModeType.PESSIMISTIC_WRITE);
        if (order == null) {
            throw new EntityMissingException(null, "transfer", id);
        }
        TransferNames known = names.read();
        scope.require(order.toId, known.toCode(order));
        PlanningRequests.ReceiveRequest body = r == null ? new PlanningRequests.ReceiveRequest(null, null, null, null) : r;
        IdempotencyKey key = IdempotencyKey.client("transfer-receipt", body.idempotencyKey());
        if (key != null) {
            String owner = key.ownerFor(currentUser.name());
            Optional<TransferReceipt> earlier = order.receipts.stream()
                    .filter(x -> owner.equals(x.idempotencyOwner) && key.key().equals(x.idempotencyKey)).findFirst();
            if (earlier.isPresent()) {
                requireSame(earlier.get(), body);
                return TransferResponses.Order.from(order, known);
            }
        }
        if (order.status == TransferOrder.Status.RECEIVED) {
            return TransferResponses.Order.from(order, known);
        }
        TransferReceipt receipt = receipt(order, body, known.part(order).unitOfIssue().wholeUnits());
        if (key != null) {
            receipt.idempotencyOwner = key.ownerFor(currentUser.name());
            receipt.idempotencyKey = key.key();
        }
        TransferResponses.Order before = TransferResponses.Order.from(order, known);
        order.book(receipt);
        orders.flush();
        post(order, receipt, known);
        TransferResponses.Order after = TransferResponses.Order.from(order, known);
        audit.record("TRANSFER_RECEIVED", "transfer_order", Long.toString(order.id), before, after);
        return after;
    }

    private TransferReceipt receipt(TransferOrder order, PlanningRequests.ReceiveRequest body, boolean wholeUnits) {
        BigDecimal writtenOff = body.writtenOffQuantity() == null || body.writtenOffQuantity().signum() == 0 ? BigDecimal.ZERO
                : Quantities.requirePositive("writtenOffQuantity", body.writtenOffQuantity(), wholeUnits);
        BigDecimal received = body.receivedQuantity() == null
                ? (writtenOff.signum() == 0 ? order.outstanding() : BigDecimal.ZERO)
                : body.receivedQuantity().signum() == 0 ? BigDecimal.ZERO
                : Quantities.requirePositive("receivedQuantity", body.receivedQuantity(), wholeUnits);
        if (received.add(writtenOff).signum() == 0) {
            throw new BusinessRuleException("receivedQuantity", "receive or write off at least one unit");
        }
        if (received.add(writtenOff).compareTo(order.outstanding()) > 0) {
            throw new BusinessRuleException(body.receivedQuantity() != null ? "receivedQuantity" : "writtenOffQuantity",
                    "only " + order.outstanding().stripTrailingZeros().toPlainString() + " of transfer " + order.id
                            + " is still in transit");
        }
        if (writtenOff.signum() > 0 && (body.writeOffReason() == null || body.writeOffReason().isBlank())) {
            throw new BusinessRuleException("writeOffReason", "say why stock is written off (lost, damaged in transit…)");
        }
        TransferReceipt receipt = new TransferReceipt();
        receipt.receivedQuantity = received;
        receipt.writtenOffQuantity = writtenOff;
        receipt.writeOffReason = writtenOff.signum() > 0 ? body.writeOffReason().strip() : null;
        receipt.recordedAt = OffsetDateTime.now(clock);
        receipt.actor = currentUser.name();
        return receipt;
    }

    private void post(TransferOrder order, TransferReceipt receipt, TransferNames known) {
        String reference = "transfer " + order.id;
        if (receipt.receivedQuantity.signum() > 0) {
            ledger.postWithin(new MovementCommand(MovementKind.TRANSFER, known.partNumber(order), IN_TRANSIT,
                    known.toCode(order), receipt.receivedQuantity, receipt.recordedAt,
                    "transfer received from " + known.fromCode(order), reference, null, null, null));
        }
        if (receipt.writtenOffQuantity.signum() > 0) {
            ledger.writeOffFromTransitWithin(new MovementCommand(MovementKind.WRITE_OFF, known.partNumber(order),
                    IN_TRANSIT, null, receipt.writtenOffQuantity, receipt.recordedAt,
                    "in transit from " + known.fromCode(order) + " to " + known.toCode(order) + ": "
                            + receipt.writeOffReason,
                    reference, null, null, null));
        }
    }

    private static void requireSame(TransferReceipt earlier, PlanningRequests.ReceiveRequest body) {
        String differs = body.receivedQuantity() != null && earlier.receivedQuantity.compareTo(body.receivedQuantity()) != 0
                ? "receivedQuantity"
                : body.writtenOffQuantity() != null && earlier.writtenOffQuantity.compareTo(body.writtenOffQuantity()) != 0
                ? "writtenOffQuantity"
                : body.writeOffReason() != null && !Objects.equals(body.writeOffReason().strip(), earlier.writeOffReason)
                ? "writeOffReason" : null;
        if (differs != null) {
            throw new ConflictException(differs, "key '" + body.idempotencyKey() + "' was already used for a receipt "
                    + "with another " + differs);
        }
    }
}
