package org.depotcast.repairs;

import java.math.BigDecimal;
import java.time.LocalDate;

/**
 * One part replaced on one repair line: the raw demand history for forecasting.
 *
 * @param on the day the repair was fixed (the day it was reported while not yet fixed)
 */
public record ConsumptionRow(long partId, long pumpId, long depotId, String mechanic, RepairKind kind, LocalDate on,
                             BigDecimal quantity) {
}
