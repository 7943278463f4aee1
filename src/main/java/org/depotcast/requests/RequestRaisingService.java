package org.depotcast.requests;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.time.Clock;
import java.time.OffsetDateTime;
import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A mechanic raises a parts request for their kit's depot. Offline-safe: the phone's client reference makes a resend
 * return the request first raised, and the same reference with another body is a conflict naming the field. The
 * rest of the workflow (approve, refuse, issue, cancel, close) is {@link RequestService}'s.
 */
@ApplicationScoped
public class RequestRaisingService {
    private final RequestService.Requests requests;
    private final PartService parts;
    private final PumpQueryService pumps;
    private final LocationService locations;
    private final RequestDirectory directory;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final Clock clock;

    RequestRaisingService(RequestService.Requests requests, PartService parts, PumpQueryService pumps,
                          LocationService locations, RequestDirectory directory, CurrentUser currentUser,
                          AuditService audit, Clock clock) {
        this.directory = directory;
        this.requests = requests;
        this.parts = parts;
        this.pumps = pumps;
        this.locations = locations;
        this.currentUser = currentUser;
        this.audit = audit;
        this.clock = clock;
    }

    public record Raised(RequestDtos.View request, boolean replayed) {
    }

    @Transactional
    public Raised raise(RequestDtos.Raise body) {
        String mechanic = currentUser.name();
        Optional<PartsRequest> earlier = requests.byClientRef(body.clientRef());
        if (earlier.isPresent()) {
            if (!earlier.get().mechanic.equals(mechanic)) {
                throw new ConflictException("clientRef", "reference '" + body.clientRef() + "' belongs to another request");
            }
            RequestNames names = directory.of(List.of(earlier.get()));
            String differs = firstDifference(earlier.get(), body, names);
            if (differs != null) {
                throw new ConflictException(differs, "request '" + body.clientRef() + "' was raised with another "
                        + differs + "; a new request needs a new client reference");
            }
            return new Raised(RequestDtos.View.from(earlier.get(), names), true);
        }
        LocationSummary kit = locations.kitSummaryOf(mechanic).orElseThrow(() ->
                new BusinessRuleException("mechanic", "account '" + mechanic + "' carries no kit"));
        PartsRequest request = new PartsRequest();
        request.clientRef = body.clientRef();
        request.mechanic = mechanic;
        request.kitId = kit.id();
        request.depotId = locations.requireSummary("mechanic", kit.parentCode()).id();
        request.pumpId = pumpOf(body);
        request.urgency = body.urgency();
        request.fault = body.fault();
        request.raisedAt = OffsetDateTime.now(clock);
        request.status = RequestStatus.RAISED;
        for (int i = 0; i < body.lines().size(); i++) {
            RequestDtos.Line l = body.lines().get(i);
            PartsRequestLine line = new PartsRequestLine();
            line.request = request;
            PartSummary part = parts.requireSummary("lines[" + i + "].partNumber", l.partNumber());
            line.partId = part.id();
            if (request.lines.stream().anyMatch(existing -> existing.partId == part.id())) {
                throw new InvalidInputException("lines[" + i + "].partNumber", "part '" + l.partNumber() + "' is listed twice");
            }
            line.quantityRequested = Quantities.requirePositive("lines[" + i + "].quantity", l.quantity(),
                    part.unitOfIssue().wholeUnits());
            request.lines.add(line);
        }
        request.moveTo(RequestStatus.RAISED, EnumSet.of(RequestStatus.RAISED), mechanic, body.fault(), OffsetDateTime.now(clock));
        requests.persist(request);
        audit.record("REQUEST_RAISED", "parts_request", request.clientRef, null, body);
        return new Raised(RequestDtos.View.from(request, directory.of(List.of(request))), false);
    }

    /** The pump the request is for, or null for a kit top-up; "pump down" says a pump has stopped, so it must name it. */
    private Long pumpOf(RequestDtos.Raise body) {
        if (body.assetId() == null) {
            if (body.urgency() == PartsRequest.Urgency.PUMP_DOWN) {
                throw new InvalidInputException("assetId", "a request for a pump that is down must name the pump");
            }
            return null;
        }
        return pumps.requireVisible("assetId", body.assetId()).id();
    }

    /** The first field in which a resent request differs from the one raised under its reference, or null. */
    private static String firstDifference(PartsRequest stored, RequestDtos.Raise resend, RequestNames names) {
        if (!Objects.equals(names.assetId(stored.pumpId), resend.assetId())) {
            return "assetId";
        }
        if (stored.urgency != resend.urgency()) {
            return "urgency";
        }
        if (!Objects.equals(stored.fault, resend.fault())) {
            return "fault";
        }
        if (stored.lines.size() != resend.lines().size()) {
            return "lines";
        }
        for (int i = 0; i < resend.lines().size(); i++) {
            RequestDtos.Line sent = resend.lines().get(i);
            PartsRequestLine kept = stored.lines.stream()
                    .filter(l -> names.partNumber(l.partId).equals(sent.partNumber()))
                    .findFirst().orElse(null);
            if (kept == null) {
                return "lines[" + i + "].partNumber";
            }
            if (sent.quantity() == null || kept.quantityRequested.compareTo(sent.quantity()) != 0) {
                return "lines[" + i + "].quantity";
            }
        }
        return null;
    }
}
