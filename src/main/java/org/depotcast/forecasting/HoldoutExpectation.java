package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.DemandChoice;
import org.depotcast.core.forecast.FleetRateModel;

import java.util.EnumMap;
import java.util.Map;

/**
 * What the holdout models (fitted without the last 12 months of history) expected of a pump in each of those months:
 * the fleet model's side of the backtest that {@link DemandChoice} scores against the part's own history.
 */
final class HoldoutExpectation {
    private static final int MONTHS = DemandChoice.HOLDOUT_MONTHS;

    private final Map<ComponentFamily, FleetRateModel> models;
    private final long[] monthStart = new long[MONTHS + 1];

    HoldoutExpectation(FleetSnapshot snapshot, Map<ComponentFamily, FleetRateModel> models) {
        this.models = models;
        for (int m = 0; m <= MONTHS; m++) {
            monthStart[m] = snapshot.historyEnd().minusMonths(MONTHS).plusMonths(m).toEpochDay();
        }
    }

    /** Expected breakdown units per held-out month, by family of the pump's parts: depends on the pump alone. */
    Map<ComponentFamily, double[]> expectedOf(FleetSnapshot.PumpRecord pump) {
        Map<ComponentFamily, double[]> byFamily = new EnumMap<>(ComponentFamily.class);
        PumpExposure exposure = null;
        for (FleetSnapshot.BomPart part : pump.bom()) {
            FleetRateModel model = models.get(part.family());
            if (model == null || byFamily.containsKey(part.family())) {
                continue;
            }
            if (exposure == null) {
                exposure = PumpExposure.of(pump, monthStart, Long.MIN_VALUE);
            }
            double[] expected = new double[MONTHS];
            for (int m = 0; m < MONTHS; m++) {
                if (exposure.hours()[m] > 0) {
                    expected[m] = model.expectedUnits(pump.depotId(), pump.depthM(), exposure.ageYears()[m],
                            exposure.hours()[m], exposure.days()[m]);
                }
            }
            byFamily.put(part.family(), expected);
        }
        return byFamily;
    }
}
