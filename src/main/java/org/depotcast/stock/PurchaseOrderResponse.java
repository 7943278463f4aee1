package org.depotcast.stock;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

public record PurchaseOrderResponse(String orderNumber, String supplier, String destination, LocalDate orderedOn,
                                    LocalDate expectedOn, PurchaseOrderStatus status, List<Line> lines) {
    public record Line(String partNumber, BigDecimal quantityOrdered, BigDecimal quantityReceived,
                       BigDecimal outstanding) {
    }

    static PurchaseOrderResponse from(PurchaseOrder o) {
        return new PurchaseOrderResponse(o.orderNumber, o.supplier, o.destination.code, o.orderedOn, o.expectedOn,
                o.status, o.lines.stream().map(l -> new Line(l.part.partNumber, l.quantityOrdered,
                l.quantityReceived, l.outstanding())).toList());
    }
}
