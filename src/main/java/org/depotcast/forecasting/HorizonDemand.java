package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PumpMonths;
import org.depotcast.core.forecast.ServiceTiming;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

/**
 * What the fleet register expects over the horizon, pump by pump, per series: breakdown units from the fleet model
 * and scheduled-service units, each month ({@link FleetOutlook}, which the spend projection reads too), with their
 * spread ({@link DemandSpread}). A pump counts only while in service (a planned installation from its date, a planned
 * decommissioning until its date), ages month by month, and runs at the daily load {@link UsageOutlook} expects.
 */
final class HorizonDemand {
    private final FleetOutlook outlook;
    private final int horizon;
    private final DemandSpread spread;
    private final Map<String, double[]> fleet = new LinkedHashMap<>();
    private final Map<String, double[]> preventive = new LinkedHashMap<>();

    HorizonDemand(FleetOutlook outlook) {
        this.outlook = outlook;
        this.horizon = outlook.months();
        this.spread = new DemandSpread(horizon);
    }

    /** The pump's months over the horizon: in service from a planned installation, until a planned decommissioning. */
    PumpMonths monthsOf(FleetSnapshot.PumpRecord pump) {
        return outlook.months(pump);
    }

    /** A pump's expected breakdown units of one family in each month ahead, the design rows behind them and φ. */
    record Breakdowns(double[] units, double[][] covariates, double phi) {
    }

    /** Per family of the pump's parts that a model covers: depends on the pump alone. */
    Map<ComponentFamily, Breakdowns> breakdownsOf(FleetSnapshot.PumpRecord pump, PumpMonths months) {
        Map<ComponentFamily, Breakdowns> byFamily = new EnumMap<>(ComponentFamily.class);
        for (FleetSnapshot.BomPart part : pump.bom()) {
            FleetRateModel model = outlook.model(part.family());
            if (model != null && !byFamily.containsKey(part.family())) {
                byFamily.put(part.family(), new Breakdowns(outlook.breakdownUnits(pump, part, months),
                        model.covariateRows(pump.depthM(), months), model.unitDispersion()));
            }
        }
        return byFamily;
    }

    /** One pump's expected breakdown units of one part ({@link #breakdownsOf}), added to each of its series. */
    void addBreakdowns(Breakdowns breakdowns, List<String> keys) {
        double[] units = breakdowns.units();
        spread.addBreakdowns(keys, units, breakdowns.covariates(), breakdowns.phi());
        for (String key : keys) {
            double[] cell = fleet.computeIfAbsent(key, k -> new double[horizon]);
            for (int m = 0; m < horizon; m++) {
                cell[m] += units[m];
            }
        }
    }

    /** When the pump's coming services fall ({@link FleetOutlook#services}): depends on the pump alone. */
    ServiceTiming.Outlook servicesOf(FleetSnapshot.PumpRecord pump, PumpMonths months) {
        return outlook.services(pump, months);
    }

    /** One pump's scheduled services: each service-kit part's expected units, added to each of its series. */
    void addServices(FleetSnapshot.PumpRecord pump, ServiceTiming.Outlook services,
                     Function<FleetSnapshot.BomPart, List<String>> keysOf) {
        double[] due = services.expected();
        double total = 0;
        for (double d : due) {
            total += d;
        }
        if (total < 1e-9) {
            return;
        }
        for (FleetSnapshot.BomPart part : pump.bom()) {
            if (!outlook.serviceUses(part)) {
                continue;
            }
            List<String> keys = keysOf.apply(part);
            spread.addServices(keys, services, part.serviceKitQuantity());
            for (String key : keys) {
                double[] cell = preventive.computeIfAbsent(key, k -> new double[horizon]);
                for (int m = 0; m < horizon; m++) {
                    cell[m] += due[m] * part.serviceKitQuantity();
                }
            }
        }
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
