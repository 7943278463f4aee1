package org.depotcast.catalogue;

import java.math.BigDecimal;
import java.util.List;

public record PumpModelResponse(String code, String name, int serviceIntervalHours, List<Line> bom, long version) {
    public record Line(String partNumber, ComponentFamily family, BomBasis basis, BigDecimal quantity,
                       BigDecimal serviceKitQuantity) {
    }

    static PumpModelResponse from(PumpModel m) {
        return new PumpModelResponse(m.code, m.name, m.serviceIntervalHours, m.bom.stream()
                .map(l -> new Line(l.part.partNumber, l.part.family, l.basis, l.quantity, l.serviceKitQuantity))
                .toList(), m.version);
    }
}
