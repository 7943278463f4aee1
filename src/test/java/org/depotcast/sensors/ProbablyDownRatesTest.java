package org.depotcast.sensors;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.RateCovariate;
import org.depotcast.core.sensors.StoppedPumpParts;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.PumpSummary;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The family rates a stopped pump's parts come from: the fleet rate model's, its depot's ratio applied. */
class ProbablyDownRatesTest {
    @Test
    void eachFamilyTakesTheModelsRateForThePumpTimesItsDepotsRatio() {
        // log λ = −7 + 0.5 log(depth / 30) + 0.1 age; depot 5 breaks down 1.6 times the fleet's rate.
        PoissonFit fit = new PoissonFit(new double[]{-7, 0.5, 0.1}, new double[]{0.1, 0.05, 0.01}, 100, 97, 1.0, 5,
                true, new double[][]{{0.01, 0, 0}, {0, 0.0025, 0}, {0, 0, 1e-4}});
        FleetRateModel seals = new FleetRateModel(List.of(RateCovariate.LOG_DEPTH, RateCovariate.AGE_YEARS), fit, 1e-3,
                2.0, 50, 40_000, Map.of(5L, 1.6));
        FleetRateModel handles = new FleetRateModel(List.of(), null, 4e-4, 1.0, 3, 9_000, Map.of());
        Map<ComponentFamily, FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
        models.put(ComponentFamily.CUP_SEAL, seals);
        models.put(ComponentFamily.HANDLE, handles);

        PumpSummary pump = atDepot(5L);
        StopFlag flag = new StopFlag();
        flag.stoppedFrom = LocalDate.of(2026, 3, 1); // 1461 days: exactly 4.0 years of 365.25 days
        flag.baselineHours = new BigDecimal("6.5");
        flag.probability = new BigDecimal("0.8");

        List<StoppedPumpParts.FamilyRate> rates = ProbablyDownService.familyRates(pump, flag, models);
        assertEquals(2, rates.size());
        // By hand: exp(−7 + 0.5 ln 2 + 0.4) × 1.6 = 3.0782e-3 per hour; the prior's 4e-4 has no depot ratio.
        assertEquals("CUP_SEAL", rates.get(0).family());
        assertEquals(Math.exp(-7 + 0.5 * Math.log(2) + 0.4) * 1.6, rates.get(0).eventsPerHour(), 1e-15);
        assertEquals(3.0782e-3, rates.get(0).eventsPerHour(), 1e-7);
        assertEquals(2.0, rates.get(0).unitsPerEvent(), 0.0);
        assertEquals("HANDLE", rates.get(1).family());
        assertEquals(4e-4, rates.get(1).eventsPerHour(), 0.0);

        assertEquals(Math.exp(-7 + 0.5 * Math.log(2) + 0.4),
                ProbablyDownService.familyRates(atDepot(6L), flag, models).get(0).eventsPerHour(), 1e-15, "another depot: ratio 1");
    }

    @Test
    void aPumpsBreakdownRateForTheStopCheckIsTheSumOverFamiliesWithItsDepotsRatio() {
        PoissonFit fit = new PoissonFit(new double[]{-7, 0.5, 0.1}, new double[]{0.1, 0.05, 0.01}, 100, 97, 1.0, 5,
                true, new double[][]{{0.01, 0, 0}, {0, 0.0025, 0}, {0, 0, 1e-4}});
        Map<ComponentFamily, FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
        models.put(ComponentFamily.CUP_SEAL, new FleetRateModel(List.of(RateCovariate.LOG_DEPTH,
                RateCovariate.AGE_YEARS), fit, 1e-3, 2.0, 50, 40_000, Map.of(5L, 1.6)));
        models.put(ComponentFamily.HANDLE, new FleetRateModel(List.of(), null, 4e-4, 1.0, 3, 9_000, Map.of()));
        // By hand, on 1 March 2026 (4.0 years old, 60 m): exp(−7 + 0.5 ln 2 + 0.4) × 1.6 + 4e-4 = 3.4782e-3 per hour;
        // the units per event do not enter (a breakdown is an event, whatever it replaces).
        assertEquals(Math.exp(-7 + 0.5 * Math.log(2) + 0.4) * 1.6 + 4e-4,
                BreakdownHazards.perHour(atDepot(5L), models, LocalDate.of(2026, 3, 1)), 1e-15);
        assertEquals(3.4782e-3, BreakdownHazards.perHour(atDepot(5L), models, LocalDate.of(2026, 3, 1)), 1e-7);
    }

    /** A pump 60 m deep installed on 1 March 2022 at the given depot. */
    private static PumpSummary atDepot(long depotId) {
        return new PumpSummary(1L, "P-1", 1L, depotId, "D-" + depotId, null, new BigDecimal("60"),
                LocalDate.of(2022, 3, 1), PumpStatus.WORKING, new BigDecimal("6.5"));
    }
}
