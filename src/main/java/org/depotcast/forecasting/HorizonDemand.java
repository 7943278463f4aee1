package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.ServiceTiming;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

/**
 * What the fleet register expects over the horizon, pump by pump, per series: breakdown units from the fleet model
 * and scheduled-service units, each month, with their spread ({@link DemandSpread}). A pump counts only while in
 * service (a planned installation from its date, a planned decommissioning until its date), ages month by month, and
 * runs at the daily load {@link UsageOutlook} expects.
 */
final class HorizonDemand {
    private final Map<ComponentFamily, ForecastModelDefinition> definitions;
    private final int horizon;
    private final long origin;
    /** Epoch day each horizon month starts, and the day after the last. */
    private final long[] monthStart;
    private final UsageOutlook usage;
    private final DemandSpread spread;
    private final Map<String, double[]> fleet = new LinkedHashMap<>();
    private final Map<String, double[]> preventive = new LinkedHashMap<>();

    HorizonDemand(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions, int horizon) {
        this.definitions = definitions;
        this.horizon = horizon;
        this.origin = snapshot.historyEnd().toEpochDay();
        this.monthStart = new long[horizon + 1];
        for (int m = 0; m <= horizon; m++) {
            monthStart[m] = snapshot.historyEnd().plusMonths(m).toEpochDay();
        }
        this.usage = new UsageOutlook(snapshot);
        this.spread = new DemandSpread(horizon);
    }

    /** One pump's expected breakdown units of one part, added to each of its series. */
    void addBreakdowns(FleetSnapshot.PumpRecord pump, FleetSnapshot.BomPart part, FleetModel model, List<String> keys) {
        double hoursPerDay = usage.hoursPerDay(pump);
        double[] units = new double[horizon];
        double[][] x = new double[horizon][];
        for (int m = 0; m < horizon; m++) {
            // Its age at the middle of each forecast month.
            double age = (origin - pump.installedDay()) / 365.25 + (m + 0.5) / 12;
            x[m] = FleetModel.covariateValues(model.covariates(), pump.depthM(), Math.max(0, age), hoursPerDay);
            units[m] = model.ratePerHour(x[m]) * hoursPerDay * serviceDays(pump, m) * model.depotRatio(pump.depotId())
                    * model.unitsPerEvent();
        }
        spread.addBreakdowns(keys, units, x, model.unitsPerEvent() * (model.fit() == null ? 1 : model.fit().varianceFactor()));
        for (String key : keys) {
            double[] cell = fleet.computeIfAbsent(key, k -> new double[horizon]);
            for (int m = 0; m < horizon; m++) {
                cell[m] += units[m];
            }
        }
    }

    /** One pump's scheduled services: each service-kit part's expected units, added to each of its series. */
    void addServices(FleetSnapshot.PumpRecord pump, Function<FleetSnapshot.BomPart, List<String>> keysOf) {
        double hoursPerDay = usage.hoursPerDay(pump);
        double[] hoursPerMonth = new double[horizon];
        for (int m = 0; m < horizon; m++) {
            hoursPerMonth[m] = hoursPerDay * serviceDays(pump, m);
        }
        ServiceTiming.Outlook outlook = ServiceTiming.outlook(hoursPerMonth, pump.serviceIntervalHours(),
                pump.hoursSinceService(origin), pump.serviceKnown(), usage.logSd(), spread.yearMonths());
        double[] due = outlook.expected();
        double total = 0;
        for (double d : due) {
            total += d;
        }
        if (total < 1e-9) {
            return;
        }
        for (FleetSnapshot.BomPart part : pump.bom()) {
            ForecastModelDefinition definition = definitions.get(part.family());
            if (part.serviceKitQuantity() <= 0 || definition == null || !definition.preventive()) {
                continue;
            }
            List<String> keys = keysOf.apply(part);
            spread.addServices(keys, outlook, part.serviceKitQuantity());
            for (String key : keys) {
                double[] cell = preventive.computeIfAbsent(key, k -> new double[horizon]);
                for (int m = 0; m < horizon; m++) {
                    cell[m] += due[m] * part.serviceKitQuantity();
                }
            }
        }
    }

    /**
     * Days the pump is in service in horizon month m: the calendar month's own length (February's exposure is 28
     * days, not a twelfth of a year), cut at a planned installation or decommissioning.
     */
    private double serviceDays(FleetSnapshot.PumpRecord pump, int m) {
        return (monthStart[m + 1] - monthStart[m]) * pump.inServiceShare(monthStart[m], monthStart[m + 1]);
    }

    /** Series with a fleet expectation. */
    List<String> fleetKeys() {
        return new ArrayList<>(fleet.keySet());
    }

    /** Series with a fleet expectation or scheduled services. */
    Set<String> keys() {
        Set<String> keys = new LinkedHashSet<>(fleet.keySet());
        keys.addAll(preventive.keySet());
        return keys;
    }

    /** Fleet-expected breakdown units per month, null where no fleet model covers the series. */
    double[] fleet(String key) {
        return fleet.get(key);
    }

    double[] preventive(String key) {
        return preventive.getOrDefault(key, new double[horizon]);
    }

    DemandSpread spread() {
        return spread;
    }
}
