package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.BomLine;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.sensors.StoppedPumpParts;
import org.depotcast.fleet.Pump;
import org.depotcast.fleet.PumpService;
import org.depotcast.forecasting.FleetModelResponse;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.stock.Location;
import org.depotcast.stock.LocationService;

import java.math.BigDecimal;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Per depot, the pumps probably down ({@link StopFlagService}) with the parts expected for each from the latest
 * forecast run's fleet models ({@link StoppedPumpParts}), summed and set against stock at the depot and its kits.
 */
@ApplicationScoped
public class ProbablyDownService {
    static final String METHOD = "Stop: Page's CUSUM (1954) on the pump's daily hours against its previous 28 days "
            + "(k = 0.5σ, h = 4σ). Probability down: Bayes' rule over the days of near-nothing use, against the pump's "
            + "own share of idle days and a prior of one breakdown a pump-year. Parts: the probability times each "
            + "family's share of the pump's fleet-model breakdown rate (depth, age, load) times units per repair.";

    private final StopFlagService flags;
    private final PumpService pumps;
    private final LocationService locations;
    private final DepotStock stock;
    private final ForecastQueryService forecasts;
    private final AccessScope scope;
    private final SystemWork system;

    ProbablyDownService(StopFlagService flags, PumpService pumps, LocationService locations, DepotStock stock,
                        ForecastQueryService forecasts, AccessScope scope, SystemWork system) {
        this.flags = flags;
        this.pumps = pumps;
        this.locations = locations;
        this.stock = stock;
        this.forecasts = forecasts;
        this.scope = scope;
        this.system = system;
    }

    @Transactional
    public ProbablyDownReport atDepot(String depotCode) {
        Location depot = locations.require("depot", depotCode);
        scope.require(depot.id, depot.code);
        Map<Long, Pump> byId = new HashMap<>();
        pumps.search(depotCode, null).forEach(p -> byId.put(p.id, p));
        List<StopFlag> all = flags.flagsOf(byId.keySet());
        // Fleet models are programme-wide; only this depot's pumps are shown.
        Map<ComponentFamily, FleetModelResponse> models = system.call("sensor-parts", this::fleetModels);
        List<ProbablyDownReport.Pump> shown = new ArrayList<>();
        Map<String, Double> needed = new TreeMap<>();
        for (StopFlag flag : all) {
            if (flag.state != StopFlag.State.OPEN) {
                continue;
            }
            Pump pump = byId.get(flag.pumpId);
            StoppedPumpParts.Expectation expectation = expect(pump, flag, models);
            expectation.unitsByPart().forEach((part, units) -> needed.merge(part, units, Double::sum));
            shown.add(new ProbablyDownReport.Pump(pump.assetId, pump.assignedMechanic, StopFlag.State.OPEN.words,
                    flag.stoppedFrom, flag.flaggedOn, flag.probability.doubleValue(), flag.baselineHours.doubleValue(),
                    expectation.repairsByFamily(), expectation.unitsByPart()));
        }
        long repaired = all.stream().filter(f -> f.state == StopFlag.State.REPAIR_REPORTED).count();
        long falseAlarms = all.stream().filter(f -> f.state == StopFlag.State.FALSE_ALARM).count();
        return new ProbablyDownReport(depot.code, METHOD, models.values().stream().findFirst()
                .map(FleetModelResponse::runId).orElse(null), shown, against(depot, needed), repaired, falseAlarms);
    }

    private Map<ComponentFamily, FleetModelResponse> fleetModels() {
        Map<ComponentFamily, FleetModelResponse> models = new EnumMap<>(ComponentFamily.class);
        if (!forecasts.anyRunFinished()) {
            return models;
        }
        for (ComponentFamily family : ComponentFamily.values()) {
            try {
                models.put(family, forecasts.fleetModel(family.name()));
            } catch (org.depotcast.common.EntityMissingException notFitted) {
                // a family no pump model lists has no fleet model
            }
        }
        return models;
    }

    private static StoppedPumpParts.Expectation expect(Pump pump, StopFlag flag,
                                                       Map<ComponentFamily, FleetModelResponse> models) {
        double depthM = pump.depthM.doubleValue();
        double ageYears = Math.max(0, ChronoUnit.DAYS.between(pump.installedOn, flag.stoppedFrom) / 365.25);
        List<StoppedPumpParts.FamilyRate> rates = new ArrayList<>();
        models.forEach((family, model) -> rates.add(new StoppedPumpParts.FamilyRate(family.name(),
                model.eventsPerHour(depthM, ageYears, flag.baselineHours.doubleValue()), model.unitsPerEvent())));
        List<StoppedPumpParts.BomPart> bom = new ArrayList<>();
        for (BomLine line : pump.model.bom) {
            bom.add(new StoppedPumpParts.BomPart(line.part.partNumber, line.part.family.name(),
                    line.installedQuantity(depthM)));
        }
        return StoppedPumpParts.expect(flag.probability.doubleValue(), rates, bom);
    }

    private List<ProbablyDownReport.PartNeed> against(Location depot, Map<String, Double> needed) {
        Map<String, BigDecimal> atDepot = stock.depotOnly(depot.code);
        Map<String, BigDecimal> withKits = stock.depotAndKits(depot.code);
        List<ProbablyDownReport.PartNeed> parts = new ArrayList<>();
        needed.forEach((part, units) -> {
            BigDecimal depotUnits = atDepot.getOrDefault(part, BigDecimal.ZERO);
            BigDecimal kitUnits = withKits.getOrDefault(part, BigDecimal.ZERO).subtract(depotUnits);
            parts.add(new ProbablyDownReport.PartNeed(part, units, depotUnits, kitUnits,
                    depotUnits.add(kitUnits).doubleValue() >= Math.ceil(units - 1e-9)));
        });
        return parts;
    }
}
