package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CovariateSelection;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.PoissonRegression;
import org.depotcast.core.forecast.RateCovariate;
import org.depotcast.core.forecast.RateShrinkage;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Fits one family's fleet model on pump-year rows: each pump in each 12-month block of the history (counted back
 * from the forecast origin) is a row with its operating hours as exposure, its covariates at mid-period, and the
 * breakdowns of that family. A family with fewer than {@link #MIN_EVENTS} breakdowns, or a singular design, falls
 * back to the declared prior rate. Of the declared covariates, the model keeps those the data carry
 * ({@link CovariateSelection}, by BIC).
 */
final class FleetModelFitter {
    static final int MIN_EVENTS = 10;

    private FleetModelFitter() {
    }

    /** Breakdown days per pump for one family, and the mean units replaced per breakdown. */
    record Breakdowns(Map<Long, long[]> daysByPump, double meanUnits) {
        static Map<ComponentFamily, Breakdowns> of(FleetSnapshot snapshot) {
            Map<ComponentFamily, Map<Long, List<Long>>> days = new java.util.EnumMap<>(ComponentFamily.class);
            Map<ComponentFamily, double[]> units = new java.util.EnumMap<>(ComponentFamily.class);
            for (FleetSnapshot.Consumption c : snapshot.consumption()) {
                ComponentFamily family = snapshot.partFamilies().get(c.partId());
                if (c.breakdown() && family != null) {
                    days.computeIfAbsent(family, f -> new HashMap<>()).computeIfAbsent(c.pumpId(), k -> new ArrayList<>())
                            .add(c.day().toEpochDay());
                    double[] u = units.computeIfAbsent(family, f -> new double[2]);
                    u[0] += c.quantity();
                    u[1]++;
                }
            }
            Map<ComponentFamily, Breakdowns> result = new java.util.EnumMap<>(ComponentFamily.class);
            days.forEach((family, byPump) -> {
                Map<Long, long[]> arrays = new HashMap<>();
                byPump.forEach((pump, list) -> arrays.put(pump, list.stream().mapToLong(Long::longValue).toArray()));
                double[] u = units.get(family);
                result.put(family, new Breakdowns(arrays, u[0] / u[1]));
            });
            return result;
        }
    }

    /** Every declared family's model on one snapshot; families fit independently, one per core. */
    static Map<ComponentFamily, FleetRateModel> fitAll(Map<ComponentFamily, ForecastModelDefinition> definitions,
                                                       FleetSnapshot snapshot, int skipRecentBlocks) {
        return fitBoth(definitions, snapshot, skipRecentBlocks).full();
    }

    /** Each family's model on the whole history and on the history without its last 12 months (the backtest's). */
    record Fits(Map<ComponentFamily, FleetRateModel> full, Map<ComponentFamily, FleetRateModel> holdout) {
    }

    /**
     * Both fits of every declared family, one family per core. The holdout's rows are the full fit's without the
     * last block, so each family's rows are collected once and serve both; {@code holdoutFrom} 1 for the holdout
     * fits too, 0 to make none.
     */
    static Fits fitBoth(Map<ComponentFamily, ForecastModelDefinition> definitions, FleetSnapshot snapshot,
                        int holdoutFrom) {
        Map<ComponentFamily, Breakdowns> breakdowns = Breakdowns.of(snapshot);
        Map<ComponentFamily, FleetRateModel> full = new java.util.EnumMap<>(ComponentFamily.class);
        Map<ComponentFamily, FleetRateModel> holdout = new java.util.EnumMap<>(ComponentFamily.class);
        definitions.values().parallelStream().map(d -> {
            Breakdowns b = breakdowns.get(d.family());
            PumpYearRows rows = PumpYearRows.of(d, snapshot, b);
            return Map.entry(d.family(), new FleetRateModel[]{model(d, rows, unitsPerEvent(d, b)),
                    holdoutFrom > 0 ? model(d, rows.from(holdoutFrom), unitsPerEvent(d, b)) : null});
        }).toList().forEach(m -> {
            full.put(m.getKey(), m.getValue()[0]);
            if (m.getValue()[1] != null) {
                holdout.put(m.getKey(), m.getValue()[1]);
            }
        });
        return new Fits(full, holdout);
    }

    /** @param skipRecentBlocks 0 to use the whole history; 1 to hold out the last 12 months (for the backtest) */
    static FleetRateModel fit(ForecastModelDefinition definition, FleetSnapshot snapshot, Breakdowns breakdowns,
                          int skipRecentBlocks) {
        return model(definition, PumpYearRows.of(definition, snapshot, breakdowns).from(skipRecentBlocks),
                unitsPerEvent(definition, breakdowns));
    }

    private static double unitsPerEvent(ForecastModelDefinition definition, Breakdowns breakdowns) {
        return definition.unitsPerEvent() != null ? definition.unitsPerEvent()
                : breakdowns != null ? breakdowns.meanUnits() : 1.0;
    }

    /** The model on the collected pump-year rows: the covariates the data carry (BIC), or the prior when too few. */
    private static FleetRateModel model(ForecastModelDefinition definition, PumpYearRows rows, double units) {
        double[][] covariates = rows.covariates();
        double[] y = rows.y(), e = rows.e();
        long[] depots = rows.depots();
        int events = (int) java.util.Arrays.stream(y).sum();
        double exposure = java.util.Arrays.stream(e).sum();
        double prior = definition.priorEventsPer1000Hours() / 1000.0;
        PoissonFit fit = null;
        List<RateCovariate> kept = definition.covariates();
        if (events >= MIN_EVENTS) {
            try {
                CovariateSelection.Choice choice = CovariateSelection.byBic(covariates, y, e);
                fit = choice.fit();
                kept = java.util.Arrays.stream(choice.columns()).mapToObj(definition.covariates()::get).toList();
                covariates = CovariateSelection.select(covariates, choice.columns());
            } catch (PoissonRegression.SingularDesignException singular) {
                fit = null;
            }
        }
        return new FleetRateModel(kept, fit, prior, units, events, exposure, depotRatios(fit, covariates, y, e, depots));
    }

    private static Map<Long, Double> depotRatios(PoissonFit fit, double[][] covariates, double[] y, double[] e,
                                                 long[] depots) {
        if (fit == null) {
            // A prior is not fitted to these data: scaling it by their ratios would just refit it badly.
            return Map.of();
        }
        Map<Long, double[]> observedExpected = new HashMap<>();
        for (int i = 0; i < y.length; i++) {
            double expected = fit.expected(covariates[i], e[i]);
            double[] oe = observedExpected.computeIfAbsent(depots[i], k -> new double[2]);
            oe[0] += y[i];
            oe[1] += expected;
        }
        List<Long> ids = new ArrayList<>(observedExpected.keySet());
        ids.removeIf(id -> !(observedExpected.get(id)[1] > 0));
        Map<Long, Double> ratios = new HashMap<>();
        if (ids.isEmpty()) {
            return ratios;
        }
        double[] o = new double[ids.size()], ex = new double[ids.size()];
        for (int i = 0; i < ids.size(); i++) {
            o[i] = observedExpected.get(ids.get(i))[0];
            ex[i] = observedExpected.get(ids.get(i))[1];
        }
        if (!RateShrinkage.groupsDiffer(o, ex, y.length, fit.varianceFactor())) {
            return ratios; // the depots differ by no more than chance: one fleet rate everywhere
        }
        double[] shrunk = RateShrinkage.shrink(o, ex);
        for (int i = 0; i < ids.size(); i++) {
            ratios.put(ids.get(i), shrunk[i]);
        }
        return ratios;
    }
}
