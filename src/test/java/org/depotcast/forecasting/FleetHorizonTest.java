package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Installations and decommissionings planned in the register enter the horizon from their dates; dated between a
 * past origin and today they were not known at the origin and stay out.
 */
class FleetHorizonTest {
    private static final LocalDate ORIGIN = LocalDate.of(2025, 1, 1);
    private static final long CUP_SEAL = 100, DEPOT_A = 10, DEPOT_B = 11;
    /** The declared prior (too few breakdowns to fit): 0.1 events per 1,000 h, 2 units each, at 5 h/day. */
    private static final double UNITS_PER_DAY = 0.1 / 1000 * 5.0 * 2.0;

    private static FleetSnapshotLoader.Pump pump(long id, long depot, LocalDate installed, LocalDate decommissioned) {
        return new FleetSnapshotLoader.Pump(id, depot, null, 30, installed, decommissioned, 9125, 5.0,
                List.of(new FleetSnapshot.BomPart(CUP_SEAL, ComponentFamily.CUP_SEAL, 0)));
    }

    private static FleetSnapshotLoader.Rows register() {
        List<FleetSnapshotLoader.Pump> pumps = List.of(
                pump(1, DEPOT_A, LocalDate.of(2015, 1, 1), null),
                pump(2, DEPOT_A, LocalDate.of(2016, 1, 1), LocalDate.of(2025, 7, 1)),
                pump(3, DEPOT_B, LocalDate.of(2025, 4, 10), null));
        List<FleetSnapshot.Consumption> repairs = new ArrayList<>();
        repairs.add(new FleetSnapshot.Consumption(CUP_SEAL, 1, DEPOT_A, null, true, LocalDate.of(2023, 5, 3), 2));
        return new FleetSnapshotLoader.Rows(List.of(), repairs, pumps, Map.of(), Map.of(DEPOT_A, "DEP-A", DEPOT_B, "DEP-B"),
                Map.of(CUP_SEAL, "CS"), Map.of(CUP_SEAL, ComponentFamily.CUP_SEAL));
    }

    private static Map<String, PartForecastResult> forecast(FleetSnapshot snapshot) {
        Map<ComponentFamily, ForecastModelDefinition> definitions = new EnumMap<>(ComponentFamily.class);
        definitions.put(ComponentFamily.CUP_SEAL, new ForecastModelDefinition(ComponentFamily.CUP_SEAL,
                List.of(org.depotcast.core.forecast.RateCovariate.LOG_DEPTH), 0.1, 2.0, "fleet", true, "test"));
        FleetModelFitter.Breakdowns breakdowns = FleetModelFitter.Breakdowns.of(snapshot).get(ComponentFamily.CUP_SEAL);
        org.depotcast.core.forecast.FleetRateModel model = FleetModelFitter.fit(definitions.get(ComponentFamily.CUP_SEAL), snapshot, breakdowns, 0);
        Map<String, PartForecastResult> byLocation = new HashMap<>();
        new DemandAssembler(snapshot, definitions, Map.of(ComponentFamily.CUP_SEAL, model),
                Map.of(ComponentFamily.CUP_SEAL, model), 12).assemble(done -> { })
                .forEach(r -> byLocation.put(r.locationCode(), r));
        return byLocation;
    }

    @Test
    void plannedInstallationAndDecommissioningEnterFromTheirDates() {
        FleetSnapshot snapshot = FleetSnapshotLoader.asOf(ORIGIN, 72, register(), ORIGIN.plusDays(4));
        Map<String, PartForecastResult> f = forecast(snapshot);
        double[] b = f.get("DEP-B").monthly();
        for (int m = 0; m < 3; m++) {
            assertEquals(0, b[m], 1e-12, "not installed yet in month " + m);
        }
        assertEquals(UNITS_PER_DAY * 21, b[3], 1e-9, "installed on 10 April: 21 of April's 30 days");
        assertEquals(UNITS_PER_DAY * 31, b[4], 1e-9, "all of May");
        double[] a = f.get("DEP-A").monthly();
        assertEquals(2 * UNITS_PER_DAY * 28, a[1], 1e-9, "both pumps in February, a month of 28 days");
        assertEquals(2 * UNITS_PER_DAY * 30, a[5], 1e-9, "both pumps in June");
        assertEquals(UNITS_PER_DAY * 31, a[6], 1e-9, "one pump from July, the other decommissioned on 1 July");
        assertEquals(f.get("DEP-A").monthly()[8] + b[8], f.get("PROGRAMME").monthly()[8], 1e-12);
        assertTrue(f.get("DEP-B").yearVariance() > 0, "the new pump's breakdowns are uncertain too");
    }

    @Test
    void datesBetweenAPastOriginAndTodayWereNotKnownAtTheOrigin() {
        FleetSnapshot snapshot = FleetSnapshotLoader.asOf(ORIGIN, 72, register(), LocalDate.of(2026, 3, 15));
        assertFalse(snapshot.pumps().stream().anyMatch(p -> p.id() == 3), "installed after the origin, before today");
        FleetSnapshot.PumpRecord two = snapshot.pumps().stream().filter(p -> p.id() == 2).findFirst().orElseThrow();
        assertTrue(two.endDay() > LocalDate.of(2030, 1, 1).toEpochDay(), "its decommissioning was not known then");
        double[] a = forecast(snapshot).get("DEP-A").monthly();
        assertEquals(2 * UNITS_PER_DAY * 31, a[11], 1e-9, "both pumps all December");
    }
}
