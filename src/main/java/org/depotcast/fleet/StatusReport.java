package org.depotcast.fleet;

import org.depotcast.common.EventDate;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.time.LocalDate;

/** A mechanic's word on a pump: broken or working again since a date, with an optional note. */
public record StatusReport(@NotNull PumpStatus status, @NotNull @EventDate LocalDate since,
                           @Size(max = 300) String note) {
}
