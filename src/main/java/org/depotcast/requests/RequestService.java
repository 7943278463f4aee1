package org.depotcast.requests;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import io.quarkus.security.ForbiddenException;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.LockModeType;
import jakarta.transaction.Transactional;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.Quantities;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The parts-request workflow: raised by a mechanic (offline-safe by client reference), approved in full or in part
 * (possibly as a compatible substitute) or refused by a stores officer of the depot, issued from the depot to the
 * kit through the ledger, then closed; cancellable until issued. Approved, unissued quantities are committed stock.
 * Every change takes a row lock on the request, so two officers acting at once cannot both succeed. Raising is
 * {@link RequestRaisingService}'s.
 */
@ApplicationScoped
public class RequestService {
    private final Requests requests;
    private final PartService parts;
    private final RequestDirectory directory;
    private final StockLedgerService ledger;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final Clock clock;

    @ApplicationScoped
    static class Requests implements PanacheRepository<PartsRequest> {
        Optional<PartsRequest> byClientRef(String clientRef) {
            return find("clientRef", clientRef).firstResultOptional();
        }
    }

    RequestService(Requests requests, PartService parts, RequestDirectory directory, StockLedgerService ledger,
                   AccessScope scope, CurrentUser currentUser, AuditService audit, Clock clock) {
        this.requests = requests;
        this.parts = parts;
        this.directory = directory;
        this.ledger = ledger;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.clock = clock;
    }

    @Transactional
    public RequestDtos.View approve(long id, RequestDtos.Approve body) {
        PartsRequest request = lockedForDepot(id);
        RequestNames names = directory.of(List.of(request));
        RequestDtos.View before = RequestDtos.View.from(request, names);
        boolean full = true;
        boolean any = false;
        for (int i = 0; i < body.lines().size(); i++) {
            RequestDtos.ApprovedLine a = body.lines().get(i);
            String field = "lines[" + i + "]";
            PartsRequestLine line = request.lines.stream()
                    .filter(l -> names.partNumber(l.partId).equals(a.partNumber())).findFirst().orElseThrow(() -> new BusinessRuleException(field + ".partNumber",
                            "part '" + a.partNumber() + "' was not requested"));
            PartSummary requested = names.part(line.partId);
            PartSummary issue = requested;
            if (a.substitutePartNumber() != null) {
                if (!parts.substitutesOf(requested.partNumber()).contains(a.substitutePartNumber())) {
                    throw new BusinessRuleException(field + ".substitutePartNumber", "'" + a.substitutePartNumber()
                            + "' is not on the compatibility list of '" + requested.partNumber() + "'");
                }
                issue = parts.requireSummary(field + ".substitutePartNumber", a.substitutePartNumber());
            }
            BigDecimal quantity = a.quantity().signum() == 0 ? BigDecimal.ZERO
                    : Quantities.requirePositive(field + ".quantity", a.quantity(), issue.unitOfIssue().wholeUnits());
            if (quantity.compareTo(line.quantityRequested) > 0) {
                throw new BusinessRuleException(field + ".quantity", "cannot approve more than the " 
                        + line.quantityRequested.stripTrailingZeros().toPlainString() + " requested");
            }
            line.approvedPartId = issue.id() == requested.id() ? null : issue.id();
            line.quantityApproved = quantity;
        }
        for (PartsRequestLine line : request.lines) {
            full &= line.quantityApproved.compareTo(line.quantityRequested) == 0;
            any |= line.quantityApproved.signum() > 0;
        }
        if (!any) {
            throw new BusinessRuleException("lines", "approve at least one unit, or refuse the request with a reason");
        }
        request.moveTo(full ? RequestStatus.APPROVED : RequestStatus.PARTLY_APPROVED, EnumSet.of(RequestStatus.RAISED),
                currentUser.name(), body.note(), OffsetDateTime.now(clock));
        RequestDtos.View after = RequestDtos.View.from(request, names);
        audit.record("REQUEST_APPROVED", "parts_request", request.clientRef, before, after);
        return after;
    }

    @Transactional
    public RequestDtos.View refuse(long id, String reason) {
        PartsRequest request = lockedForDepot(id);
        request.moveTo(RequestStatus.REFUSED, EnumSet.of(RequestStatus.RAISED, RequestStatus.APPROVED,
                RequestStatus.PARTLY_APPROVED), currentUser.name(), reason, OffsetDateTime.now(clock));
        audit.record("REQUEST_REFUSED", "parts_request", request.clientRef, null, reason);
        return view(request);
    }

    /** Issues the approved parts from the depot to the mechanic's kit, all lines in one transaction. */
    @Transactional
    public RequestDtos.View issue(long id) {
        PartsRequest request = lockedForDepot(id);
        request.moveTo(RequestStatus.ISSUED, EnumSet.of(RequestStatus.APPROVED, RequestStatus.PARTLY_APPROVED),
                currentUser.name(), null, OffsetDateTime.now(clock));
        RequestNames names = directory.of(List.of(request));
        for (PartsRequestLine line : request.lines) {
            if (line.quantityApproved.signum() > 0) {
                ledger.postWithin(new MovementCommand(MovementKind.ISSUE_TO_KIT, names.partNumber(line.partIdToIssue()),
                        names.locationCode(request.depotId), names.locationCode(request.kitId), line.quantityApproved,
                        null, "parts request",
                        request.clientRef, IdempotencyKey.internal("request", request.id + ":" + line.id), null, null));
                line.quantityIssued = line.quantityApproved;
            }
        }
        request.issuedAt = OffsetDateTime.now(clock);
        RequestDtos.View after = RequestDtos.View.from(request, names);
        audit.record("REQUEST_ISSUED", "parts_request", request.clientRef, null, after);
        return after;
    }

    /** The mechanic withdraws a request that has not been issued; its committed quantities are released. */
    @Transactional
    public RequestDtos.View cancel(long id, String reason) {
        PartsRequest request = locked(id);
        if (!request.mechanic.equals(currentUser.name())) {
            throw new ForbiddenException("only the mechanic who raised a request can cancel it");
        }
        request.moveTo(RequestStatus.CANCELLED, EnumSet.of(RequestStatus.RAISED, RequestStatus.APPROVED,
                RequestStatus.PARTLY_APPROVED), currentUser.name(), reason, OffsetDateTime.now(clock));
        audit.record("REQUEST_CANCELLED", "parts_request", request.clientRef, null, reason);
        return view(request);
    }

    @Transactional
    public RequestDtos.View close(long id) {
        PartsRequest request = locked(id);
        requireParty(request);
        request.moveTo(RequestStatus.CLOSED, EnumSet.of(RequestStatus.ISSUED), currentUser.name(), null, OffsetDateTime.now(clock));
        audit.record("REQUEST_CLOSED", "parts_request", request.clientRef, null, null);
        return view(request);
    }

    @Transactional
    public RequestDtos.View get(long id) {
        PartsRequest request = requests.findByIdOptional(id).orElseThrow(() -> new EntityMissingException(null, "request", id));
        requireParty(request);
        return view(request);
    }

    /** Mechanics see their own requests; officers their depots'; leads and admins all. */
    @Transactional
    public List<RequestDtos.View> list(RequestStatus status) {
        AccessScope.Scope visible = scope.current();
        List<PartsRequest> all = status == null ? requests.listAll(Sort.descending("id"))
                : requests.list("status", Sort.descending("id"), status);
        List<PartsRequest> seen = all.stream().filter(r -> visible.mechanic() != null
                ? r.mechanic.equals(visible.mechanic()) : visible.sees(r.depotId)).toList();
        RequestNames names = directory.of(seen);
        return seen.stream().map(r -> RequestDtos.View.from(r, names)).toList();
    }

    /** Approved but not yet issued, keyed "depotCode|partNumber": stock promised to mechanics. */
    @Transactional
    public Map<String, BigDecimal> committed() {
        Map<String, BigDecimal> committed = new HashMap<>();
        List<PartsRequest> open = requests.list("status in ?1",
                List.of(RequestStatus.APPROVED, RequestStatus.PARTLY_APPROVED));
        RequestNames names = directory.of(open);
        for (PartsRequest r : open) {
            for (PartsRequestLine l : r.lines) {
                committed.merge(names.locationCode(r.depotId) + "|" + names.partNumber(l.partIdToIssue()),
                        l.quantityApproved.subtract(l.quantityIssued), BigDecimal::add);
            }
        }
        return committed;
    }

    List<PartsRequest> issuedSince(OffsetDateTime since) {
        return requests.list("issuedAt >= ?1", since);
    }

    private RequestDtos.View view(PartsRequest request) {
        return RequestDtos.View.from(request, directory.of(List.of(request)));
    }

    private PartsRequest locked(long id) {
        PartsRequest request = requests.findById(id, LockModeType.PESSIMISTIC_WRITE);
        if (request == null) {
            throw new EntityMissingException(null, "request", id);
        }
        return request;
    }

    /** The request, locked, when the caller is an officer (or lead/admin) of its depot. */
    private PartsRequest lockedForDepot(long id) {
        PartsRequest request = locked(id);
        if (scope.current().mechanic() != null) {
            throw new ForbiddenException("mechanics cannot approve, refuse or issue requests");
        }
        scope.require(request.depotId, directory.locationCode(request.depotId));
        return request;
    }

    private void requireParty(PartsRequest request) {
        AccessScope.Scope visible = scope.current();
        boolean party = visible.mechanic() != null ? request.mechanic.equals(visible.mechanic()) : visible.sees(request.depotId);
        if (!party) {
            throw new ForbiddenException("request " + request.clientRef + " belongs to another mechanic or depot");
        }
    }
}
