package org.depotcast.forecasting;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.BiConsumer;

/**
 * What the repair records show around an origin, per part and location (the programme, the pump's depot and the kit of
 * the mechanic who fitted the part: the locations a forecast run assembles its series for), breakdowns and scheduled
 * services together; and stored forecasts read back for scoring.
 */
final class AccuracyActuals {
    private AccuracyActuals() {
    }

    static String key(String partNumber, String location) {
        return partNumber + "|" + location;
    }

    /** A stored forecast as read: where its series starts and its first 12 months' total. */
    record Stored(String partNumber, String location, LocalDate historyFrom, double yearMean, double yearVariance) {
    }

    static Stored stored(PartForecast f, String partNumber, LocalDate runHistoryFrom) {
        double[] monthly = f.monthlyForecast;
        double[] variance = f.monthlyVariance == null ? new double[0] : f.monthlyVariance;
        double[] preventive = f.preventiveMonthly;
        double mean = 0, summed = 0;
        for (int m = 0; m < AccuracyScoring.MONTHS && m < monthly.length; m++) {
            mean += monthly[m];
            // Runs made before monthly variances were kept: the breakdowns' variance plus the services as Poisson.
            summed += m < variance.length ? variance[m] : f.variancePerMonth + preventive[m];
        }
        return new Stored(partNumber, f.locationCode, f.historyFrom != null ? f.historyFrom : runHistoryFrom, mean,
                f.yearVariance != null ? f.yearVariance : summed);
    }

    /**
     * Units replaced in [from, to) for repairs reported from {@code from} on, per series key: a repair open on the
     * origin is in the history the forecast was made from ({@link FleetSnapshot.Consumption#arisingBetween}).
     */
    static Map<String, Double> totals(FleetSnapshot snapshot, LocalDate from, LocalDate to) {
        Map<String, Double> totals = new TreeMap<>();
        forEachUse(snapshot, (c, key) -> {
            if (c.arisingBetween(from, to) != null) {
                totals.merge(key, c.quantity(), Double::sum);
            }
        });
        return totals;
    }

    /** Each stored series' monthly demand from its start to the month before {@code origin}: the benchmarks' input. */
    static Map<String, double[]> histories(FleetSnapshot snapshot, List<Stored> stored, LocalDate origin) {
        Map<String, double[]> histories = new HashMap<>();
        Map<String, LocalDate> starts = new HashMap<>();
        for (Stored s : stored) {
            LocalDate start = s.historyFrom().withDayOfMonth(1);
            starts.put(key(s.partNumber(), s.location()), start);
            histories.put(key(s.partNumber(), s.location()),
                    new double[(int) Math.max(0, ChronoUnit.MONTHS.between(start, origin))]);
        }
        // As a run on the origin read the records: a repair open then is dated by its report.
        forEachUse(snapshot, (c, key) -> {
            LocalDate start = starts.get(key);
            FleetSnapshot.Consumption known = c.asKnownOn(origin);
            if (start != null && known != null && !known.day().isBefore(start)) {
                histories.get(key)[(int) ChronoUnit.MONTHS.between(start, known.day().withDayOfMonth(1))] += c.quantity();
            }
        });
        return histories;
    }

    private static void forEachUse(FleetSnapshot snapshot, BiConsumer<FleetSnapshot.Consumption, String> use) {
        for (FleetSnapshot.Consumption c : snapshot.consumption()) {
            String part = snapshot.partNumbers().get(c.partId());
            use.accept(c, key(part, DemandAssembler.PROGRAMME));
            use.accept(c, key(part, snapshot.locationCodes().get(c.depotId())));
            String kit = c.mechanic() == null ? null : snapshot.kitByMechanic().get(c.mechanic());
            if (kit != null) {
                use.accept(c, key(part, kit));
            }
        }
    }

    static List<String> notes(Map<String, Double> actuals, Set<String> scored) {
        double unforecast = 0;
        int series = 0;
        for (Map.Entry<String, Double> e : actuals.entrySet()) {
            if (!scored.contains(e.getKey())) {
                unforecast += e.getValue();
                series++;
            }
        }
        List<String> notes = new ArrayList<>();
        notes.add("Demand is every part replaced, at breakdowns and at scheduled services, for the repairs reported in "
                + "the 12 months. A repair still open on the origin is left out: the forecast counted it as history, "
                + "and planning shows its pump as waiting for parts.");
        notes.add("Ranges: the service's are the ranges its stored forecast states for the 12-month total; the "
                + "last-12-month mean's and Croston's come from the larger of their mean and in-sample squared error, "
                + "months taken as independent.");
        notes.add("Total bias is (forecast − actual) / actual over a level's series; coverage is the share of series "
                + "whose actual fell inside the range. An honest 80 % range holds about 80 % of them.");
        if (series > 0) {
            notes.add(series + " part and location series had demand in the year but no forecast at the origin "
                    + "(nothing there yet) and are left out: " + Math.round(unforecast) + " units.");
        }
        return notes;
    }
}
