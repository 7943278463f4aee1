package org.depotcast.forecasting;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/** What happened after the origin, per part and location, from the repair records; and stored forecasts read back. */
final class AccuracyActuals {
    private AccuracyActuals() {
    }

    static String key(String partNumber, String location) {
        return partNumber + "|" + location;
    }

    /**
     * Breakdown units replaced in [from, to), per part at the programme, at the pump's depot and in the kit of the
     * mechanic who fitted them: the same locations a forecast run assembles its series for.
     */
    static Map<String, Double> breakdownTotals(FleetSnapshot snapshot, LocalDate from, LocalDate to) {
        Map<String, Double> totals = new TreeMap<>();
        for (FleetSnapshot.Consumption c : snapshot.consumption()) {
            if (!c.breakdown() || c.day().isBefore(from) || !c.day().isBefore(to)) {
                continue;
            }
            String part = snapshot.partNumbers().get(c.partId());
            totals.merge(key(part, DemandAssembler.PROGRAMME), c.quantity(), Double::sum);
            totals.merge(key(part, snapshot.locationCodes().get(c.depotId())), c.quantity(), Double::sum);
            String kit = c.mechanic() == null ? null : snapshot.kitByMechanic().get(c.mechanic());
            if (kit != null) {
                totals.merge(key(part, kit), c.quantity(), Double::sum);
            }
        }
        return totals;
    }

    static AccuracyScoring.Forecast forecast(PartForecast f, String partNumber) {
        double[] monthly = ForecastRecords.split(f.monthlyForecast);
        double[] preventive = ForecastRecords.split(f.preventiveMonthly);
        double[] breakdown = new double[monthly.length];
        for (int m = 0; m < monthly.length; m++) {
            breakdown[m] = monthly[m] - (m < preventive.length ? preventive[m] : 0);
        }
        return new AccuracyScoring.Forecast(partNumber, f.locationCode, breakdown, f.variancePerMonth,
                ForecastRecords.split(f.monthlyHistory));
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
        notes.add("Breakdown demand only: scheduled services are planned work, and the history the benchmarks are made "
                + "from holds breakdowns alone.");
        notes.add("Ranges: the service's from its stored monthly forecasts and variance (months independent); the "
                + "last-12-month mean's and Croston's from the larger of their mean and in-sample squared error.");
        notes.add("Total bias is (forecast − actual) / actual over a level's series; coverage is the share of series "
                + "whose actual fell inside the range. An honest 80 % range holds about 80 % of them.");
        if (series > 0) {
            notes.add(series + " part and location series had breakdown demand in the year but no forecast at the "
                    + "origin (nothing there yet) and are left out: " + Math.round(unforecast) + " units.");
        }
        return notes;
    }
}
