package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.DemandProfile;
import org.depotcast.core.forecast.ErrorScores;
import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.SeriesFitter;
import org.depotcast.core.forecast.SeriesForecast;
import org.depotcast.core.forecast.SeriesForecaster;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.IntConsumer;

/**
 * Turns a fleet snapshot and the fitted fleet models into a forecast for every part at every depot, kit and the
 * whole programme. Breakdown demand comes either from the fleet model (rate per operating hour × each pump's hours ×
 * units per breakdown × its depot's shrunk ratio) or from the part's own history by a series method; which one is
 * decided per series by the declared policy, and under "auto" by the lower RMSSE over the last 12 months with the
 * fleet model refitted without them. Scheduled-service demand is added on top, pump by pump.
 */
final class DemandAssembler {
    static final String PROGRAMME = "PROGRAMME";
    static final String FLEET = "FLEET";
    private static final int HOLDOUT_MONTHS = 12;
    private static final double DAYS_PER_MONTH = 365.25 / 12;
    private static final ErrorScores UNSCORED = new ErrorScores(Double.NaN, Double.NaN, Double.NaN, 0);

    private final FleetSnapshot snapshot;
    private final Map<ComponentFamily, ForecastModelDefinition> definitions;
    private final Map<ComponentFamily, FleetModel> models;
    private final Map<ComponentFamily, FleetModel> holdoutModels;
    private final int horizon;
    private final int months;
    private final Map<String, double[]> history = new LinkedHashMap<>();
    private final Map<String, double[]> fleetFuture = new LinkedHashMap<>();
    private final Map<String, double[]> fleetHoldout = new LinkedHashMap<>();
    private final Map<String, double[]> preventive = new LinkedHashMap<>();
    /** First history month index of each series: its real start, see {@link #seriesStart}. */
    private final Map<String, Integer> firstMonth = new java.util.HashMap<>();
    private final FleetCredibility credibility;
    private Map<String, FleetCredibility.Weight> weights = Map.of();

    DemandAssembler(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions,
                    Map<ComponentFamily, FleetModel> models, Map<ComponentFamily, FleetModel> holdoutModels, int horizon) {
        this.snapshot = snapshot;
        this.definitions = definitions;
        this.models = models;
        this.holdoutModels = holdoutModels;
        this.horizon = horizon;
        this.months = snapshot.months();
        this.credibility = new FleetCredibility(snapshot, models);
        collect();
    }

    /** Series keys are "partId|locationCode". */
    private static String key(long partId, String location) {
        return partId + "|" + location;
    }

    private List<String> locationsOf(long depotId, String mechanic) {
        List<String> codes = new ArrayList<>(3);
        codes.add(PROGRAMME);
        codes.add(snapshot.locationCodes().get(depotId));
        String kit = mechanic == null ? null : snapshot.kitByMechanic().get(mechanic);
        if (kit != null) {
            codes.add(kit);
        }
        return codes;
    }

    int seriesCount() {
        return history.size();
    }

    private void collect() {
        for (FleetSnapshot.Consumption c : snapshot.consumption()) {
            int m = snapshot.monthIndex(c.day());
            if (!c.breakdown() || m < 0 || m >= months) {
                continue;
            }
            for (String location : locationsOf(c.depotId(), c.mechanic())) {
                history.computeIfAbsent(key(c.partId(), location), k -> new double[months])[m] += c.quantity();
                firstMonth.merge(key(c.partId(), location), m, Math::min);
            }
        }
        long origin = snapshot.historyEnd().toEpochDay();
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            List<String> locations = locationsOf(pump.depotId(), pump.mechanic());
            boolean activeNow = pump.endDay() > origin;
            int installedMonth = Math.max(0, snapshot.monthIndex(java.time.LocalDate.ofEpochDay(pump.installedDay())));
            credibility.addPump(pump, locations, part -> Long.toString(part.partId()));
            for (FleetSnapshot.BomPart part : pump.bom()) {
                addFleet(pump, part, locations, activeNow, origin);
                for (String location : locations) {
                    firstMonth.merge(key(part.partId(), location), installedMonth, Math::min);
                }
            }
            if (activeNow) {
                addPreventive(pump, locations, origin);
            }
        }
        // Every series with a fleet expectation or a history gets a forecast.
        fleetFuture.keySet().forEach(k -> history.computeIfAbsent(k, x -> new double[months]));
        preventive.keySet().forEach(k -> history.computeIfAbsent(k, x -> new double[months]));
    }

    private void addFleet(FleetSnapshot.PumpRecord pump, FleetSnapshot.BomPart part, List<String> locations,
                          boolean activeNow, long origin) {
        FleetModel model = models.get(part.family());
        FleetModel holdout = holdoutModels.get(part.family());
        if (model == null) {
            return;
        }
        if (activeNow) {
            // Cells: expected units in each horizon month, then the first month's variance.
            double hoursPerDay = pump.usage().hoursPerDayOn(origin);
            double[] units = new double[horizon + 1];
            for (int m = 0; m < horizon; m++) {
                // The pump ages over the horizon: its age at the middle of each forecast month.
                double age = (origin - pump.installedDay()) / 365.25 + (m + 0.5) / 12;
                double[] x = FleetModel.covariateValues(model.covariates(), pump.depthM(), Math.max(0, age), hoursPerDay);
                units[m] = model.ratePerHour(x) * hoursPerDay * DAYS_PER_MONTH * model.depotRatio(pump.depotId())
                        * model.unitsPerEvent();
            }
            units[horizon] = units[0] * model.unitsPerEvent() * (model.fit() == null ? 1 : model.fit().varianceFactor());
            for (String location : locations) {
                double[] cell = fleetFuture.computeIfAbsent(key(part.partId(), location), k -> new double[horizon + 1]);
                for (int m = 0; m <= horizon; m++) {
                    cell[m] += units[m];
                }
            }
        }
        if (holdout != null) {
            double[] expected = new double[HOLDOUT_MONTHS];
            LocalDate start = snapshot.historyEnd().minusMonths(HOLDOUT_MONTHS);
            for (int m = 0; m < HOLDOUT_MONTHS; m++) {
                long from = Math.max(start.plusMonths(m).toEpochDay(), pump.installedDay());
                long to = Math.min(start.plusMonths(m + 1).toEpochDay(), pump.endDay());
                double hours = pump.usage().hoursBetween(from, to);
                if (hours > 0) {
                    double age = ((from + to) / 2.0 - pump.installedDay()) / 365.25;
                    double[] x = FleetModel.covariateValues(holdout.covariates(), pump.depthM(), age, hours / (to - from));
                    expected[m] = holdout.ratePerHour(x) * hours * holdout.unitsPerEvent() * holdout.depotRatio(pump.depotId());
                }
            }
            for (String location : locations) {
                double[] cell = fleetHoldout.computeIfAbsent(key(part.partId(), location), k -> new double[HOLDOUT_MONTHS]);
                for (int m = 0; m < HOLDOUT_MONTHS; m++) {
                    cell[m] += expected[m];
                }
            }
        }
    }

    private void addPreventive(FleetSnapshot.PumpRecord pump, List<String> locations, long origin) {
        double hoursPerDay = pump.usage().hoursPerDayOn(origin);
        double[] hoursPerMonth = new double[horizon];
        Arrays.fill(hoursPerMonth, hoursPerDay * DAYS_PER_MONTH);
        double[] due = pump.servicesPerMonth(origin, hoursPerMonth);
        if (Arrays.stream(due).sum() == 0) {
            return;
        }
        for (FleetSnapshot.BomPart part : pump.bom()) {
            ForecastModelDefinition definition = definitions.get(part.family());
            if (part.serviceKitQuantity() <= 0 || definition == null || !definition.preventive()) {
                continue;
            }
            for (String location : locations) {
                double[] cell = preventive.computeIfAbsent(key(part.partId(), location), k -> new double[horizon]);
                for (int m = 0; m < horizon; m++) {
                    cell[m] += due[m] * part.serviceKitQuantity();
                }
            }
        }
    }

    /**
     * The month a series really starts: the first month a pump using the part was in service there, or its first
     * demand, but never before the first repair on record (months before it are unrecorded, not zero).
     */
    int seriesStart(String key) {
        int recordsStart = Math.max(0, snapshot.monthIndex(java.time.LocalDate.ofEpochDay(snapshot.recordsStartDay())));
        int start = Math.max(recordsStart, firstMonth.getOrDefault(key, recordsStart));
        return Math.max(0, Math.min(start, months - 1));
    }

    /** Forecasts every series; {@code progress} is told after each one. */
    List<PartForecastResult> assemble(IntConsumer progress) {
        List<String> weighed = fleetFuture.keySet().stream().filter(k -> policyOf(partOf(k)).equals("auto")).toList();
        java.util.Set<String> kits = new java.util.HashSet<>(snapshot.kitByMechanic().values());
        weights = credibility.weigh(weighed, history, this::seriesStart, k -> {
            String location = k.substring(k.indexOf('|') + 1);
            return location.equals(PROGRAMME) ? PROGRAMME : kits.contains(location) ? "kit" : "depot";
        }, k -> {
            FleetModel model = models.get(snapshot.partFamilies().get(partOf(k)));
            return model.unitsPerEvent() * (model.fit() == null ? 1 : model.fit().varianceFactor());
        });
        // Series are independent and the maps are read-only from here on: use every core.
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        return history.entrySet().parallelStream().map(entry -> {
            PartForecastResult result = forecastOne(entry.getKey(), entry.getValue());
            progress.accept(done.incrementAndGet());
            return result;
        }).toList();
    }

    private static long partOf(String key) {
        return Long.parseLong(key.substring(0, key.indexOf('|')));
    }

    private String policyOf(long partId) {
        ForecastModelDefinition definition = definitions.get(snapshot.partFamilies().get(partId));
        return definition == null ? "auto" : definition.methodPolicy();
    }

    private PartForecastResult forecastOne(String key, double[] window) {
        int start = seriesStart(key);
        double[] series = Arrays.copyOfRange(window, start, months);
        int bar = key.indexOf('|');
        long partId = Long.parseLong(key.substring(0, bar));
        String location = key.substring(bar + 1);
        String policy = policyOf(partId);
        ForecastMethod fixed = policy.equals("auto") || policy.equals("fleet") ? null
                : ForecastMethod.valueOf(policy.toUpperCase(Locale.ROOT));
        SeriesForecast fromHistory = SeriesForecaster.forecast(series, fixed, Double.NaN, Double.NaN, horizon);
        int n = series.length;
        ErrorScores historyScores = UNSCORED, fleetScores = null;
        double[] fleetHold = fleetHoldout.get(key);
        if (n >= HOLDOUT_MONTHS + 2) {
            double[] training = Arrays.copyOf(series, n - HOLDOUT_MONTHS);
            double[] actual = Arrays.copyOfRange(series, n - HOLDOUT_MONTHS, n);
            double historyFlat = SeriesFitter.fitOptimised(training, fromHistory.method(), Double.NaN, Double.NaN).perPeriod();
            double[] historyHoldout = new double[HOLDOUT_MONTHS];
            Arrays.fill(historyHoldout, historyFlat);
            historyScores = ErrorScores.of(training, historyHoldout, actual);
            fleetScores = fleetHold == null ? null : ErrorScores.of(training, fleetHold, actual);
        }
        double[] fleet = fleetFuture.get(key);
        // Under "auto" a series with a fleet expectation takes the fleet rate updated by its own history
        // (credibility), never a choice on one window; the holdout scores stay as diagnostics.
        boolean useFleet = fleet != null && (policy.equals("fleet") || policy.equals("auto"));
        FleetCredibility.Weight weight = policy.equals("auto")
                ? weights.getOrDefault(key, FleetCredibility.Weight.FLEET_ONLY) : FleetCredibility.Weight.FLEET_ONLY;
        double[] pm = preventive.getOrDefault(key, new double[horizon]);
        double breakdown = useFleet ? fleet[0] * weight.ratio() : fromHistory.forecast()[0];
        // The rate's own uncertainty adds Var(ratio) × mean² to the demand's variance.
        double variance = useFleet ? Math.max(fleet[horizon], 0) * weight.ratio() + weight.ratioVariance() * fleet[0] * fleet[0]
                : fromHistory.perPeriodVariance();
        double[] monthly = new double[horizon];
        for (int m = 0; m < horizon; m++) {
            monthly[m] = (useFleet ? fleet[m] * weight.ratio() : breakdown) + pm[m];
        }
        return new PartForecastResult(partId, location, useFleet ? FLEET : fromHistory.method().name(),
                useFleet ? Double.NaN : fromHistory.alpha(), useFleet ? Double.NaN : fromHistory.beta(),
                DemandProfile.of(series), breakdown, variance, pm, monthly, series, snapshot.historyStart().plusMonths(start),
                useFleet && fleetScores != null ? fleetScores : historyScores,
                fleetScores == null ? Double.NaN : fleetScores.rmsse(), historyScores.rmsse(),
                useFleet ? weight.describe(snapshot.historyStart().plusMonths(start)) : fromHistory.method().name().toLowerCase(Locale.ROOT)
                        + " on the part's own history");
    }
}
