package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.forecasting.FleetRates;
import org.depotcast.forecasting.ForecastQueryService;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.Collection;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Each pump's breakdowns per operating hour as the latest finished forecast run's fleet models give them, for the
 * stop check's prior chance that a breakdown starts on a given day: the sum over the component families of the
 * family's rate for the pump's depth, age and daily load, times its depot's ratio where the run kept one
 * ({@link FleetRateModel#ratePerHourAtDepot}, which {@link ProbablyDownService#familyRates} reads for the parts too).
 * With no finished run, no pump has a rate and the detector keeps its flat prior.
 */
@ApplicationScoped
class BreakdownHazards {
    private final ForecastQueryService forecasts;
    private final PumpQueryService pumps;
    private final SystemWork system;

    BreakdownHazards(ForecastQueryService forecasts, PumpQueryService pumps, SystemWork system) {
        this.forecasts = forecasts;
        this.pumps = pumps;
        this.system = system;
    }

    /** Breakdowns per operating hour by pump id, as of {@code asOf}; empty when no run has finished. */
    Map<Long, Double> perHour(Collection<Long> pumpIds, LocalDate asOf) {
        if (pumpIds.isEmpty()) {
            return Map.of();
        }
        Optional<FleetRates> rates = system.call("stop-check-rates", forecasts::fleetRates);
        if (rates.isEmpty() || rates.get().models().isEmpty()) {
            return Map.of();
        }
        Map<Long, Double> perHour = new HashMap<>();
        pumps.summariesById(pumpIds).forEach((id, pump) -> perHour.put(id, perHour(pump, rates.get().models(),
                asOf)));
        return perHour;
    }

    /** One pump's breakdowns per operating hour, summed over the families, at its age on {@code asOf}. */
    static double perHour(PumpSummary pump, Map<ComponentFamily, FleetRateModel> models, LocalDate asOf) {
        double depthM = pump.depthM().doubleValue();
        double ageYears = Math.max(0, ChronoUnit.DAYS.between(pump.installedOn(), asOf) / 365.25);
        double hoursPerDay = pump.usageHoursPerDay().doubleValue();
        double sum = 0;
        for (FleetRateModel model : models.values()) {
            sum += model.ratePerHourAtDepot(pump.depotId(), depthM, ageYears, hoursPerDay);
        }
        return sum;
    }
}
