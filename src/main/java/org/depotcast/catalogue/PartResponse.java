package org.depotcast.catalogue;

import java.math.BigDecimal;

public record PartResponse(String partNumber, String description, ComponentFamily family, UnitOfIssue unitOfIssue,
                           int packSize, int minOrderQty, BigDecimal unitCost, String currency, String supplier,
                           int leadTimeDays, Integer shelfLifeDays, boolean critical, long version) {
    static PartResponse from(Part p) {
        return new PartResponse(p.partNumber, p.description, p.family, p.unitOfIssue, p.packSize, p.minOrderQty,
                p.unitCost, p.currency, p.supplier, p.leadTimeDays, p.shelfLifeDays, p.critical, p.version);
    }
}
