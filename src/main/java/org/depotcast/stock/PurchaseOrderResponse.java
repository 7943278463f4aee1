package org.depotcast.stock;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

public record PurchaseOrderResponse(String orderNumber, String supplier, String destination, LocalDate orderedOn,
                                    LocalDate expectedOn, PurchaseOrderStatus status, List<Line> lines) {
    public record Line(String partNumber, BigDecimal quantityOrdered, BigDecimal quantityReceived,
                       BigDecimal outstanding) {
    }

    /** The order with its parts' numbers by id (its lines hold the parts' ids). */
    static PurchaseOrderResponse from(PurchaseOrder o, Map<Long, String> partNumbers) {
        return new PurchaseOrderResponse(o.orderNumber, o.supplier, o.destination.code, o.orderedOn, o.expectedOn,
                o.status, o.lines.stream().map(l -> new Line(partNumbers.get(l.partId), l.quantityOrdered,
                l.quantityReceived, l.outstanding())).toList());
    }
}
