package org.depotcast.spend;

import org.depotcast.catalogue.BomLine;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.Part;
import org.depotcast.catalogue.PumpModel;
import org.depotcast.core.forecast.PreventiveSchedule;
import org.depotcast.core.spend.SpendLine;
import org.depotcast.forecasting.FleetModelResponse;
import org.depotcast.forecasting.FleetSnapshot;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Expected demand per projection period, part and depot, from the fleet model of each family (rate per operating
 * hour × each pump's hours, with age advancing month by month and the scenario's usage change and decommissioning),
 * scheduled-service kits as pumps cross their interval, new installations from their financial year on (half a year
 * in the year they go in), and in the first period the stock needed to bring the programme up to its policy levels.
 * Periods are the programme's financial years ({@link FinancialYears}): the months left in the year in progress,
 * then whole years; month 0 is the month the projection starts.
 */
final class SpendLineBuilder {
    static final double DAYS_PER_YEAR = 365.25;
    /** σ of the log rate for a family without a fitted model: a wide, stated range (about ×/÷ 1.65 at one σ). */
    static final double PRIOR_LOG_SD = 0.5;

    final List<String> familyNames = new ArrayList<>();
    final List<String> partNumbers = new ArrayList<>();
    final List<String> depotCodes = new ArrayList<>();
    final double[] groupLogSd;
    final double[] groupDispersion;
    private final Map<String, double[]> cells = new LinkedHashMap<>();
    private final Map<String, Integer> partIndex = new HashMap<>();
    private final Map<String, Integer> depotIndex = new HashMap<>();
    private final Map<ComponentFamily, FleetModelResponse> models;
    private final Map<Long, Part> partsById;
    private final ScenarioDefinition scenario;
    private final List<FinancialYears.Period> periods;
    /** Per month from the start: its period, and the first month of each period. */
    private final int[] periodOfMonth;
    private final int[] firstMonthOf;
    /** 1 when the first period is the rest of the year in progress: whole year k is then period k. */
    private final int stubPeriods;

    SpendLineBuilder(Map<ComponentFamily, FleetModelResponse> models, Map<Long, Part> partsById, ScenarioDefinition scenario,
                     List<FinancialYears.Period> periods) {
        this.models = models;
        this.partsById = partsById;
        this.scenario = scenario;
        this.periods = periods;
        this.stubPeriods = periods.get(0).partial() ? 1 : 0;
        int months = periods.stream().mapToInt(FinancialYears.Period::monthCount).sum();
        periodOfMonth = new int[months];
        firstMonthOf = new int[periods.size()];
        for (int p = 0, m = 0; p < periods.size(); p++) {
            firstMonthOf[p] = m;
            for (int i = 0; i < periods.get(p).monthCount(); i++) {
                periodOfMonth[m++] = p;
            }
        }
        for (ComponentFamily f : ComponentFamily.values()) {
            familyNames.add(f.name());
        }
        groupLogSd = new double[familyNames.size()];
        groupDispersion = new double[familyNames.size()];
        for (ComponentFamily f : ComponentFamily.values()) {
            FleetModelResponse m = models.get(f);
            boolean fitted = m != null && "fit".equals(m.source());
            groupLogSd[f.ordinal()] = fitted ? m.standardErrors().getOrDefault("intercept", PRIOR_LOG_SD) : PRIOR_LOG_SD;
            groupDispersion[f.ordinal()] = fitted && m.overdispersed() && m.dispersion() != null ? m.dispersion() : 1.0;
        }
    }

    /** Today's pumps, from the forecast origin on. */
    void addFleet(FleetSnapshot snapshot, Map<Long, String> depotCodesById) {
        long origin = snapshot.historyEnd().toEpochDay();
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            if (pump.endDay() <= origin || pump.installedDay() > origin) {
                continue;
            }
            double hoursPerDay = pump.usage().hoursPerDayOn(origin) * scenario.usageFactor();
            double ageNow = (origin - pump.installedDay()) / DAYS_PER_YEAR;
            addPump(depotCodesById.get(pump.depotId()), pump.depthM(), hoursPerDay, ageNow, 0,
                    months -> pump.servicesPerMonth(origin, months), pump.bom(), 1.0);
        }
    }

    /** New pumps of the scenario, each batch from its financial year on (year 1 = the first whole year). */
    void addInstallation(ScenarioDefinition.Installation installation, PumpModel model) {
        List<FleetSnapshot.BomPart> bom = new ArrayList<>();
        for (BomLine line : model.bom) {
            bom.add(new FleetSnapshot.BomPart(line.part.id, line.part.family, line.serviceKitQuantity(installation.depthM())));
        }
        double hours = (installation.usageHoursPerDay() == null ? 5.0 : installation.usageHoursPerDay()) * scenario.usageFactor();
        int period = Math.min(periods.size() - 1, installation.year() - 1 + stubPeriods);
        addPump(installation.depotCode(), installation.depthM(), hours, 0, period,
                months -> PreventiveSchedule.servicesDuePerMonth(0, months, model.serviceIntervalHours), bom,
                installation.count());
    }

    /** Stock needed now to reach the policy levels, bought in the first year at the central store. */
    void addTopUp(String centralCode, long partId, double units) {
        if (units > 0) {
            cell(0, partsById.get(partId), centralCode)[1] += units;
        }
    }

    /** A pump (or a batch of {@code pumps} alike) from the start of period {@code firstPeriod} on. */
    private void addPump(String depot, double depthM, double hoursPerDay, double ageAtStart, int firstPeriod,
                         java.util.function.Function<double[], double[]> servicesPerMonth,
                         List<FleetSnapshot.BomPart> bom, double pumps) {
        int firstMonth = firstMonthOf[firstPeriod];
        double[] monthlyHours = new double[periodOfMonth.length];
        for (int m = firstMonth; m < monthlyHours.length; m++) {
            double surviving = Math.pow(scenario.survivalPerYear(), (m - firstMonth + 0.5) / 12.0);
            monthlyHours[m] = hoursPerDay * DAYS_PER_YEAR / 12 * surviving;
        }
        double[] services = servicesPerMonth.apply(monthlyHours);
        for (int p = firstPeriod; p < periods.size(); p++) {
            // New pumps go in through their first year: on average half of it.
            double fraction = p == firstPeriod && firstPeriod > 0 ? 0.5 : 1.0;
            int months = periods.get(p).monthCount();
            double hours = 0;
            double serviced = 0;
            for (int m = firstMonthOf[p]; m < firstMonthOf[p] + months; m++) {
                hours += monthlyHours[m];
                serviced += services[m];
            }
            hours *= fraction;
            double age = ageAtStart + (firstMonthOf[p] - firstMonth + months * fraction / 2) / 12.0;
            double days = DAYS_PER_YEAR / 12 * months * fraction;
            for (FleetSnapshot.BomPart part : bom) {
                double[] cell = cell(p, partsById.get(part.partId()), depot);
                FleetModelResponse model = models.get(part.family());
                cell[0] += pumps * ratePerHour(model, depthM, age, hours / days) * hours;
                cell[1] += pumps * serviced * part.serviceKitQuantity();
                cell[2] = model == null ? 1 : model.unitsPerEvent();
            }
        }
    }

    private static double ratePerHour(FleetModelResponse model, double depthM, double age, double hoursPerDay) {
        if (model == null) {
            return 0;
        }
        double eta = 0;
        for (Map.Entry<String, Double> term : model.coefficients().entrySet()) {
            eta += term.getValue() * switch (term.getKey()) {
                case "intercept" -> 1.0;
                case "log_depth" -> Math.log(depthM / 30.0);
                case "age_years" -> age;
                case "usage_hours" -> hoursPerDay;
                default -> 0.0;
            };
        }
        return Math.exp(eta);
    }

    private double[] cell(int year, Part part, String depot) {
        partIndex.computeIfAbsent(part.partNumber, k -> {
            partNumbers.add(k);
            return partNumbers.size() - 1;
        });
        depotIndex.computeIfAbsent(depot, k -> {
            depotCodes.add(k);
            return depotCodes.size() - 1;
        });
        return cells.computeIfAbsent(year + "|" + part.id + "|" + depot, k -> new double[]{0, 0, 1});
    }

    SpendLine[] lines() {
        List<SpendLine> lines = new ArrayList<>();
        for (Map.Entry<String, double[]> e : cells.entrySet()) {
            String[] key = e.getKey().split("\\|", 3);
            int period = Integer.parseInt(key[0]);
            Part part = partsById.get(Long.parseLong(key[1]));
            // Prices rise from the second whole year; the rest of the year in progress is at today's prices.
            double price = part.unitCost.doubleValue() * scenario.priceFactor(Math.max(0, period - stubPeriods));
            double[] v = e.getValue();
            lines.add(new SpendLine(period, part.family.ordinal(), partIndex.get(part.partNumber), depotIndex.get(key[2]),
                    v[0], v[2], v[1], price));
        }
        return lines.toArray(new SpendLine[0]);
    }
}
