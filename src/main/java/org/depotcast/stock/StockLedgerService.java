package org.depotcast.stock;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.PersistenceException;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.Objects;
import java.util.Optional;

/**
 * The only writer of stock. Each movement and the balances it changes are written in one transaction; balances are
 * locked (pessimistically, in location-id order so two transfers cannot deadlock) before they are read, so two
 * mechanics drawing the last unit cannot both succeed and no balance goes below zero.
 */
@ApplicationScoped
public class StockLedgerService {
    private static final int ATTEMPTS = 3;

    private final StockBalanceWriter balanceWriter;
    private final StockMovementRepository movements;
    private final LocationService locations;
    private final PartService parts;
    private final CurrentUser currentUser;
    private final AccessScope scope;
    private final AuditService audit;
    private final Clock clock;

    StockLedgerService(StockBalanceWriter balanceWriter, StockMovementRepository movements, LocationService locations,
                       PartService parts, CurrentUser currentUser, AccessScope scope, AuditService audit,
                       Clock clock) {
        this.audit = audit;
        this.scope = scope;
        this.balanceWriter = balanceWriter;
        this.movements = movements;
        this.locations = locations;
        this.parts = parts;
        this.currentUser = currentUser;
        this.clock = clock;
    }

    /**
     * Posts a movement a client asked for, in a transaction of its own. Stock enters and leaves transit only with a
     * transfer order (see planning's transfers), never as a movement of its own: the order knows where the stock is
     * going, so nobody can re-point it to another depot. A race on creating a new balance row or on the idempotency
     * key surfaces as a constraint violation; it is retried, and a resend under a known key returns the movement
     * already posted (read and compared inside a transaction, so the loser of a race is answered like any resend).
     */
    public PostedMovement post(MovementCommand command) {
        String actor = currentUser.name();
        for (int attempt = 1; ; attempt++) {
            try {
                return QuarkusTransaction.requiringNew().call(() -> postAs(command, actor, false));
            } catch (PersistenceException e) {
                Optional<PostedMovement> earlier = command.idempotencyKey() == null ? Optional.empty()
                        : QuarkusTransaction.requiringNew().call(() -> earlier(command, actor));
                if (earlier.isPresent()) {
                    return earlier.get();
                }
                if (attempt == ATTEMPTS) {
                    throw new ConflictException(null, "the stock record was busy; try again");
                }
            }
        }
    }

    /**
     * Posts inside the caller's transaction (a repair with its consumptions, a receipt with its order line, a
     * transfer's legs into and out of transit).
     */
    @Transactional(Transactional.TxType.MANDATORY)
    public PostedMovement postWithin(MovementCommand command) {
        try {
            return postAs(command, currentUser.name(), true);
        } catch (SameKeyPostedMeanwhile e) {
            // The caller's transaction rolls back with this; a resend then gets the movement posted meanwhile.
            throw new ConflictException("idempotencyKey", "a movement under this key was posted at the same moment; "
                    + "send again to receive it");
        }
    }

    private PostedMovement postAs(MovementCommand command, String actor, boolean fromService) {
        Optional<PostedMovement> resent = earlier(command, actor);
        if (resent.isPresent()) {
            return resent.get();
        }
        if (command.kind() == null) {
            throw new InvalidInputException("kind", "is required");
        }
        PartSummary part = parts.requireSummary("partNumber", command.partNumber());
        BigDecimal quantity = Quantities.requirePositive("quantity", command.quantity(), part.unitOfIssue().wholeUnits());
        Location from = command.fromCode() == null ? null : locations.require("from", command.fromCode());
        Location to = command.toCode() == null ? null : locations.require("to", command.toCode());
        String endsProblem = command.kind().endsProblem(from == null ? null : from.kind, to == null ? null : to.kind,
                from != null && to != null && from.id.equals(to.id));
        if (endsProblem != null) {
            throw new BusinessRuleException(from != null && to != null && from.id.equals(to.id) ? "to" : "kind", endsProblem);
        }
        if (command.kind() == MovementKind.ISSUE_TO_KIT || command.kind() == MovementKind.RETURN) {
            Location kit = command.kind() == MovementKind.ISSUE_TO_KIT ? to : from;
            Location depot = command.kind() == MovementKind.ISSUE_TO_KIT ? from : to;
            if (!kit.parent.id.equals(depot.id)) {
                throw new BusinessRuleException("to", "kit '" + kit.code + "' belongs to depot '" + kit.parent.code + "'");
            }
        }
        if (!fromService && (isTransit(from) || isTransit(to))) {
            throw new BusinessRuleException(isTransit(from) ? "from" : "to", "stock goes into and out of transit only by "
                    + "dispatching and receiving a transfer (/api/planning/transfers)");
        }
        requireMayAct(command.kind(), from, to);
        return write(command, part, from, to, quantity, actor);
    }

    /**
     * Writes off stock lost or damaged on the way, out of the in-transit location, inside the caller's transaction.
     * Only transfers use transit: their service has checked that the caller may receive at the destination, and the
     * movement API cannot reach transit stock this way.
     */
    @Transactional(Transactional.TxType.MANDATORY)
    public PostedMovement writeOffFromTransitWithin(MovementCommand command) {
        Location from = locations.require("from", command.fromCode());
        if (command.kind() != MovementKind.WRITE_OFF || command.toCode() != null || from.kind != LocationKind.IN_TRANSIT) {
            throw new IllegalArgumentException("a write-off from transit leaves the in-transit location for nowhere");
        }
        PartSummary part = parts.requireSummary("partNumber", command.partNumber());
        BigDecimal quantity = Quantities.requirePositive("quantity", command.quantity(), part.unitOfIssue().wholeUnits());
        return write(command, part, from, null, quantity, currentUser.name());
    }

    private PostedMovement write(MovementCommand command, PartSummary part, Location from, Location to, BigDecimal quantity,
                                 String actor) {
        balanceWriter.move(part, from, to, quantity);
        if (command.idempotencyKey() != null) {
            // Same-key posts queue on the balance locks just taken; the one after the winner sees its movement.
            if (earlier(command, actor).isPresent()) {
                throw new SameKeyPostedMeanwhile();
            }
        }
        StockMovement movement = new StockMovement();
        movement.kind = command.kind();
        movement.partId = part.id();
        movement.fromLocation = from;
        movement.toLocation = to;
        movement.quantity = quantity;
        movement.recordedAt = OffsetDateTime.now(clock);
        movement.occurredAt = command.occurredAt() == null ? movement.recordedAt : command.occurredAt();
        movement.actor = actor;
        movement.reason = command.reason();
        movement.reference = command.reference();
        if (command.idempotencyKey() != null) {
            movement.idempotencyOwner = command.idempotencyKey().ownerFor(actor);
            movement.idempotencyKey = command.idempotencyKey().key();
        }
        movement.purchaseOrderLineId = command.purchaseOrderLineId();
        movement.repairId = command.repairId();
        movements.persist(movement);
        movements.flush();
        MovementResponse posted = MovementResponse.from(movement, part.partNumber());
        audit.record("MOVEMENT_POSTED", "stock_movement", Long.toString(movement.id), null, posted);
        return new PostedMovement(posted, false);
    }

    /**
     * A same-key movement committed while this one waited for the balance locks: roll this attempt back (its balance
     * changes too) and answer as a resend.
     */
    private static final class SameKeyPostedMeanwhile extends PersistenceException {
    }

    /** The movement already posted under this command's key by the same owner, if any, checked to be the same. */
    private Optional<PostedMovement> earlier(MovementCommand command, String actor) {
        IdempotencyKey key = command.idempotencyKey();
        if (key == null) {
            return Optional.empty();
        }
        return movements.byIdempotencyKey(key.ownerFor(actor), key.key())
                .map(m -> replay(m, parts.summariesById().get(m.partId).partNumber(), command));
    }

    /**
     * The location stock leaves from (or, for stock arriving from outside or from transit, the one it arrives at)
     * must be the caller's; mechanics may only use and return parts from their own kit.
     */
    private void requireMayAct(MovementKind kind, Location from, Location to) {
        AccessScope.Scope current = scope.current();
        if (current.everything()) {
            return;
        }
        if (current.mechanic() != null && kind != MovementKind.CONSUMPTION && kind != MovementKind.RETURN) {
            throw new io.quarkus.security.ForbiddenException("mechanics record consumption and returns from their own kit");
        }
        Location acting = from != null && from.kind != LocationKind.IN_TRANSIT ? from : to;
        scope.require(acting.id, acting.code);
    }

    private static boolean isTransit(Location location) {
        return location != null && location.kind == LocationKind.IN_TRANSIT;
    }

    private static PostedMovement replay(StockMovement earlier, String partNumber, MovementCommand command) {
        boolean same = earlier.kind == command.kind()
                && Objects.equals(partNumber, command.partNumber())
                && command.quantity() != null && earlier.quantity.compareTo(command.quantity()) == 0
                && Objects.equals(earlier.fromLocation == null ? null : earlier.fromLocation.code, command.fromCode())
                && Objects.equals(earlier.toLocation == null ? null : earlier.toLocation.code, command.toCode());
        if (!same) {
            throw new ConflictException("idempotencyKey", "key '" + command.idempotencyKey().key()
                    + "' was already used for a different movement");
        }
        return new PostedMovement(MovementResponse.from(earlier, partNumber), true);
    }
}
