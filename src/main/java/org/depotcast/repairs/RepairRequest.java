package org.depotcast.repairs;

import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.EventDate;
import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

/**
 * A repair as the mechanic records it. {@code repairRef} is made on the phone, so a resend records nothing twice.
 * When {@code fixedOn} is given, every line is consumed from the mechanic's kit in the same transaction.
 */
public record RepairRequest(@NotBlank @Size(max = 80) String repairRef,
                            @NotBlank @Size(max = 40) String assetId,
                            @Size(max = 60) String mechanic,
                            @NotNull RepairKind kind,
                            @NotNull @EventDate LocalDate reportedOn,
                            @EventDate LocalDate diagnosedOn,
                            @EventDate LocalDate partsAvailableOn,
                            @EventDate LocalDate fixedOn,
                            @Size(max = 300) String fault,
                            @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull Line> lines) {
    public record Line(@NotBlank @Size(max = 40) String partNumber,
                       @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                       @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                       BigDecimal quantity) {
    }
}
