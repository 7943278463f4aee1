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
    private static final double DAYS_PER_YEAR = 365.25;

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
        for (FleetSnapshot.BomPart part : pump.bom()) {
            FleetRateModel model = models.get(part.family());
            if (model == null || byFamily.containsKey(part.family())) {
                continue;
            }
            double[] expected = new double[MONTHS];
            for (int m = 0; m < MONTHS; m++) {
                long from = Math.max(monthStart[m], pump.installedDay());
                long to = Math.min(monthStart[m + 1], pump.endDay());
                double hours = pump.usage().hoursBetween(from, to);
                if (hours > 0) {
                    double age = ((from + to) / 2.0 - pump.installedDay()) / DAYS_PER_YEAR;
                    expected[m] = model.expectedUnits(pump.depotId(), pump.depthM(), age, hours, to - from);
                }
            }
            byFamily.put(part.family(), expected);
        }
        return byFamily;
    }
}
