package org.depotcast.repairs;

public enum RepairKind {
    BREAKDOWN, PREVENTIVE
}
