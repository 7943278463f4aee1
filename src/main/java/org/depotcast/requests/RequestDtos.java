package org.depotcast.requests;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.util.List;

/** Request and response records of the parts-request API. */
public final class RequestDtos {
    private RequestDtos() {
    }

    /** Raised on the phone, possibly offline; {@code clientRef} is made there so a resend never duplicates it. */
    public record Raise(@NotBlank @Size(max = 80) String clientRef, String assetId,
                        @NotNull PartsRequest.Urgency urgency, @Size(max = 300) String fault,
                        @NotEmpty List<@Valid @NotNull Line> lines) {
    }

    public record Line(@NotBlank String partNumber, @NotNull BigDecimal quantity) {
    }

    /** Per requested part: how many to approve, optionally as a compatible substitute. */
    public record Approve(@NotEmpty List<@Valid @NotNull ApprovedLine> lines, @Size(max = 300) String note) {
    }

    public record ApprovedLine(@NotBlank String partNumber, @NotNull BigDecimal quantity, String substitutePartNumber) {
    }

    public record Reason(@NotBlank @Size(max = 300) String reason) {
    }

    public record View(long id, String clientRef, String mechanic, String kit, String depot, String assetId,
                       PartsRequest.Urgency urgency, String fault, RequestStatus status, OffsetDateTime raisedAt,
                       OffsetDateTime issuedAt, long version, List<LineView> lines, List<EventView> history) {
        static View from(PartsRequest r) {
            return new View(r.id, r.clientRef, r.mechanic, r.kit.code, r.depot.code,
                    r.pump == null ? null : r.pump.assetId, r.urgency, r.fault, r.status, r.raisedAt, r.issuedAt,
                    r.version, r.lines.stream().map(l -> new LineView(l.part.partNumber, l.quantityRequested,
                    l.approvedPart == null ? null : l.approvedPart.partNumber, l.quantityApproved, l.quantityIssued)).toList(),
                    r.events.stream().map(e -> new EventView(e.status, e.actor, e.at, e.reason)).toList());
        }
    }

    public record LineView(String partNumber, BigDecimal requested, String substitute, BigDecimal approved,
                           BigDecimal issued) {
    }

    public record EventView(RequestStatus status, String actor, OffsetDateTime at, String reason) {
    }

    /** Per depot: how fast requests are issued and how long pumps waited for parts (last 365 days). */
    public record DepotReport(String depot, long requestsIssued, Double meanHoursToIssue, Double medianHoursToIssue,
                              long repairsWaitingForParts, long pumpDaysWaitingForParts) {
    }
}
