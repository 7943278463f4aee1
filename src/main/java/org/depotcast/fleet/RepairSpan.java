package org.depotcast.fleet;

import java.time.LocalDate;

/** A breakdown repair's days: reported on, fixed on (null while open). */
public record RepairSpan(LocalDate reportedOn, LocalDate fixedOn) {
}
