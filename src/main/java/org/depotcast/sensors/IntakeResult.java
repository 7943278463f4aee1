package org.depotcast.sensors;

import java.util.List;

/**
 * The answer to one intake file. {@code taken} = {@code added} + {@code replaced} + {@code unchanged}; rows refused are
 * listed (the first {@value SensorIntakeService#REFUSED_LISTED}) with their reasons, so the corrected rows can be sent
 * again: a row already held with the same value changes nothing.
 */
public record IntakeResult(long rowsRead, long taken, long added, long replaced, long unchanged, long refused,
                           List<RefusedRow> refusedRows, boolean refusedListComplete) {
}
