package org.depotcast.catalogue;

import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.DecimalMax;
import org.depotcast.common.Bounds;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;

/** A part as a client sends it, for create (POST) and update (PUT, where {@code version} guards a stale edit). */
public record PartRequest(
        @NotBlank @Size(max = 40)
        @Pattern(regexp = "[A-Za-z0-9._/-]+", message = "may hold letters, digits and . _ / - only")
        String partNumber,
        @NotBlank @Size(max = 200) String description,
        @NotNull ComponentFamily family,
        @NotNull UnitOfIssue unitOfIssue,
        @Min(1) @Max(Bounds.PACK_SIZE_MAX) int packSize,
        @Min(1) @Max(Bounds.PACK_SIZE_MAX) int minOrderQty,
        @NotNull @DecimalMin("0") @DecimalMax(Bounds.UNIT_COST_MAX)
        @Digits(integer = 10, fraction = 2) BigDecimal unitCost,
        @NotBlank @Pattern(regexp = "[A-Z]{3}", message = "must be a three-letter ISO 4217 code") String currency,
        @NotBlank @Size(max = 120) String supplier,
        @Min(0) @Max(Bounds.LEAD_TIME_DAYS_MAX) int leadTimeDays,
        @Min(1) @Max(Bounds.SHELF_LIFE_DAYS_MAX) Integer shelfLifeDays,
        boolean critical,
        @PositiveOrZero Long version) {
}
