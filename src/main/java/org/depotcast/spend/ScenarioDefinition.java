package org.depotcast.spend;

import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import org.eclipse.microprofile.openapi.annotations.media.Schema;

import java.util.List;

/**
 * A named spend scenario. Everything but the name and horizon is optional; left out, the scenario is the baseline
 * (today's fleet and usage, today's prices in the catalogue currency).
 *
 * @param decommissionPercentPerYear share of today's pumps taken out of service each year
 * @param usageChangePercent         change of every pump's daily load, e.g. 10 for 10 % more use
 * @param priceEscalationPercentPerYear price rise per year, compounded from year 2
 * @param currency                   projection currency; {@code exchangeRate} converts catalogue prices into it
 * @param serviceLevel               one cycle service level for every part, for the year-1 stock top-up (else the
 *                                   levels in force); a fraction from 0.5 to 0.999, as on the lead's settings
 */
public record ScenarioDefinition(
        @NotBlank @Size(max = 120) String name,
        @NotNull @Min(1) @Max(10) Integer horizonYears,
        @Size(max = Bounds.LINES_MAX) List<@Valid @NotNull Installation> installations,
        @DecimalMin("0") @DecimalMax("100") Double decommissionPercentPerYear,
        @DecimalMin("-90") @DecimalMax("500") Double usageChangePercent,
        @DecimalMin("-50") @DecimalMax("200") Double priceEscalationPercentPerYear,
        @Pattern(regexp = "[A-Z]{3}", message = "must be a three-letter ISO 4217 code") String currency,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.EXCHANGE_RATE_MAX) Double exchangeRate,
        @Schema(description = "one " + Bounds.SERVICE_LEVEL_DESCRIPTION + " for every part, for the year-1 stock top-up; "
                + "left out, the levels in force")
        @DecimalMin(value = Bounds.SERVICE_LEVEL_MIN, message = Bounds.SERVICE_LEVEL_RANGE)
        @DecimalMax(value = Bounds.SERVICE_LEVEL_MAX, message = Bounds.SERVICE_LEVEL_RANGE) Double serviceLevel,
        @Min(1000) @Max(100000) Integer draws,
        Long seed) {

    /** New pumps going in during a projection year (1 = the first year). */
    public record Installation(@NotNull @Min(1) @Max(10) Integer year, @NotNull @Min(0) @Max(100000) Integer count,
                               @NotBlank @Size(max = 40) String modelCode,
                               @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("500") Double depthM,
                               @DecimalMin("0") @DecimalMax("24") Double usageHoursPerDay,
                               @NotBlank @Size(max = 40) String depotCode) {
    }

    int drawsOrDefault() {
        return draws == null ? 10_000 : draws;
    }

    long seedOrDefault() {
        return seed == null ? 1L : seed;
    }

    double usageFactor() {
        return 1 + (usageChangePercent == null ? 0 : usageChangePercent) / 100;
    }

    double survivalPerYear() {
        return 1 - (decommissionPercentPerYear == null ? 0 : decommissionPercentPerYear) / 100;
    }

    /** Price factor for 0-based year y: escalation compounded, then converted. */
    double priceFactor(int year) {
        double escalation = priceEscalationPercentPerYear == null ? 0 : priceEscalationPercentPerYear / 100;
        return Math.pow(1 + escalation, year) * (exchangeRate == null ? 1 : exchangeRate);
    }
}
