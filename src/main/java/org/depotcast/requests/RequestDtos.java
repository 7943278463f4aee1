package org.depotcast.requests;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.Bounds;
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
    public record Raise(@NotBlank @Size(max = 80) String clientRef, @Size(max = 40) String assetId,
                        @NotNull PartsRequest.Urgency urgency, @Size(max = 300) String fault,
                        @NotEmpty @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull Line> lines) {
    }

    public record Line(@NotBlank @Size(max = 40) String partNumber,
                       @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                       @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                       BigDecimal quantity) {
    }

    /** Per requested part: how many to approve, optionally as a compatible substitute. */
    public record Approve(@NotEmpty @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull ApprovedLine> lines,
                          @Size(max = 300) String note) {
    }

    public record ApprovedLine(@NotBlank @Size(max = 40) String partNumber,
                               @NotNull @DecimalMin("0") @DecimalMax(Bounds.QUANTITY_MAX)
                               @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                               BigDecimal quantity,
                               @Size(max = 40) String substitutePartNumber) {
    }

    public record Reason(@NotBlank @Size(max = 300) String reason) {
    }

    /** A request as the API shows it; {@code cautions} says what a substitute in contact with drinking water needs. */
    public record View(long id,
                       String clientRef,
                       String mechanic,
                       String kit,
                       String depot,
                       @Size(max = 40) String assetId,
                       PartsRequest.Urgency urgency, String fault, RequestStatus status, OffsetDateTime raisedAt,
                       OffsetDateTime issuedAt, long version, List<LineView> lines, List<EventView> history,
                       List<String> cautions) {
        static View from(PartsRequest r, RequestNames names) {
            return new View(r.id, r.clientRef, r.mechanic, names.locationCode(r.kitId), names.locationCode(r.depotId),
                    names.assetId(r.pumpId), r.urgency, r.fault, r.status, r.raisedAt, r.issuedAt,
                    r.version, r.lines.stream().map(l -> new LineView(names.partNumber(l.partId), l.quantityRequested,
                    l.approvedPartId == null ? null : names.partNumber(l.approvedPartId),
                    l.quantityApproved,
                    l.quantityIssued)).toList(),
                    r.events.stream().map(e -> new EventView(e.status, e.actor, e.at, e.reason)).toList(),
                    r.lines.stream().filter(l -> l.approvedPartId != null
                            && (names.part(l.partId).family().touchesDrinkingWater()
                            || names.part(l.approvedPartId).family().touchesDrinkingWater()))
                            .map(l -> substituteCaution(names.partNumber(l.approvedPartId), names.partNumber(l.partId)))
                            .toList());
        }
    }

    static String substituteCaution(String substitute, String part) {
        return substitute + " is issued in place of " + part + ", which is in contact with drinking water: the "
                + "substitute must be approved for drinking-water contact where the pump is installed (national "
                + "drinking-water quality rules and local codes), whatever the compatibility list says.";
    }

    public record LineView(String partNumber, BigDecimal requested, String substitute, BigDecimal approved,
                           BigDecimal issued) {
    }

    public record EventView(RequestStatus status, String actor, OffsetDateTime at, String reason) {
    }

    /**
     * Per depot: how fast requests are issued and how long pumps waited for parts (repairs reported in the last 365
     * days whose parts came), and the pumps broken and waiting for parts today with the days they have waited so far.
     */
    public record DepotReport(String depot, long requestsIssued, Double meanHoursToIssue, Double medianHoursToIssue,
                              long repairsWaitingForParts, long pumpDaysWaitingForParts, long pumpsWaitingNow,
                              long pumpDaysWaitingNow) {
    }
}
