package org.depotcast.repairs;

import org.depotcast.common.EventDate;
import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.time.LocalDate;
import java.util.List;

/**
 * What happened since a repair was reported: the dates reached and, until it is fixed, the parts it needs. Fields
 * left out keep their values; a date already recorded cannot change (409), so the phone may send the same progress
 * twice. Giving {@code fixedOn} consumes the lines from the mechanic's kit and the pump becomes WORKING unless another
 * breakdown repair of it is still open.
 */
public record RepairProgress(@EventDate LocalDate diagnosedOn,
                             @EventDate LocalDate partsAvailableOn,
                             @EventDate LocalDate fixedOn,
                             @Size(max = 300) String fault,
                             @Size(max = Bounds.LINES_MAX) List<RepairRequest.@Valid @NotNull Line> lines) {
}
