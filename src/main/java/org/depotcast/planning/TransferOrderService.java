package org.depotcast.planning;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.PersistenceException;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.common.Quantities;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Transfers between the central store and depots: dispatched out of the donor into transit, received at the
 * destination in one or more receipts, with what was lost or damaged on the way written off out of transit, all
 * through the ledger. A dispatch sent again under the same idempotency key is answered with the first transfer.
 * Receipts are {@link TransferReceiptService}'s.
 */
@ApplicationScoped
public class TransferOrderService {
    static final String IN_TRANSIT = "IN-TRANSIT";

    private final Orders orders;
    private final LocationService locations;
    private final PartService parts;
    private final StockLedgerService ledger;
    private final CurrentUser currentUser;
    private final AccessScope scope;
    private final AuditService audit;
    private final Clock clock;
    private final TransferNames.Reader names;

    @ApplicationScoped
    static class Orders implements PanacheRepository<TransferOrder> {
        Optional<TransferOrder> byKey(String owner, String key) {
            return find("idempotencyOwner = ?1 and idempotencyKey = ?2", owner, key).firstResultOptional();
        }

        /** In transit first, newest first within each state; each filter only when given. */
        List<TransferOrder> search(Long fromId, Long toId, TransferOrder.Status state) {
            StringBuilder where = new StringBuilder("1 = 1");
            io.quarkus.panache.common.Parameters params = new io.quarkus.panache.common.Parameters();
            if (fromId != null) {
                where.append(" and fromId = :from");
                params = params.and("from", fromId);
            }
            if (toId != null) {
                where.append(" and toId = :to");
                params = params.and("to", toId);
            }
            if (state != null) {
                where.append(" and status = :state");
                params = params.and("state", state);
            }
            // Stored as text, IN_TRANSIT sorts before RECEIVED.
            return list(where + " order by status, id desc", params);
        }

        /** Units still on the road to a location, per part id: dispatched, not yet received or written off. */
        Map<Long, BigDecimal> onTheWayTo(long toId) {
            Map<Long, BigDecimal> byPart = new HashMap<>();
            for (TransferOrder o : list("toId = ?1 and status = ?2", toId, TransferOrder.Status.IN_TRANSIT)) {
                byPart.merge(o.partId, o.outstanding(), BigDecimal::add);
            }
            return byPart;
        }
    }

    TransferOrderService(Orders orders, LocationService locations, PartService parts, StockLedgerService ledger,
                         CurrentUser currentUser, AccessScope scope, AuditService audit, Clock clock,
                         TransferNames.Reader names) {
        this.names = names;
        this.orders = orders;
        this.locations = locations;
        this.parts = parts;
        this.ledger = ledger;
        this.currentUser = currentUser;
        this.scope = scope;
        this.audit = audit;
        this.clock = clock;
    }

    /** A dispatch, and whether it was made before under the same key (a resend). */
    public record Dispatched(TransferResponses.Order order, boolean replayed) {
    }

    /**
     * Sends stock on its way: out of the donor into transit, in one transaction with the transfer. With a key, a
     * resend of the same dispatch returns the first transfer and a different dispatch under it is a 409 naming the
     * field that differs; two resends racing are settled by the key's unique constraint.
     */
    public Dispatched dispatch(PlanningRequests.TransferRequest r) {
        String actor = currentUser.name();
        IdempotencyKey key = IdempotencyKey.client("transfer-dispatch", r.idempotencyKey());
        try {
            return QuarkusTransaction.requiringNew().call(() -> dispatchOnce(r, actor, key));
        } catch (PersistenceException e) {
            Optional<TransferOrder> earlier = key == null ? Optional.empty()
                    : QuarkusTransaction.requiringNew().call(() -> orders.byKey(key.ownerFor(actor), key.key()));
            if (earlier.isEmpty()) {
                throw e;
            }
            return QuarkusTransaction.requiringNew().call(() -> replay(orders.findById(earlier.get().id), r));
        }
    }

    private Dispatched dispatchOnce(PlanningRequests.TransferRequest r, String actor, IdempotencyKey key) {
        if (key != null) {
            Optional<TransferOrder> earlier = orders.byKey(key.ownerFor(actor), key.key());
            if (earlier.isPresent()) {
                return replay(earlier.get(), r);
            }
        }
        LocationSummary from = locations.requireSummary("from", r.from());
        LocationSummary to = locations.requireSummary("to", r.to());
        scope.require(from.id(), from.code());
        for (LocationSummary l : List.of(from, to)) {
            if (l.kind() != LocationKind.DEPOT && l.kind() != LocationKind.CENTRAL_STORE) {
                throw new BusinessRuleException(l == from ? "from" : "to", "transfers run between the central store and depots");
            }
        }
        if (from.id() == to.id()) {
            throw new BusinessRuleException("to", "from and to must be different locations");
        }
        TransferOrder order = new TransferOrder();
        PartSummary part = parts.requireSummary("partNumber", r.partNumber());
        order.partId = part.id();
        order.quantity = Quantities.requirePositive("quantity", r.quantity(), part.unitOfIssue().wholeUnits());
        order.fromId = from.id();
        order.toId = to.id();
        order.status = TransferOrder.Status.IN_TRANSIT;
        order.dispatchedAt = OffsetDateTime.now(clock);
        order.actor = actor;
        if (key != null) {
            order.idempotencyOwner = key.ownerFor(actor);
            order.idempotencyKey = key.key();
        }
        orders.persist(order);
        orders.flush();
        ledger.postWithin(new MovementCommand(MovementKind.TRANSFER, r.partNumber(), from.code(), IN_TRANSIT,
                order.quantity, order.dispatchedAt, "transfer dispatched to " + to.code(), "transfer " + order.id, null,
                null, null));
        TransferResponses.Order dispatched = TransferResponses.Order.from(order, names.read());
        audit.record("TRANSFER_DISPATCHED", "transfer_order", Long.toString(order.id), null, dispatched);
        return new Dispatched(dispatched, false);
    }

    private Dispatched replay(TransferOrder earlier, PlanningRequests.TransferRequest r) {
        TransferNames known = names.read();
        String differs = !known.partNumber(earlier).equals(r.partNumber()) ? "partNumber"
                : !known.fromCode(earlier).equals(r.from()) ? "from"
                : !known.toCode(earlier).equals(r.to()) ? "to"
                : r.quantity() == null || earlier.quantity.compareTo(r.quantity()) != 0 ? "quantity" : null;
        if (differs != null) {
            throw new ConflictException(differs, "key '" + r.idempotencyKey() + "' was already used for transfer "
                    + earlier.id + " with another " + differs);
        }
        return new Dispatched(TransferResponses.Order.from(earlier, known), true);
    }

    /** Transfers touching the caller's locations, in transit first, newest first within each state. */
    @Transactional
    public List<TransferResponses.Order> list(String fromCode, String toCode, TransferOrder.Status state) {
        Long fromId = fromCode == null ? null : locations.requireSummary("from", fromCode).id();
        Long toId = toCode == null ? null : locations.requireSummary("to", toCode).id();
        var visible = scope.current();
        TransferNames known = names.read();
        return orders.search(fromId, toId, state).stream()
                .filter(t -> visible.sees(t.fromId) || visible.sees(t.toId))
                .map(t -> TransferResponses.Order.from(t, known)).toList();
    }

    @Transactional
    public TransferResponses.Order get(long id) {
        TransferOrder order = orders.findByIdOptional(id).orElseThrow(() -> new EntityMissingException(null, "transfer", id));
        var visible = scope.current();
        if (!visible.sees(order.fromId) && !visible.sees(order.toId)) {
            throw new io.quarkus.security.ForbiddenException("transfer " + id + " runs between locations not assigned to you");
        }
        return TransferResponses.Order.from(order, names.read());
    }
}
