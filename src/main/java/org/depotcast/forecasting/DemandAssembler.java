package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.CredibilityWeight;
import org.depotcast.core.forecast.DemandChoice;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PumpMonths;
import org.depotcast.core.forecast.ServiceTiming;

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
 * decided per series by the declared policy; under "auto" a series the fleet model covers takes the fleet rate
 * updated by its own history by credibility ({@link FleetCredibility}). Scheduled-service demand is added on top, pump by pump ({@link HorizonDemand}),
 * and each forecast carries the variance of every month and of its first 12 months together ({@link DemandSpread}).
 */
final class DemandAssembler {
    static final String PROGRAMME = "PROGRAMME";
    static final String FLEET = "FLEET";
    private static final int HOLDOUT_MONTHS = DemandChoice.HOLDOUT_MONTHS;
    /** Pumps worked out together in parallel: enough to keep the cores busy, few enough to hold little memory. */
    private static final int PUMPS_AT_ONCE = 1024;

    private final FleetSnapshot snapshot;
    private final Map<ComponentFamily, ForecastModelDefinition> definitions;
    private final Map<ComponentFamily, FleetRateModel> models;
    private final HoldoutExpectation holdout;
    private final int horizon;
    private final int months;
    private final Map<String, double[]> history = new LinkedHashMap<>();
    private final Map<String, double[]> fleetHoldout = new LinkedHashMap<>();
    /** First history month index of each series: its real start, see {@link #seriesStart}. */
    private final Map<String, Integer> firstMonth = new java.util.HashMap<>();
    private final Map<Long, Map<String, String>> keys = new java.util.HashMap<>();
    private final FleetCredibility credibility;
    private final HorizonDemand horizonDemand;
    private Map<String, CredibilityWeight> weights = Map.of();

    DemandAssembler(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions,
                    Map<ComponentFamily, FleetRateModel> models, Map<ComponentFamily, FleetRateModel> holdoutModels, int horizon) {
        this.snapshot = snapshot;
        this.definitions = definitions;
        this.models = models;
        this.holdout = new HoldoutExpectation(snapshot, holdoutModels);
        this.horizon = horizon;
        this.months = snapshot.months();
        this.credibility = new FleetCredibility(snapshot, models);
        this.horizonDemand = new HorizonDemand(new FleetOutlook(snapshot, definitions, models, horizon));
        collect();
    }

    /**
     * Series keys are "partId|locationCode", one String each: every pump adds to its parts' series a dozen times, and
     * a key made afresh each time was hashed afresh (string hashing and map searches were most of assembling in a
     * profile at 40 times the demo).
     */
    private String key(long partId, String location) {
        return keys.computeIfAbsent(partId, p -> new java.util.HashMap<>())
                .computeIfAbsent(location, l -> partId + "|" + l);
    }

    private List<String> keysOf(long partId, List<String> locations) {
        return locations.stream().map(location -> key(partId, location)).toList();
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
        List<FleetSnapshot.PumpRecord> pumps = inSeriesOrder(snapshot.pumps());
        for (int first = 0; first < pumps.size(); first += PUMPS_AT_ONCE) {
            List<FleetSnapshot.PumpRecord> batch = pumps.subList(first, Math.min(pumps.size(), first + PUMPS_AT_ONCE));
            // What the models expect of a pump depends on that pump alone: worked out on every core, then added to
            // the series in the same order as ever, so every sum is the same to the last digit.
            List<PumpExpectation> expected = batch.parallelStream().map(pump -> expectationOf(pump, origin)).toList();
            for (int i = 0; i < batch.size(); i++) {
                addPump(batch.get(i), expected.get(i));
            }
        }
        // Every series with a fleet expectation or a history gets a forecast.
        horizonDemand.keys().forEach(k -> history.computeIfAbsent(k, x -> new double[months]));
    }

    /**
     * Pumps of one depot and mechanic together: consecutive pumps then add to the same series, whose sums stay in the
     * processor's cache (in a profile at 40 times the demo, map look-ups of series scattered over the whole programme
     * were the largest single cost of assembling).
     */
    private static List<FleetSnapshot.PumpRecord> inSeriesOrder(List<FleetSnapshot.PumpRecord> pumps) {
        List<FleetSnapshot.PumpRecord> ordered = new ArrayList<>(pumps);
        ordered.sort(java.util.Comparator.comparingLong(FleetSnapshot.PumpRecord::depotId)
                .thenComparing(FleetSnapshot.PumpRecord::mechanic, java.util.Comparator.nullsFirst(String::compareTo)));
        return ordered;
    }

    /** A pump's history and horizon as the models see them; {@code ahead} null when it is out of service by then. */
    private record PumpExpectation(Map<ComponentFamily, double[]> history, Map<ComponentFamily, double[]> holdout,
                                   PumpMonths ahead, Map<ComponentFamily, HorizonDemand.Breakdowns> breakdowns,
                                   ServiceTiming.Outlook services) {
    }

    private PumpExpectation expectationOf(FleetSnapshot.PumpRecord pump, long origin) {
        PumpMonths ahead = pump.endDay() > origin ? horizonDemand.monthsOf(pump) : null;
        return new PumpExpectation(credibility.expectedOf(pump), holdout.expectedOf(pump), ahead,
                ahead == null ? null : horizonDemand.breakdownsOf(pump, ahead),
                ahead == null ? null : horizonDemand.servicesOf(pump, ahead));
    }

    private void addPump(FleetSnapshot.PumpRecord pump, PumpExpectation expected) {
        List<String> locations = locationsOf(pump.depotId(), pump.mechanic());
        int installedMonth = Math.max(0, snapshot.monthIndex(java.time.LocalDate.ofEpochDay(pump.installedDay())));
        // Each part's series keys, made once per pump and shared by every sum below.
        Map<Long, List<String>> keysByPart = new java.util.HashMap<>();
        for (FleetSnapshot.BomPart part : pump.bom()) {
            keysByPart.computeIfAbsent(part.partId(), p -> keysOf(p, locations));
        }
        credibility.addPump(pump, expected.history(), keysByPart);
        for (FleetSnapshot.BomPart part : pump.bom()) {
            List<String> keys = keysByPart.get(part.partId());
            addFleet(part, keys, expected);
            for (String key : keys) {
                firstMonth.merge(key, installedMonth, Math::min);
            }
        }
        if (expected.ahead() != null) {
            horizonDemand.addServices(pump, expected.services(), part -> keysByPart.get(part.partId()));
        }
    }

    /** {@code keys}: the part's series at the pump's locations. */
    private void addFleet(FleetSnapshot.BomPart part, List<String> keys, PumpExpectation expected) {
        if (!models.containsKey(part.family())) {
            return;
        }
        if (expected.ahead() != null) {
            horizonDemand.addBreakdowns(expected.breakdowns().get(part.family()), keys);
        }
        double[] holdout = expected.holdout().get(part.family());
        if (holdout != null) {
            for (String key : keys) {
                double[] cell = fleetHoldout.computeIfAbsent(key, k -> new double[HOLDOUT_MONTHS]);
                for (int m = 0; m < HOLDOUT_MONTHS; m++) {
                    cell[m] += holdout[m];
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

    /** The credibility of every series under policy "auto" that the fleet model covers, by series key. */
    Map<String, CredibilityWeight> weigh() {
        List<String> weighed = horizonDemand.fleetKeys().stream().filter(k -> policyOf(partOf(k)).equals("auto")).toList();
        java.util.Set<String> kits = new java.util.HashSet<>(snapshot.kitByMechanic().values());
        return credibility.weigh(weighed, history, this::seriesStart, k -> {
            String location = k.substring(k.indexOf('|') + 1);
            return location.equals(PROGRAMME) ? PROGRAMME : kits.contains(location) ? "kit" : "depot";
        }, k -> models.get(snapshot.partFamilies().get(partOf(k))).unitDispersion());
    }

    /** Forecasts every series; {@code progress} is told after each one. */
    List<PartForecastResult> assemble(IntConsumer progress) {
        weights = weigh();
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

    /** One series: its history and what the fleet expects of it, chosen between by the core ({@link DemandChoice}). */
    private PartForecastResult forecastOne(String key, double[] window) {
        int start = seriesStart(key);
        double[] series = Arrays.copyOfRange(window, start, months);
        long partId = partOf(key);
        String location = key.substring(key.indexOf('|') + 1);
        double[] fleet = horizonDemand.fleet(key);
        DemandSpread spread = horizonDemand.spread();
        FleetRateModel model = models.get(snapshot.partFamilies().get(partId));
        DemandChoice.Fleet expected = fleet == null ? null : new DemandChoice.Fleet(fleet, spread.process(key),
                spread.gradient(key), model == null ? null : model.fit());
        double[] pm = horizonDemand.preventive(key);
        CredibilityWeight weight = weights.getOrDefault(key, CredibilityWeight.FLEET_ONLY);
        DemandChoice.Result r = DemandChoice.choose(new DemandChoice.Input(series,
                DemandChoice.Rule.parse(policyOf(partId)), expected, fleetHoldout.get(key), weight, pm,
                spread.serviceVariance(key)));
        LocalDate from = snapshot.historyStart().plusMonths(start);
        String method = r.historyMethod().name();
        return new PartForecastResult(partId, location, r.fromFleet() ? FLEET : method, r.alpha(), r.beta(),
                r.profile(), r.breakdownPerMonth(), r.variancePerMonth(), pm, r.monthly(), series, from,
                r.chosenScores(), r.fleetRmsse(), r.historyRmsse(), r.fromFleet() ? r.weight().describe(from)
                : method.toLowerCase(Locale.ROOT) + " on the part's own history", r.monthlyVariance(), r.yearVariance(),
                fleet == null ? Double.NaN : weight.ratio());
    }
}
