package org.depotcast.planning;

import jakarta.validation.constraints.DecimalMax;
import org.depotcast.common.PlanDate;
import org.depotcast.common.Bounds;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import org.eclipse.microprofile.openapi.annotations.media.Schema;

import java.math.BigDecimal;
import java.time.LocalDate;

/** Request bodies of the planning endpoints. */
public final class PlanningRequests {
    private PlanningRequests() {
    }

    public record ReorderPointRequest(@NotNull @DecimalMin("0")
                                      @DecimalMax(Bounds.LEAD_TIME_DEMAND_MEAN_MAX) Double leadTimeDemandMean,
                                      @DecimalMin(value = "0", inclusive = false)
                                      @DecimalMax(Bounds.LEAD_TIME_DEMAND_VARIANCE_MAX) Double variance,
                                      @NotNull @DecimalMin(value = "0", inclusive = false)
                                      @DecimalMax(value = "1", inclusive = false) Double serviceLevel,
                                      @Size(max = 40) String distribution,
                                      @Size(max = 40) String target,
                                      @DecimalMin(value = "0", inclusive = false)
                                      @DecimalMax(Bounds.ORDER_QUANTITY_MAX) Double orderQuantity) {
    }

    public record ReorderPointResponse(double reorderPoint, double cycleServiceLevel, double fillRate,
                                       double expectedBackorders, String distribution) {
    }

    /**
     * Acknowledges or snoozes the alert of a part at a location; it covers every reason the alert has now. With
     * {@code kind}, the alert must carry that reason (else 404).
     */
    public record AlertActionRequest(@NotBlank @Size(max = 40) String partNumber,
                                     @NotBlank @Size(max = 40) String location,
                                     AlertKind kind,
                                     @NotNull AlertAction.Action action, @PlanDate LocalDate snoozeUntil,
                                     @Size(max = 300) String note) {
    }

    public record AlertActionResponse(long id, AlertAction.Action action, String actor, java.util.List<String> reasons,
                                      LocalDate snoozedUntil) {
    }

    public record PurchasePlanRequest(@NotNull @DecimalMin(value = "0", inclusive = false)
                                      @DecimalMax(Bounds.BUDGET_MAX)
                                      @Digits(integer = 13, fraction = 2) BigDecimal budget,
                                      @PlanDate LocalDate planningDate) {
    }

    /**
     * A part class's cycle service level as a fraction, 0.5 to 0.999: below a half the reorder point falls under the
     * mean demand, and the bound refuses a mix-up of scales (99 % typed as 0.99 on a per-cent form arrives as 0.0099).
     */
    public record ServiceLevelRequest(@NotBlank @Size(max = 40) String partClass,
                                      @Schema(description = Bounds.SERVICE_LEVEL_DESCRIPTION)
                                      @NotNull @DecimalMin(value = Bounds.SERVICE_LEVEL_MIN, message = Bounds.SERVICE_LEVEL_RANGE)
                                      @DecimalMax(value = Bounds.SERVICE_LEVEL_MAX, message = Bounds.SERVICE_LEVEL_RANGE)
                                      Double level) {
    }

    public record LaneCostRequest(@NotBlank @Size(max = 40) String from, @NotBlank @Size(max = 40) String to,
                                  @NotNull @DecimalMin(value = "0", message = "must not be negative")
                                  @DecimalMax(Bounds.UNIT_COST_MAX)
                                  @Digits(integer = 9, fraction = 4) BigDecimal unitCost) {
    }

    /** A dispatch; a client that may resend it sends an {@code idempotencyKey}, so no second transfer is made. */
    public record TransferRequest(@NotBlank @Size(max = 40) String partNumber, @NotBlank @Size(max = 40) String from,
                                  @NotBlank @Size(max = 40) String to,
                                  @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax(Bounds.QUANTITY_MAX)
                                  @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                                  BigDecimal quantity,
                                  @Size(max = 80) String idempotencyKey) {
    }

    /** An arrival: what came in, what was lost or damaged on the way and why; everything outstanding when empty. */
    public record ReceiveRequest(@DecimalMin("0") @DecimalMax(Bounds.QUANTITY_MAX)
                                 @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                                 BigDecimal receivedQuantity,
                                 @DecimalMin("0") @DecimalMax(Bounds.QUANTITY_MAX)
                                 @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS)
                                 BigDecimal writtenOffQuantity,
                                 @Size(max = 300) String writeOffReason, @Size(max = 80) String idempotencyKey) {
    }
}
