package org.depotcast.catalogue;

import java.math.BigDecimal;

/**
 * A catalogue part as other features read it: a record, not the entity, so they hold no managed object of the
 * catalogue. {@code unitCost} is per unit of issue, in {@code currency}; {@code shelfLifeDays} is null for a part
 * that keeps.
 */
public record PartSummary(long id, String partNumber, String description, ComponentFamily family,
                          UnitOfIssue unitOfIssue, BigDecimal unitCost, String currency, String supplier,
                          int leadTimeDays, int packSize, int minOrderQty, Integer shelfLifeDays, boolean critical) {
    static PartSummary from(Part part) {
        return new PartSummary(part.id, part.partNumber, part.description, part.family, part.unitOfIssue, part.unitCost,
                part.currency, part.supplier, part.leadTimeDays, part.packSize, part.minOrderQty,
                part.shelfLifeDays, part.critical);
    }
}
