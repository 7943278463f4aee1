package org.depotcast.fleet;

import java.time.LocalDate;

/**
 * What a pump's repair records say about its status: the earliest breakdown repair still open (none when all are
 * fixed) and the latest fix. Nulls when there is no such repair.
 */
public record RepairFacts(String openRepairRef, LocalDate openSince, String lastFixedRef, LocalDate lastFixedOn) {
    public static final RepairFacts NONE = new RepairFacts(null, null, null, null);
}
