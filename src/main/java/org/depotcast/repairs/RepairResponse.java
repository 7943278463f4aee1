package org.depotcast.repairs;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

public record RepairResponse(String repairRef, String assetId, String depotCode, String mechanic, RepairKind kind,
                             LocalDate reportedOn, LocalDate diagnosedOn, LocalDate partsAvailableOn,
                             LocalDate fixedOn, String fault, boolean ledgerPosted, Long daysWaitingForParts,
                             Long downtimeDays, List<Line> lines) {
    public record Line(String partNumber, BigDecimal quantity) {
    }

    public static RepairResponse from(Repair r) {
        return new RepairResponse(r.repairRef, r.pump.assetId, r.pump.depotCode(), r.mechanic, r.kind, r.reportedOn,
                r.diagnosedOn, r.partsAvailableOn, r.fixedOn, r.fault, r.ledgerPosted, r.daysWaitingForParts(),
                r.downtimeDays(), r.lines.stream().map(l -> new Line(l.part.partNumber, l.quantity)).toList());
    }
}
