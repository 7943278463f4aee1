package org.depotcast.repairs;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;

/**
 * A refused repair as the stores officer reads it: the mechanic, kit (and its depot), pump and day of the fix, each
 * part short with the units used and the units the kit's books held, when it was first and last refused and how
 * many times it was sent; {@code state} OPEN until the repair is recorded (RECORDED), the officer dismisses it
 * (DISMISSED) or the mechanic withdraws it (WITHDRAWN), {@code closedReason} saying which in words.
 */
public record RefusedRepairNotice(long id, String repairRef, String mechanic, String kitCode, String depotCode,
                                  String assetId, LocalDate fixedOn, OffsetDateTime firstRefusedAt,
                                  OffsetDateTime lastRefusedAt, int attempts, RefusedRepair.State state,
                                  OffsetDateTime closedAt, String closedBy, String closedReason, List<Line> lines) {
    public record Line(String partNumber, String description, String unitOfIssue, BigDecimal unitsUsed,
                       BigDecimal unitsHeld) {
    }
}
