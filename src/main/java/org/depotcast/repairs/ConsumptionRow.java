package org.depotcast.repairs;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * One part replaced on one repair line: the raw demand history for forecasting.
 *
 * @param on         the day the repair was fixed (the day it was reported while not yet fixed)
 * @param reportedOn the day the repair was reported: before {@code on} was known, the repair was open
 */
public record ConsumptionRow(long partId, long pumpId, long depotId, String mechanic, RepairKind kind, LocalDate on,
                             BigDecimal quantity, LocalDate reportedOn) {
    /** As the repair tables hold it, before the pump's depot is read from fleet (the repository's query). */
    ConsumptionRow(long partId, long pumpId, String mechanic, RepairKind kind, LocalDate on, BigDecimal quantity,
                   LocalDate reportedOn) {
        this(partId, pumpId, 0, mechanic, kind, on, quantity, reportedOn);
    }

    ConsumptionRow atDepot(long depotId) {
        return new ConsumptionRow(partId, pumpId, depotId, mechanic, kind, on, quantity, reportedOn);
    }
}
