package org.depotcast.catalogue;

import java.math.BigDecimal;
import java.util.List;

/**
 * A pump model and its bill of materials as other features read them: records, not the entities, so they hold no
 * managed model, line or part. A line's units at a depth are {@link BomLine}'s (per-metre lines round up).
 */
public record PumpModelSummary(long id, String code, int serviceIntervalHours, List<Line> bom) {
    /** One part of the bill of materials: how many a pump holds and how many a service kit replaces. */
    public record Line(long partId, String partNumber, ComponentFamily family, boolean critical, BomBasis basis,
                       BigDecimal quantity, BigDecimal serviceKitQuantity) {
        /** Units installed in one pump at this depth. */
        public double installedQuantity(double depthM) {
            return basis.unitsAt(quantity, depthM);
        }

        /** Units a preventive service replaces in a pump at this depth. */
        public double serviceKitQuantity(double depthM) {
            return basis.unitsAt(serviceKitQuantity, depthM);
        }
    }

    static PumpModelSummary from(PumpModel model) {
        return new PumpModelSummary(model.id, model.code, model.serviceIntervalHours, model.bom.stream()
                .map(line -> new Line(line.part.id, line.part.partNumber, line.part.family, line.part.critical,
                        line.basis, line.quantity, line.serviceKitQuantity)).toList());
    }
}
