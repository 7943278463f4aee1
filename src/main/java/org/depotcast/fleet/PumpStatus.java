package org.depotcast.fleet;

public enum PumpStatus {
    WORKING, BROKEN, DECOMMISSIONED
}
