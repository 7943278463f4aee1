package org.depotcast.fleet;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

/** One row of a usage import: the pump (in the path for JSON) and the reading exactly as the JSON endpoint takes it. */
record UsageImportRow(@NotBlank @Size(max = 40) String assetId, @Valid @NotNull UsageReadingRequest reading) {
}
