package org.depotcast.sensors;

/**
 * One row of an intake file as written, before any check: the pump's asset id, the day and one of hours, strokes or
 * litres (kept as text, so a bad number is refused by row rather than failing the file). {@code unreadable} says why a
 * row could not be read at all (bad JSON, an over-long line); null for a row that could.
 */
record RawReading(long row, String assetId, String day, String hours, String strokes, String litres,
                  String unreadable) {
    static RawReading unreadable(long row, String reason) {
        return new RawReading(row, null, null, null, null, null, reason);
    }
}
