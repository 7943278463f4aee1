package org.depotcast.repairs;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.security.ForbiddenException;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.EntityMissingException;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.StockQueryService;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

/**
 * The stores officer's notices of repairs refused for parts the kit's books did not hold. A refusal is written in a
 * transaction of its own after the repair's has rolled back (the refused repair itself writes nothing); the repair
 * recorded later closes its notice in the repair's own transaction; the officer may dismiss one, and the mechanic
 * who discards the refused repair on the phone withdraws it.
 */
@ApplicationScoped
public class RefusedRepairService {
    private final RefusedRepairRepository notices;
    private final StockQueryService stock;
    private final LocationService locations;
    private final PumpQueryService pumps;
    private final PartService parts;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final Clock clock;

    RefusedRepairService(RefusedRepairRepository notices, StockQueryService stock, LocationService locations,
                         PumpQueryService pumps, PartService parts, AccessScope scope, CurrentUser currentUser,
                         AuditService audit, Clock clock) {
        this.notices = notices;
        this.stock = stock;
        this.locations = locations;
        this.pumps = pumps;
        this.parts = parts;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * Runs a repair's work in a transaction of its own; when the ledger refuses its parts, notes the refusal for the
     * officer once that transaction has rolled back, and answers the refusal as it was.
     */
    <T> T noting(Supplier<T> repairWork) {
        try {
            return QuarkusTransaction.requiringNew().call(repairWork::get);
        } catch (RefusedRepairException refused) {
            refused.noted(note(refused.refusal()));
            throw refused;
        }
    }

    /**
     * The notice's id, or null when none was written. Never lets the notice replace the mechanic's answer: a second
     * try settles a race on the reference; a failure after it is logged and the answer says the notice is missing.
     */
    private Long note(RefusedRepairException.Refusal refusal) {
        for (int attempt = 1; attempt <= 2; attempt++) {
            try {
                return QuarkusTransaction.requiringNew().call(() -> write(refusal));
            } catch (RuntimeException e) {
                if (attempt == 2) {
                    Log.errorf(e, "could not note the refused repair %s for the stores officer", refusal.repairRef());
                }
            }
        }
        return null;
    }

    private Long write(RefusedRepairException.Refusal refusal) {
        List<RefusedRepairLine> shortNow = new ArrayList<>();
        for (RefusedRepairException.Used used : refusal.used()) {
            BigDecimal held = stock.onHand(used.partNumber(), refusal.kitCode());
            if (held.compareTo(used.units()) < 0) {
                shortNow.add(RefusedRepairLine.of(used.partId(), used.units(), held));
            }
        }
        if (shortNow.isEmpty()) {
            return null; // booked since: the phone's next send records it, nothing for the officer to do
        }
        OffsetDateTime now = OffsetDateTime.now(clock);
        RefusedRepair notice = notices.byRef(refusal.repairRef()).orElse(null);
        boolean first = notice == null;
        if (first) {
            notice = new RefusedRepair();
            notice.repairRef = refusal.repairRef();
            notice.mechanic = refusal.mechanic();
            notice.kitId = refusal.kitId();
            notice.pumpId = refusal.pumpId();
            notice.fixedOn = refusal.fixedOn();
            notice.firstRefusedAt = now;
            notice.attempts = 0;
        }
        notice.refusedAgain(now, shortNow);
        if (first) {
            notices.persist(notice);
        }
        notices.flush();
        audit.record("REPAIR_REFUSED_FOR_STOCK", "refused-repair", notice.repairRef, null, view(notice));
        return notice.id;
    }

    /** In the repair's transaction: the repair is recorded, so its notice (if any) is closed. */
    @Transactional(Transactional.TxType.MANDATORY)
    void closeRecorded(String repairRef) {
        notices.byRef(repairRef).filter(n -> n.state == RefusedRepair.State.OPEN).ifPresent(notice -> {
            RefusedRepairNotice before = view(notice);
            notice.close(RefusedRepair.State.RECORDED, currentUser.name(), OffsetDateTime.now(clock));
            audit.record("REFUSED_REPAIR_RECORDED", "refused-repair", repairRef, before, view(notice));
        });
    }

    /**
     * Open notices at the kits of {@code depotCode} (all kits the caller sees when null); 403 for a depot outside
     * the caller's locations.
     */
    @Transactional
    public List<RefusedRepairNotice> open(String depotCode) {
        AccessScope.Scope visible = scope.current();
        List<Long> kits = new ArrayList<>();
        if (depotCode != null) {
            LocationSummary depot = locations.requireSummary("depot", depotCode);
            scope.require(depot.id(), depot.code());
        }
        for (LocationSummary kit : locations.summariesOfKind(LocationKind.KIT)) {
            if (visible.sees(kit.id()) && (depotCode == null || depotCode.equals(kit.parentCode()))) {
                kits.add(kit.id());
            }
        }
        return views(notices.openAt(kits));
    }

    /** The officer has seen to it (or it needs nothing): closes the notice; a closed one is answered as it is. */
    @Transactional
    public RefusedRepairNotice dismiss(long id) {
        RefusedRepair notice = notices.findByIdOptional(id)
                .orElseThrow(() -> new EntityMissingException(null, "refused repair", id));
        if (!scope.current().sees(notice.kitId)) {
            throw new ForbiddenException("refused repair " + id + " is at a kit outside the locations assigned to you");
        }
        return closeOpen(notice, RefusedRepair.State.DISMISSED, "REFUSED_REPAIR_DISMISSED");
    }

    /**
     * The mechanic discarded the refused repair on the phone: its notice is withdrawn (closed, "withdrawn by the
     * mechanic"). Only the mechanic whose repair was refused may (403 otherwise); a closed one is answered as it is,
     * so the phone's queue may send it again; 404 when no notice was written for that repair.
     */
    @Transactional
    public RefusedRepairNotice withdraw(String repairRef) {
        RefusedRepair notice = notices.byRef(repairRef)
                .orElseThrow(() -> new EntityMissingException(null, "refused repair", repairRef));
        if (!notice.mechanic.equals(currentUser.name())) {
            throw new ForbiddenException("refused repair " + repairRef + " was sent by another mechanic");
        }
        return closeOpen(notice, RefusedRepair.State.WITHDRAWN, "REFUSED_REPAIR_WITHDRAWN");
    }

    /** Closes an open notice as {@code state}, audited; a closed one is answered as it is (a resend changes nothing). */
    private RefusedRepairNotice closeOpen(RefusedRepair notice, RefusedRepair.State state, String auditAction) {
        if (notice.state != RefusedRepair.State.OPEN) {
            return view(notice);
        }
        RefusedRepairNotice before = view(notice);
        notice.close(state, currentUser.name(), OffsetDateTime.now(clock));
        notices.flush();
        RefusedRepairNotice after = view(notice);
        audit.record(auditAction, "refused-repair", notice.repairRef, before, after);
        return after;
    }

    private RefusedRepairNotice view(RefusedRepair notice) {
        return views(List.of(notice)).get(0);
    }

    private List<RefusedRepairNotice> views(List<RefusedRepair> list) {
        Map<Long, LocationSummary> kits = locations.summariesById();
        Map<Long, String> assetIds = pumps.assetIdsOf(list.stream().map(n -> n.pumpId).toList());
        Map<Long, PartSummary> partsById = parts.summariesById();
        return list.stream().map(n -> {
            LocationSummary kit = kits.get(n.kitId);
            List<RefusedRepairNotice.Line> lines = n.lines.stream().map(l -> {
                PartSummary part = partsById.get(l.partId);
                return new RefusedRepairNotice.Line(part.partNumber(), part.description(), part.unitOfIssue().name(),
                        l.unitsAsked.stripTrailingZeros(), l.unitsHeld.stripTrailingZeros());
            }).toList();
            return new RefusedRepairNotice(n.id, n.repairRef, n.mechanic, kit.code(), kit.parentCode(),
                    assetIds.get(n.pumpId), n.fixedOn, n.firstRefusedAt, n.lastRefusedAt, n.attempts, n.state,
                    n.closedAt, n.closedBy, n.closedReason, lines);
        }).toList();
    }
}
