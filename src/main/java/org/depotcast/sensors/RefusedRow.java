package org.depotcast.sensors;

/** A row of an intake file that was not taken: its row number (a CSV's header is row 1), the field and why. */
public record RefusedRow(long row, String field, String reason) {
}
