package org.depotcast.requests;

/** States of a parts request. Approved quantities are committed stock until issued. */
public enum RequestStatus {
    RAISED, APPROVED, PARTLY_APPROVED, REFUSED, ISSUED, CLOSED, CANCELLED;

    boolean commitsStock() {
        return this == APPROVED || this == PARTLY_APPROVED;
    }
}
