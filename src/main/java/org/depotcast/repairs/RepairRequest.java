package org.depotcast.repairs;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PastOrPresent;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

/**
 * A repair as the mechanic records it. {@code repairRef} is made on the phone, so a resend records nothing twice.
 * When {@code fixedOn} is given, every line is consumed from the mechanic's kit in the same transaction.
 */
public record RepairRequest(@NotBlank @Size(max = 80) String repairRef,
                            @NotBlank String assetId,
                            @Size(max = 60) String mechanic,
                            @NotNull RepairKind kind,
                            @NotNull @PastOrPresent LocalDate reportedOn,
                            @PastOrPresent LocalDate diagnosedOn,
                            @PastOrPresent LocalDate partsAvailableOn,
                            @PastOrPresent LocalDate fixedOn,
                            @Size(max = 300) String fault,
                            List<@Valid @NotNull Line> lines) {
    public record Line(@NotBlank String partNumber, @NotNull BigDecimal quantity) {
    }
}
