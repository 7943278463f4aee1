package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.PumpModelSummary;
import org.depotcast.core.sensors.PartsToHaveReady;
import org.depotcast.core.sensors.StoppedPumpParts;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.fleet.RepairRecords;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.forecasting.FleetRates;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.planning.PlanningService;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * Per depot (or a mechanic's own pumps), the pumps probably down ({@link StopFlagService}) with the parts expected
 * for each from the latest forecast run's fleet models ({@link StoppedPumpParts}), summed and set against the stock
 * the caller sees ({@link SensorAreas}).
 */
@ApplicationScoped
public class ProbablyDownService {
    static final String METHOD = "Stop: Page's CUSUM (1954) on the pump's daily hours against its previous 28 days "
            + "(k = 0.5σ, h = 4σ). Probability down: Shiryaev's Bayesian change-point posterior (1963) over the days "
            + "since the pump was last read in use, a breakdown starting with the pump's own daily chance from the "
            + "forecast run's fleet models (one a pump-year without a run) against an idle spell, whose start is the "
            + "pump's record of spells in its last 112 days shrunk towards the programme's (a beta prior fitted over "
            + "the sensor pumps judged together, empirical Bayes) and whose length and hours are the programme's "
            + "(hours of idle days against those of broken days on record). Parts: the probability times each "
            + "family's share of the pump's fleet-model breakdown rate (depth, age, load, its depot's ratio where the "
            + "forecast run kept one) times units per repair. To have ready: the smallest whole number of each part that "
            + "covers the flagged pumps' need (Poisson with the summed expected units) at the programme's service "
            + "level for the part's class, as its reorder points use.";

    private final StopFlagService flags;
    private final SensorAreas areas;
    private final RepairRecords repairRecords;
    private final ForecastQueryService forecasts;
    private final SystemWork system;
    private final PlanningService planning;
    private final PumpModelService models;

    ProbablyDownService(StopFlagService flags, SensorAreas areas, RepairRecords repairRecords,
                        ForecastQueryService forecasts, SystemWork system, PlanningService planning,
                        PumpModelService models) {
        this.planning = planning;
        this.models = models;
        this.flags = flags;
        this.areas = areas;
        this.repairRecords = repairRecords;
        this.forecasts = forecasts;
        this.system = system;
    }

    /**
     * The report for a depot the caller may see, or for a mechanic naming none, their own pumps against their kit
     * ({@link SensorAreas}); {@code today} dates the days since use fell.
     */
    @Transactional
    public ProbablyDownReport report(String depotCode, LocalDate today) {
        SensorArea area = areas.resolve(depotCode);
        Map<Long, PumpSummary> byId = new HashMap<>();
        area.pumps().forEach(p -> byId.put(p.id(), p));
        Map<Long, PumpModelSummary> boms = models.summariesById();
        List<StopFlag> all = flags.flagsOf(byId.keySet());
        // Fleet models are programme-wide; only the area's pumps are shown.
        Optional<FleetRates> rates = system.call("sensor-parts", forecasts::fleetRates);
        Map<ComponentFamily, FleetRateModel> rateModels = rates.map(FleetRates::models).orElse(Map.of());
        List<ProbablyDownReport.Pump> shown = new ArrayList<>();
        Map<String, Double> needed = new TreeMap<>();
        Map<String, Boolean> critical = new HashMap<>();
        for (StopFlag flag : all) {
            if (flag.state != StopFlag.State.OPEN) {
                continue;
            }
            PumpSummary pump = byId.get(flag.pumpId);
            PumpModelSummary model = boms.get(pump.modelId());
            model.bom().forEach(line -> critical.put(line.partNumber(), line.critical()));
            StoppedPumpParts.Expectation expectation = expect(pump, model, flag, rateModels);
            expectation.unitsByPart().forEach((part, units) -> needed.merge(part, units, Double::sum));
            shown.add(new ProbablyDownReport.Pump(pump.assetId(), pump.assignedMechanic(), StopFlag.State.OPEN.words,
                    flag.stoppedFrom, flag.flaggedOn, Math.max(0, ChronoUnit.DAYS.between(flag.stoppedFrom, today)),
                    flag.probability.doubleValue(), flag.baselineHours.doubleValue(),
                    repairRecords.factsOf(pump.id()).openRepairRef(),
                    expectation.repairsByFamily(), expectation.unitsByPart()));
        }
        // Most likely down first, so the parts for the surest cases are read first.
        shown.sort(Comparator.comparingDouble(ProbablyDownReport.Pump::probabilityDown).reversed()
                .thenComparing(ProbablyDownReport.Pump::assetId));
        long repaired = all.stream().filter(f -> f.state == StopFlag.State.REPAIR_REPORTED).count();
        long falseAlarms = all.stream().filter(f -> f.state == StopFlag.State.FALSE_ALARM).count();
        Long runId = rates.map(FleetRates::runId).orElse(null);
        return new ProbablyDownReport(area.depotCode(), area.mechanic(), today, METHOD, runId, shown,
                against(area, needed, coverLevels(critical)), area.stockWords(), repaired, falseAlarms);
    }

    private static StoppedPumpParts.Expectation expect(PumpSummary pump, PumpModelSummary model, StopFlag flag,
                                                       Map<ComponentFamily, FleetRateModel> models) {
        double depthM = pump.depthM().doubleValue();
        List<StoppedPumpParts.BomPart> bom = new ArrayList<>();
        for (PumpModelSummary.Line line : model.bom()) {
            bom.add(new StoppedPumpParts.BomPart(line.partNumber(), line.family().name(),
                    line.installedQuantity(depthM)));
        }
        return StoppedPumpParts.expect(flag.probability.doubleValue(), familyRates(pump, flag, models), bom);
    }

    /**
     * Each family's breakdown rate for this pump as the forecast run's model gives it: the pump's depth, its age when
     * use fell and its usual daily hours, times its depot's ratio where the run kept one.
     */
    static List<StoppedPumpParts.FamilyRate> familyRates(PumpSummary pump, StopFlag flag,
                                                         Map<ComponentFamily, FleetRateModel> models) {
        double depthM = pump.depthM().doubleValue();
        double ageYears = Math.max(0, ChronoUnit.DAYS.between(pump.installedOn(), flag.stoppedFrom) / 365.25);
        double hoursPerDay = flag.baselineHours.doubleValue();
        List<StoppedPumpParts.FamilyRate> rates = new ArrayList<>();
        models.forEach((family, model) -> rates.add(new StoppedPumpParts.FamilyRate(family.name(),
                model.ratePerHourAtDepot(pump.depotId(), depthM, ageYears, hoursPerDay),
                model.unitsPerEvent())));
        return rates;
    }

    /** Each part's cover level: the service level in force for its class, as planning's reorder points use. */
    private Map<String, Double> coverLevels(Map<String, Boolean> critical) {
        PlanningService.ServiceLevelsInForce levels = planning.serviceLevelsInForce();
        Map<String, Double> cover = new HashMap<>();
        critical.forEach((part, isCritical) -> cover.put(part, isCritical ? levels.critical() : levels.standard()));
        return cover;
    }

    private static List<ProbablyDownReport.PartNeed> against(SensorArea area, Map<String, Double> needed,
                                                             Map<String, Double> coverLevels) {
        List<ProbablyDownReport.PartNeed> parts = new ArrayList<>();
        needed.forEach((part, units) -> {
            double cover = coverLevels.get(part);
            int haveReady = PartsToHaveReady.units(units, cover);
            BigDecimal depotUnits = area.atDepot() == null ? null : area.atDepot().getOrDefault(part, BigDecimal.ZERO);
            BigDecimal kitUnits = area.inKits().getOrDefault(part, BigDecimal.ZERO);
            BigDecimal held = depotUnits == null ? kitUnits : depotUnits.add(kitUnits);
            parts.add(new ProbablyDownReport.PartNeed(part, units, haveReady, cover, depotUnits, kitUnits,
                    held.compareTo(BigDecimal.valueOf(haveReady)) >= 0));
        });
        return parts;
    }
}
