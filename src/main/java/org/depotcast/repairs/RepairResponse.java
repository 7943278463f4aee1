package org.depotcast.repairs;

import org.depotcast.fleet.PumpSummary;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

public record RepairResponse(String repairRef, String assetId, String depotCode, String mechanic, RepairKind kind,
                             LocalDate reportedOn, LocalDate diagnosedOn, LocalDate partsAvailableOn,
                             LocalDate fixedOn, String fault, boolean ledgerPosted, Long daysWaitingForParts,
                             Long downtimeDays, List<Line> lines) {
    public record Line(String partNumber, BigDecimal quantity) {
    }

    /** The repair with its pump's asset id and depot code as fleet's record gives them, its parts' numbers by id. */
    static RepairResponse from(Repair r, PumpSummary pump, Map<Long, String> partNumbers) {
        return new RepairResponse(r.repairRef, pump.assetId(), pump.depotCode(), r.mechanic, r.kind, r.reportedOn,
                r.diagnosedOn, r.partsAvailableOn, r.fixedOn, r.fault, r.ledgerPosted, r.daysWaitingForParts(),
                r.downtimeDays(), r.lines.stream().map(l -> new Line(partNumbers.get(l.partId), l.quantity)).toList());
    }
}
