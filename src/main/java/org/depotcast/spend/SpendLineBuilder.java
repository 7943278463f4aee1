package org.depotcast.spend;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PumpMonths;
import org.depotcast.core.spend.SpendLine;
import org.depotcast.forecasting.FleetOutlook;
import org.depotcast.forecasting.FleetSnapshot;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Expected demand per projection period, part and depot, read pump by pump from the same {@link FleetOutlook} the
 * forecast run uses (rate model with depot ratios and the series' credibility ratio, calendar months, age advancing,
 * measured hours where the usage history has them, scheduled services with their timing), under the scenario's usage
 * change and decommissioning; new installations from the middle of their financial year; and in the first period the
 * stock needed to bring the programme up to its policy levels, as its own line at the central store. Periods are the
 * programme's financial years ({@link FinancialYears}): the months left in the year in progress, then whole years;
 * month 0 is the outlook's origin.
 */
final class SpendLineBuilder {
    final List<String> familyNames = new ArrayList<>();
    final List<String> partNumbers = new ArrayList<>();
    final List<String> depotCodes = new ArrayList<>();
    final double[] groupLogSd;
    final double[] groupDispersion;
    /** Per (period, part id, depot code): expected events, deterministic units, units per event. */
    private final Map<Cell, double[]> cells = new LinkedHashMap<>();
    private final Map<String, Integer> partIndex = new HashMap<>();
    private final Map<String, Integer> depotIndex = new HashMap<>();
    private final FleetOutlook outlook;
    private final Map<Long, PartSummary> partsById;
    private final ScenarioDefinition scenario;
    private final List<FinancialYears.Period> periods;
    private final int[] periodOfMonth;
    /** 1 when the first period is the rest of the year in progress: whole year k is then period k. */
    private final int stubPeriods;
    /** Per family: gradient in β of the projected breakdown units, and their sum (for the rate's uncertainty). */
    private final Map<ComponentFamily, double[]> gradients = new java.util.EnumMap<>(ComponentFamily.class);
    private final double[] familyUnits = new double[ComponentFamily.values().length];

    private record Cell(int period, long partId, String depot) {
        /**
         * Mixed, not the record's default sum of 31-multiples: periods, part ids and depot codes are small runs of
         * numbers whose plain sums collide (period + 1 and part − 31 land together), which turned the cell map's
         * buckets into trees and every lookup into a search.
         */
        @Override
        public int hashCode() {
            long h = (depot.hashCode() * 0x9E3779B97F4A7C15L + partId) * 0x9E3779B97F4A7C15L + period;
            return (int) (h ^ (h >>> 32));
        }
    }

    /** Where the fleet's rates came from, in words ({@link FleetOutlook#basis}). */
    String ratesBasis() {
        return outlook.basis();
    }

    SpendLineBuilder(FleetOutlook outlook, Map<Long, PartSummary> partsById, ScenarioDefinition scenario,
                     List<FinancialYears.Period> periods) {
        this.outlook = outlook;
        this.partsById = partsById;
        this.scenario = scenario;
        this.periods = periods;
        this.stubPeriods = periods.get(0).partial() ? 1 : 0;
        int months = periods.stream().mapToInt(FinancialYears.Period::monthCount).sum();
        if (months != outlook.months() || !periods.get(0).startsOn().equals(outlook.origin())) {
            throw new IllegalArgumentException("periods must cover the outlook's " + outlook.months() + " months from "
                    + outlook.origin() + "; they cover " + months + " from " + periods.get(0).startsOn());
        }
        periodOfMonth = new int[months];
        for (int p = 0, m = 0; p < periods.size(); p++) {
            for (int i = 0; i < periods.get(p).monthCount(); i++) {
                periodOfMonth[m++] = p;
            }
        }
        groupLogSd = new double[ComponentFamily.values().length];
        groupDispersion = new double[groupLogSd.length];
        for (ComponentFamily f : ComponentFamily.values()) {
            familyNames.add(f.name());
            FleetRateModel m = outlook.model(f);
            groupLogSd[f.ordinal()] = FleetRateModel.PRIOR_LOG_SD;
            groupDispersion[f.ordinal()] = m == null ? 1 : m.varianceFactor();
        }
    }

    /**
     * σ of each family's lognormal rate multiplier: the standard error of the log of the family's projected
     * breakdown units over the whole projection, by the delta method on the fit's covariance (the wide prior σ for a
     * family on its prior). Call once every pump is added.
     */
    private void settleRateUncertainty() {
        gradients.forEach((family, g) -> groupLogSd[family.ordinal()] = outlook.model(family)
                .logTotalStandardError(g, familyUnits[family.ordinal()]));
    }

    /** The register's pumps in service at the origin or planned to go in, as the forecast run counts them. */
    void addFleet() {
        long origin = outlook.origin().toEpochDay();
        Map<Long, String> codes = outlook.snapshot().locationCodes();
        for (FleetSnapshot.PumpRecord pump : outlook.snapshot().pumps()) {
            if (pump.endDay() > origin) {
                addPump(pump, codes.get(pump.depotId()), 1);
            }
        }
    }

    /**
     * New pumps of the scenario, a batch going in through financial year {@code installation.year()} (1 = the first
     * whole year): counted from the middle of that year, so on average half of it, with a fresh service clock.
     */
    void addInstallation(ScenarioDefinition.Installation installation, long depotId, int serviceIntervalHours,
                         List<FleetSnapshot.BomPart> bom) {
        FinancialYears.Period period = periods.get(Math.min(periods.size() - 1, installation.year() - 1 + stubPeriods));
        long from = period.startsOn().toEpochDay(), to = period.endsOn().toEpochDay() + 1;
        long installed = from + (to - from) / 2;
        double hoursPerDay = installation.usageHoursPerDay() == null ? 5.0 : installation.usageHoursPerDay();
        FleetSnapshot.PumpRecord pump = new FleetSnapshot.PumpRecord(-1, depotId, null, installation.depthM(),
                installed, Long.MAX_VALUE / 4, serviceIntervalHours,
                new org.depotcast.core.forecast.UsageTimeline(new long[0], new double[0], hoursPerDay), bom, installed, true);
        addPump(pump, installation.depotCode(), installation.count());
    }

    /** Stock needed now to reach the policy levels, bought in the first period at the central store. */
    void addTopUp(String centralCode, long partId, double units) {
        if (units > 0) {
            cell(0, partId, centralCode)[1] += units;
        }
    }

    /** One pump (or {@code count} alike): its breakdowns and services month by month, summed into periods. */
    private void addPump(FleetSnapshot.PumpRecord pump, String depot, double count) {
        PumpMonths months = outlook.months(pump, scenario.usageFactor(), scenario.survivalPerYear());
        double[] services = outlook.services(pump, months).expected();
        for (FleetSnapshot.BomPart part : pump.bom()) {
            double[] units = outlook.breakdownUnits(pump, part, months);
            boolean serviced = outlook.serviceUses(part);
            if (units == null && !serviced) {
                continue;
            }
            FleetRateModel model = outlook.model(part.family());
            if (units != null) {
                addGradient(part.family(), model, pump.depthM(), months, units,
                        count * outlook.credibilityRatio(part.partId(), pump.depotId()));
            }
            double eventsPerUnit = units == null ? 0 : outlook.credibilityRatio(part.partId(), pump.depotId())
                    / model.unitsPerEvent();
            double[] cell = null;
            for (int m = 0; m < months.months(); m++) {
                if (m == 0 || periodOfMonth[m] != periodOfMonth[m - 1]) {
                    cell = cell(periodOfMonth[m], part.partId(), depot);
                    cell[2] = model == null ? 1 : model.unitsPerEvent();
                }
                if (units != null) {
                    cell[0] += count * units[m] * eventsPerUnit;
                }
                if (serviced) {
                    cell[1] += count * services[m] * part.serviceKitQuantity();
                }
            }
        }
    }

    private void addGradient(ComponentFamily family, FleetRateModel model, double depthM, PumpMonths months,
                             double[] units, double weight) {
        double[][] rows = model.covariateRows(depthM, months);
        double[] g = gradients.computeIfAbsent(family, f -> new double[model.covariates().size() + 1]);
        for (int m = 0; m < units.length; m++) {
            double u = units[m] * weight;
            familyUnits[family.ordinal()] += u;
            g[0] += u;
            for (int j = 1; j < g.length; j++) {
                g[j] += u * rows[m][j - 1];
            }
        }
    }

    private double[] cell(int period, long partId, String depot) {
        partIndex.computeIfAbsent(partsById.get(partId).partNumber(), k -> {
            partNumbers.add(k);
            return partNumbers.size() - 1;
        });
        depotIndex.computeIfAbsent(depot, k -> {
            depotCodes.add(k);
            return depotCodes.size() - 1;
        });
        return cells.computeIfAbsent(new Cell(period, partId, depot), k -> new double[]{0, 0, 1});
    }

    /** Expected units (breakdowns and services, and a top-up where there is one) of a part at a location. */
    double expectedUnits(int period, long partId, String location) {
        double[] v = cells.get(new Cell(period, partId, location));
        return v == null ? 0 : v[0] * v[2] + v[1];
    }

    /** Expected breakdown units of a part at a location in one period. */
    double breakdownUnits(int period, long partId, String location) {
        double[] v = cells.get(new Cell(period, partId, location));
        return v == null ? 0 : v[0] * v[2];
    }

    /** The locations with lines, in the order they were first met. */
    List<String> locations() {
        return List.copyOf(depotCodes);
    }

    SpendLine[] lines() {
        settleRateUncertainty();
        List<SpendLine> lines = new ArrayList<>();
        for (Map.Entry<Cell, double[]> e : cells.entrySet()) {
            Cell key = e.getKey();
            PartSummary part = partsById.get(key.partId());
            // Prices rise from the second whole year; the rest of the year in progress is at today's prices.
            double price = part.unitCost().doubleValue() * scenario.priceFactor(Math.max(0, key.period() - stubPeriods));
            double[] v = e.getValue();
            lines.add(new SpendLine(key.period(), part.family().ordinal(), partIndex.get(part.partNumber()),
                    depotIndex.get(key.depot()), v[0], v[2], v[1], price));
        }
        return lines.toArray(new SpendLine[0]);
    }
}
