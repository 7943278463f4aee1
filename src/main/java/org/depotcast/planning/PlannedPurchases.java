package org.depotcast.planning;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Digits;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.Bounds;
import org.depotcast.common.PlanDate;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;

/** Request and response records of a store's purchase plan (parts to buy, not yet ordered). */
public final class PlannedPurchases {
    private PlannedPurchases() {
    }

    /** How many of the part to buy for the store (units of issue, at most one million); replaces an earlier quantity. */
    public record Put(@NotNull @DecimalMax(Bounds.QUANTITY_MAX)
                      @Digits(integer = Bounds.QUANTITY_DIGITS, fraction = Bounds.QUANTITY_DECIMALS) BigDecimal quantity,
                      @Size(max = 300) String note) {
    }

    /** Turns the plan's lines of one supplier at the store into a purchase order with this number. */
    public record Order(@NotBlank @Size(max = 40) String orderNumber, @NotBlank @Size(max = 120) String supplier,
                        @PlanDate LocalDate expectedOn) {
    }

    /** A line of the plan with what the catalogue says about buying the part. */
    public record Line(String partNumber, String description, String location, BigDecimal quantity, String supplier,
                       BigDecimal unitCost, String currency, int packSize, int minOrderQty, int leadTimeDays,
                       String note, String addedBy, OffsetDateTime addedAt) {
        static Line from(PlannedPurchase p, PartSummary part, String locationCode) {
            return new Line(part.partNumber(), part.description(), locationCode, p.quantity, part.supplier(),
                    part.unitCost(), part.currency(), part.packSize(), part.minOrderQty(), part.leadTimeDays(), p.note,
                    p.addedBy, p.addedAt);
        }
    }

    /** The purchase order made from the plan and the lines it took out of it. */
    public record Ordered(String orderNumber, String supplier, String destination, LocalDate orderedOn,
                          LocalDate expectedOn, List<Line> lines) {
    }
}
