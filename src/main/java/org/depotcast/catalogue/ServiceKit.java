package org.depotcast.catalogue;

import java.util.List;

/**
 * What a preventive service of one pump model at one depth replaces, as other features read it: the model's service
 * interval in operating hours and, per part of its bill of materials, the units a service kit holds (per-metre lines
 * scaled to the depth as {@link BomLine#serviceKitQuantity(double)} does).
 */
public record ServiceKit(int serviceIntervalHours, List<Line> lines) {
    public record Line(long partId, ComponentFamily family, double units) {
    }

    static ServiceKit of(PumpModel model, double depthM) {
        return new ServiceKit(model.serviceIntervalHours, model.bom.stream()
                .map(line -> new Line(line.part.id, line.part.family, line.serviceKitQuantity(depthM))).toList());
    }
}
