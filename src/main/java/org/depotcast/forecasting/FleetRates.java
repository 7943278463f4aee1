package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * A finished forecast run's fleet rate models by family, as the run fitted and used them: what other features read
 * to agree with the run's family rates for a pump.
 *
 * @param runId  the run the models come from
 * @param models the rate model of each family the run fitted
 */
public record FleetRates(long runId, Map<ComponentFamily, FleetRateModel> models) {
    public FleetRates {
        // In the families' declared order, so answers built from it list families the same way every time.
        EnumMap<ComponentFamily, FleetRateModel> ordered = new EnumMap<>(ComponentFamily.class);
        ordered.putAll(models);
        models = Collections.unmodifiableMap(ordered);
    }
}
