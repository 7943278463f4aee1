package org.depotcast.fleet;

import java.math.BigDecimal;
import java.time.LocalDate;

/** One usage reading as other features read the history: the pump, the day it was read and hours of use a day. */
public record UsageReadingRow(long pumpId, LocalDate readOn, BigDecimal hoursPerDay) {
}
