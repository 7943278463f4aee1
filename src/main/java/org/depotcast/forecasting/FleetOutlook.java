package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PumpMonths;
import org.depotcast.core.forecast.ServiceTiming;

import java.time.LocalDate;
import java.util.Map;

/**
 * What the fleet register and the fitted rate models expect of each pump over the months from a snapshot's origin:
 * its months (expected daily load from the one usage history, calendar exposure, age), its breakdown units per part
 * and its scheduled services. The forecast run ({@link HorizonDemand}) and the spend projection both read demand
 * here, so the two agree part by part and depot by depot for the same origin.
 */
public final class FleetOutlook {
    private final FleetSnapshot snapshot;
    private final Map<ComponentFamily, ForecastModelDefinition> definitions;
    private final Map<ComponentFamily, FleetRateModel> models;
    private final long[] monthStart;
    private final UsageOutlook usage;
    private final int yearMonths;
    /** Credibility ratio of each depot series, keyed part id|depot id (1 where absent). */
    private final Map<Long, Double> depotSeriesRatios;
    private final String basis;

    FleetOutlook(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions,
                 Map<ComponentFamily, FleetRateModel> models, int months) {
        this(snapshot, definitions, models, months, Map.of(), "the run's own fit");
    }

    FleetOutlook(FleetSnapshot snapshot, Map<ComponentFamily, ForecastModelDefinition> definitions,
                 Map<ComponentFamily, FleetRateModel> models, int months, Map<Long, Double> depotSeriesRatios,
                 String basis) {
        if (months < 1) {
            throw new IllegalArgumentException("months must be ≥ 1, was " + months);
        }
        this.snapshot = snapshot;
        this.definitions = definitions;
        this.models = Map.copyOf(models);
        this.monthStart = new long[months + 1];
        for (int m = 0; m <= months; m++) {
            monthStart[m] = snapshot.historyEnd().plusMonths(m).toEpochDay();
        }
        this.usage = new UsageOutlook(snapshot);
        this.yearMonths = Math.min(12, months);
        this.depotSeriesRatios = new java.util.HashMap<>(depotSeriesRatios);
        this.basis = basis;
    }

    /** Where the rates came from, in words for a reader of the projection. */
    public String basis() {
        return basis;
    }

    /** A depot series as one number (ids are positive and far below 2³²): read once per pump and part. */
    static long seriesKey(long partId, long depotId) {
        return partId << 32 | depotId;
    }

    /** The first day of the first month ahead: nothing on or after it was known. */
    public LocalDate origin() {
        return snapshot.historyEnd();
    }

    public int months() {
        return monthStart.length - 1;
    }

    /** Months counted together for the services' yearly variance. */
    int yearMonths() {
        return yearMonths;
    }

    public FleetSnapshot snapshot() {
        return snapshot;
    }

    /** The family's rate model; null when the family has none. */
    public FleetRateModel model(ComponentFamily family) {
        return models.get(family);
    }

    public Map<ComponentFamily, FleetRateModel> models() {
        return models;
    }

    /** The pump's months at its expected load; a scenario may scale the load and thin the pumps. */
    public PumpMonths months(FleetSnapshot.PumpRecord pump, double usageFactor, double survivalPerYear) {
        return PumpMonths.of(monthStart, pump.installedDay(), pump.endDay(), usage.hoursPerDay(pump) * usageFactor,
                survivalPerYear);
    }

    PumpMonths months(FleetSnapshot.PumpRecord pump) {
        return months(pump, 1, 1);
    }

    /** Expected breakdown units of one of the pump's parts in each month; null when no model covers its family. */
    public double[] breakdownUnits(FleetSnapshot.PumpRecord pump, FleetSnapshot.BomPart part, PumpMonths months) {
        FleetRateModel model = models.get(part.family());
        return model == null ? null : model.expectedUnits(pump.depotId(), pump.depthM(), months);
    }

    /** When the pump's coming services fall, its future load uncertain ({@link ServiceTiming}). */
    public ServiceTiming.Outlook services(FleetSnapshot.PumpRecord pump, PumpMonths months) {
        return ServiceTiming.outlook(months.hours(), pump.serviceIntervalHours(),
                pump.hoursSinceService(monthStart[0]), pump.serviceKnown(), usage.logSd(), yearMonths);
    }

    /**
     * The factor the forecast run puts on the fleet's breakdown units of this part at this depot: the credibility
     * its own history earns ({@link FleetCredibility}); 1 where the run gives none.
     */
    public double credibilityRatio(long partId, long depotId) {
        return depotSeriesRatios.getOrDefault(seriesKey(partId, depotId), 1.0);
    }

    /** Whether a service uses this part: a service-kit quantity, and its family's file declares preventive demand. */
    public boolean serviceUses(FleetSnapshot.BomPart part) {
        ForecastModelDefinition definition = definitions.get(part.family());
        return part.serviceKitQuantity() > 0 && definition != null && definition.preventive();
    }
}
