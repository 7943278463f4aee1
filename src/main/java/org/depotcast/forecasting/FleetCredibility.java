package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CredibilityWeight;
import org.depotcast.core.forecast.FleetRateModel;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * What the fleet model expected of each series over its own history, month by month, and the credibility its
 * observed history earns against that ({@link CredibilityWeight#ofGroup}): the fleet rate is the prior, the part's history at
 * the location updates it. Series are weighed in groups of one level (the programme, depots, kits), which share the
 * estimate of how far true rates stray from the fleet model's.
 */
final class FleetCredibility {
    private final FleetSnapshot snapshot;
    private final Map<ComponentFamily, FleetRateModel> models;
    private final long[] monthStart;
    private final Map<String, double[]> expected = new HashMap<>();

    FleetCredibility(FleetSnapshot snapshot, Map<ComponentFamily, FleetRateModel> models) {
        this.snapshot = snapshot;
        this.models = models;
        int months = snapshot.months();
        monthStart = new long[months + 1];
        for (int m = 0; m <= months; m++) {
            monthStart[m] = snapshot.historyStart().plusMonths(m).toEpochDay();
        }
    }

    /**
     * One pump's fleet-expected breakdown units in each history month, by family: it depends on the pump alone, so
     * pumps can be worked out in parallel and then added in order ({@link #addPump}).
     */
    Map<ComponentFamily, double[]> expectedOf(FleetSnapshot.PumpRecord pump) {
        Map<ComponentFamily, double[]> byFamily = new EnumMap<>(ComponentFamily.class);
        int months = monthStart.length - 1;
        PumpExposure exposure = null;
        for (FleetSnapshot.BomPart part : pump.bom()) {
            FleetRateModel model = models.get(part.family());
            if (model == null || byFamily.containsKey(part.family())) {
                continue;
            }
            if (exposure == null) {
                // As the fit: no exposure before the first repair on record.
                exposure = PumpExposure.of(pump, monthStart, snapshot.recordsStartDay());
            }
            double[] units = new double[months];
            for (int m = 0; m < months; m++) {
                if (exposure.days()[m] > 0) {
                    units[m] = model.expectedUnits(pump.depotId(), pump.depthM(), exposure.ageYears()[m],
                            exposure.hours()[m], exposure.days()[m]);
                }
            }
            byFamily.put(part.family(), units);
        }
        return byFamily;
    }

    /** Adds one pump's {@link #expectedOf} to each of its series ({@code keysByPart}). */
    void addPump(FleetSnapshot.PumpRecord pump, Map<ComponentFamily, double[]> byFamily,
                 Map<Long, List<String>> keysByPart) {
        int months = monthStart.length - 1;
        for (FleetSnapshot.BomPart part : pump.bom()) {
            double[] perMonth = byFamily.get(part.family());
            if (perMonth == null) {
                continue;
            }
            for (String key : keysByPart.get(part.partId())) {
                double[] cell = expected.computeIfAbsent(key, k -> new double[months]);
                for (int m = 0; m < months; m++) {
                    cell[m] += perMonth[m];
                }
            }
        }
    }

    /**
     * Weighs the given series: observed units from each series' start against the fleet's expectation over the same
     * months, grouped by {@code level}; {@code dispersion} gives φ of a series (units per event × the fit's variance
     * factor).
     */
    Map<String, CredibilityWeight> weigh(List<String> keys, Map<String, double[]> history, Function<String, Integer> start,
                              Function<String, String> level, Function<String, Double> dispersion) {
        Map<String, List<String>> groups = new HashMap<>();
        Map<String, double[]> sums = new HashMap<>();
        for (String key : keys) {
            double[] e = expected.get(key), o = history.get(key);
            if (e == null || o == null) {
                continue;
            }
            double sumE = 0, sumO = 0;
            for (int m = start.apply(key); m < e.length; m++) {
                sumE += e[m];
                sumO += o[m];
            }
            if (sumE > 0) {
                sums.put(key, new double[]{sumO, sumE, dispersion.apply(key)});
                groups.computeIfAbsent(level.apply(key), g -> new ArrayList<>()).add(key);
            }
        }
        Map<String, CredibilityWeight> weights = new HashMap<>();
        for (List<String> group : groups.values()) {
            int n = group.size();
            double[] o = new double[n], e = new double[n], phi = new double[n];
            for (int i = 0; i < n; i++) {
                double[] s = sums.get(group.get(i));
                o[i] = s[0];
                e[i] = s[1];
                phi[i] = s[2];
            }
            CredibilityWeight[] weighed = CredibilityWeight.ofGroup(o, e, phi);
            for (int i = 0; i < n; i++) {
                weights.put(group.get(i), weighed[i]);
            }
        }
        return weights;
    }
}
