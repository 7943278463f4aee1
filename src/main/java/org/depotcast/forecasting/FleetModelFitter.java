package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CovariateSelection;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.PoissonRegression;
import org.depotcast.core.forecast.RateCovariate;
import org.depotcast.core.forecast.RateShrinkage;

import java.time.LocalDate;
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
    private static final double DAYS_PER_YEAR = 365.25;

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
        Map<ComponentFamily, Breakdowns> breakdowns = Breakdowns.of(snapshot);
        Map<ComponentFamily, FleetRateModel> models = new java.util.EnumMap<>(ComponentFamily.class);
        definitions.values().parallelStream()
                .map(d -> Map.entry(d.family(), fit(d, snapshot, breakdowns.get(d.family()), skipRecentBlocks)))
                .toList().forEach(e -> models.put(e.getKey(), e.getValue()));
        return models;
    }

    /** @param skipRecentBlocks 0 to use the whole history; 1 to hold out the last 12 months (for the backtest) */
    static FleetRateModel fit(ForecastModelDefinition definition, FleetSnapshot snapshot, Breakdowns breakdowns,
                          int skipRecentBlocks) {
        ComponentFamily family = definition.family();
        Map<Long, long[]> eventDays = breakdowns == null ? Map.of() : breakdowns.daysByPump();
        double units = definition.unitsPerEvent() != null ? definition.unitsPerEvent()
                : breakdowns != null ? breakdowns.meanUnits() : 1.0;
        int blocks = snapshot.months() / 12;
        int capacity = snapshot.pumps().size() * blocks;
        double[][] covariates = new double[capacity][];
        double[] y = new double[capacity], e = new double[capacity];
        long[] depots = new long[capacity];
        int rows = 0;
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            if (pump.bom().stream().noneMatch(b -> b.family() == family)) {
                continue;
            }
            long[] events = eventDays.getOrDefault(pump.id(), new long[0]);
            for (int b = skipRecentBlocks; b < blocks; b++) {
                LocalDate blockEnd = snapshot.historyEnd().minusMonths(12L * b);
                // Hours before the first repair on record would count as event-free: leave them out.
                long from = Math.max(Math.max(blockEnd.minusMonths(12).toEpochDay(), pump.installedDay()),
                        snapshot.recordsStartDay());
                long to = Math.min(blockEnd.toEpochDay(), pump.endDay());
                double hours = pump.usage().hoursBetween(from, to);
                if (to - from < 1 || hours < 1) {
                    continue;
                }
                int count = 0;
                for (long day : events) {
                    if (day >= from && day < to) {
                        count++;
                    }
                }
                double age = ((from + to) / 2.0 - pump.installedDay()) / DAYS_PER_YEAR;
                covariates[rows] = RateCovariate.values(definition.covariates(), pump.depthM(), age, hours / (to - from));
                y[rows] = count;
                e[rows] = hours;
                depots[rows] = pump.depotId();
                rows++;
            }
        }
        return model(definition, java.util.Arrays.copyOf(covariates, rows), java.util.Arrays.copyOf(y, rows),
                java.util.Arrays.copyOf(e, rows), java.util.Arrays.copyOf(depots, rows), units);
    }

    /** The model on the collected pump-year rows: the covariates the data carry (BIC), or the prior when too few. */
    private static FleetRateModel model(ForecastModelDefinition definition, double[][] covariates, double[] y, double[] e,
                                        long[] depots, double units) {
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
