package org.depotcast.planning;

import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;

/** Request bodies of the planning endpoints. */
public final class PlanningRequests {
    private PlanningRequests() {
    }

    public record ReorderPointRequest(@NotNull @DecimalMin("0") Double leadTimeDemandMean, Double variance,
                                      @NotNull Double serviceLevel, String distribution, String target,
                                      @DecimalMin(value = "0", inclusive = false) Double orderQuantity) {
    }

    public record ReorderPointResponse(double reorderPoint, double cycleServiceLevel, double fillRate,
                                       double expectedBackorders, String distribution) {
    }

    /**
     * Acknowledges or snoozes the alert of a part at a location; it covers every reason the alert has now. With
     * {@code kind}, the alert must carry that reason (else 404).
     */
    public record AlertActionRequest(@NotBlank String partNumber, @NotBlank String location, AlertKind kind,
                                     @NotNull AlertAction.Action action, LocalDate snoozeUntil,
                                     @Size(max = 300) String note) {
    }

    public record AlertActionResponse(long id, AlertAction.Action action, String actor, java.util.List<String> reasons,
                                      LocalDate snoozedUntil) {
    }

    public record PurchasePlanRequest(@NotNull @DecimalMin(value = "0", inclusive = false)
                                      @Digits(integer = 12, fraction = 2) BigDecimal budget, LocalDate planningDate) {
    }

    public record ServiceLevelRequest(@NotBlank String partClass, @NotNull Double level) {
    }

    public record LaneCostRequest(@NotBlank String from, @NotBlank String to,
                                  @NotNull @DecimalMin(value = "0", message = "must not be negative") BigDecimal unitCost) {
    }

    /** A dispatch; a client that may resend it sends an {@code idempotencyKey}, so no second transfer is made. */
    public record TransferRequest(@NotBlank String partNumber, @NotBlank String from, @NotBlank String to,
                                  @NotNull BigDecimal quantity, @Size(max = 80) String idempotencyKey) {
    }

    /** An arrival: what came in, what was lost or damaged on the way and why; everything outstanding when empty. */
    public record ReceiveRequest(@DecimalMin("0") BigDecimal receivedQuantity, @DecimalMin("0") BigDecimal writtenOffQuantity,
                                 @Size(max = 300) String writeOffReason, @Size(max = 80) String idempotencyKey) {
    }
}
