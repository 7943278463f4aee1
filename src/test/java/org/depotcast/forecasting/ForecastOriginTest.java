package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The as-of cut (nothing dated on or after the origin is used) and each series' real start. */
class ForecastOriginTest {
    private static final LocalDate ORIGIN = LocalDate.of(2025, 1, 1);
    private static final long CUP_SEAL = 100, O_RING = 101;
    private static final long TESHVALE = 10, MARROWFORD = 11;

    private static List<FleetSnapshot.BomPart> bom() {
        return List.of(new FleetSnapshot.BomPart(CUP_SEAL, ComponentFamily.CUP_SEAL, 2),
                new FleetSnapshot.BomPart(O_RING, ComponentFamily.O_RING, 1));
    }

    private static FleetSnapshotLoader.Pump pump(long id, long depot, String mechanic, LocalDate installed, LocalDate ended) {
        return new FleetSnapshotLoader.Pump(id, depot, mechanic, 30, installed, ended, 9125, 5.0, bom());
    }

    private static FleetSnapshot.Consumption breakdown(long part, long pump, long depot, String mechanic, LocalDate day, double units) {
        return new FleetSnapshot.Consumption(part, pump, depot, mechanic, true, day, units);
    }

    /** Two old pumps at one depot with monthly demand from 2023 on (the records' start); one young pump at another. */
    private static FleetSnapshotLoader.Rows rows(List<FleetSnapshotLoader.Pump> pumps, List<FleetSnapshotLoader.Reading> readings,
                                                 List<FleetSnapshot.Consumption> consumption) {
        return new FleetSnapshotLoader.Rows(readings, consumption, pumps, Map.of("m1", "KIT-1", "m2", "KIT-2"),
                Map.of(TESHVALE, "DEP-T", MARROWFORD, "DEP-M"), Map.of(CUP_SEAL, "CS", O_RING, "OR"),
                Map.of(CUP_SEAL, ComponentFamily.CUP_SEAL, O_RING, ComponentFamily.O_RING));
    }

    private static List<FleetSnapshotLoader.Pump> basePumps() {
        return List.of(pump(1, TESHVALE, "m1", LocalDate.of(2010, 3, 1), null),
                pump(2, TESHVALE, "m1", LocalDate.of(2012, 5, 1), null),
                pump(3, MARROWFORD, "m2", LocalDate.of(2024, 7, 10), null),
                pump(5, TESHVALE, "m1", LocalDate.of(2018, 2, 1), null));
    }

    private static List<FleetSnapshotLoader.Reading> baseReadings() {
        return new ArrayList<>(List.of(new FleetSnapshotLoader.Reading(1, LocalDate.of(2023, 2, 1), 4.0),
                new FleetSnapshotLoader.Reading(2, LocalDate.of(2023, 2, 1), 6.0),
                new FleetSnapshotLoader.Reading(3, LocalDate.of(2024, 7, 10), 5.0)));
    }

    private static List<FleetSnapshot.Consumption> baseConsumption() {
        List<FleetSnapshot.Consumption> out = new ArrayList<>();
        for (LocalDate month = LocalDate.of(2023, 1, 1); month.isBefore(ORIGIN); month = month.plusMonths(1)) {
            out.add(breakdown(CUP_SEAL, 1, TESHVALE, "m1", month.plusDays(9), 2));
            out.add(breakdown(O_RING, 2, TESHVALE, "m1", month.plusDays(14), month.getMonthValue() % 3 == 0 ? 2 : 0));
            if (!month.isBefore(LocalDate.of(2024, 7, 1))) {
                out.add(breakdown(CUP_SEAL, 3, MARROWFORD, "m2", month.plusDays(20), 1));
            }
        }
        out.add(new FleetSnapshot.Consumption(CUP_SEAL, 1, TESHVALE, "m1", false, LocalDate.of(2024, 3, 5), 2));
        return out;
    }

    private static Map<ComponentFamily, ForecastModelDefinition> definitions(String policy) {
        Map<ComponentFamily, ForecastModelDefinition> d = new EnumMap<>(ComponentFamily.class);
        for (ComponentFamily family : List.of(ComponentFamily.CUP_SEAL, ComponentFamily.O_RING)) {
            d.put(family, new ForecastModelDefinition(family, List.of(org.depotcast.core.forecast.RateCovariate.LOG_DEPTH),
                    0.1, 2.0, policy, true, "test"));
        }
        return d;
    }

    private static List<PartForecastResult> forecast(FleetSnapshot snapshot, String policy) {
        Map<ComponentFamily, ForecastModelDefinition> definitions = definitions(policy);
        Map<ComponentFamily, FleetModelFitter.Breakdowns> breakdowns = FleetModelFitter.Breakdowns.of(snapshot);
        Map<ComponentFamily, org.depotcast.core.forecast.FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
        Map<ComponentFamily, org.depotcast.core.forecast.FleetRateModel> holdout = new EnumMap<>(ComponentFamily.class);
        definitions.forEach((family, d) -> {
            models.put(family, FleetModelFitter.fit(d, snapshot, breakdowns.get(family), 0));
            holdout.put(family, FleetModelFitter.fit(d, snapshot, breakdowns.get(family), 1));
        });
        return new DemandAssembler(snapshot, definitions, models, holdout, 12).assemble(done -> { })
                .stream().sorted(Comparator.comparing(r -> r.partId() + r.locationCode())).toList();
    }

    @Test
    void recordsDatedOnOrAfterTheOriginChangeNothing() {
        FleetSnapshot clean = FleetSnapshotLoader.asOf(ORIGIN.plusDays(17), 72, rows(basePumps(), baseReadings(), baseConsumption()));
        // What happened after the origin: a new pump, a decommissioning, heavy use, many repairs and a service.
        List<FleetSnapshotLoader.Pump> pumps = new ArrayList<>(basePumps());
        pumps.set(1, pump(2, TESHVALE, "m1", LocalDate.of(2012, 5, 1), LocalDate.of(2025, 3, 1)));
        pumps.add(pump(4, MARROWFORD, "m2", ORIGIN, null));
        List<FleetSnapshotLoader.Reading> readings = baseReadings();
        readings.add(new FleetSnapshotLoader.Reading(1, ORIGIN, 12.0));
        readings.add(new FleetSnapshotLoader.Reading(3, ORIGIN.plusMonths(2), 11.0));
        List<FleetSnapshot.Consumption> consumption = baseConsumption();
        for (int d = 0; d < 200; d++) {
            consumption.add(breakdown(CUP_SEAL, 1 + d % 3, d % 3 == 2 ? MARROWFORD : TESHVALE, d % 3 == 2 ? "m2" : "m1",
                    ORIGIN.plusDays(d), 5));
        }
        consumption.add(new FleetSnapshot.Consumption(O_RING, 1, TESHVALE, "m1", false, ORIGIN, 1));
        FleetSnapshot leaky = FleetSnapshotLoader.asOf(ORIGIN, 72, rows(pumps, readings, consumption));

        assertEquals(ORIGIN, leaky.historyEnd());
        assertEquals(4, leaky.pumps().size(), "a pump installed on the origin does not exist yet");
        FleetSnapshot.PumpRecord unread = leaky.pumps().stream().filter(p -> p.id() == 5).findFirst().orElseThrow();
        assertEquals(5.0, unread.usage().hoursPerDayOn(ORIGIN.toEpochDay()), 1e-12, "no reading: the registered load");
        assertTrue(leaky.consumption().stream().allMatch(c -> c.day().isBefore(ORIGIN)));
        FleetSnapshot.PumpRecord second = leaky.pumps().stream().filter(p -> p.id() == 2).findFirst().orElseThrow();
        assertTrue(second.endDay() > ORIGIN.plusYears(50).toEpochDay(), "a later decommissioning is not yet known");
        FleetSnapshot.PumpRecord first = leaky.pumps().stream().filter(p -> p.id() == 1).findFirst().orElseThrow();
        assertEquals(4.0, first.usage().hoursPerDayOn(ORIGIN.toEpochDay()), 1e-12, "the reading on the origin is not used");
        assertEquals(LocalDate.of(2024, 3, 5).toEpochDay(), first.lastServiceDay());

        List<PartForecastResult> expected = forecast(clean, "auto"), actual = forecast(leaky, "auto");
        assertEquals(expected.size(), actual.size());
        assertFalse(expected.isEmpty());
        for (int i = 0; i < expected.size(); i++) {
            PartForecastResult e = expected.get(i), a = actual.get(i);
            assertEquals(e.partId() + e.locationCode(), a.partId() + a.locationCode());
            assertEquals(e.method(), a.method());
            assertEquals(e.breakdownPerMonth(), a.breakdownPerMonth(), 1e-12, e.locationCode());
            assertEquals(e.variancePerMonth(), a.variancePerMonth(), 1e-12, e.locationCode());
            assertArrayEquals(e.monthly(), a.monthly(), 1e-12);
            assertArrayEquals(e.history(), a.history(), 1e-12);
        }
    }

    @Test
    void aHeldOutWindowCountsEachRepairOnceOnOneSideOfTheOrigin() {
        LocalDate end = ORIGIN.plusYears(1);
        // Open on the origin: history to a run made then, so no outcome of the window after it.
        assertNull(new FleetSnapshot.Consumption(CUP_SEAL, 2, TESHVALE, "m1", true, ORIGIN.plusDays(20), 4,
                ORIGIN.minusDays(10)).arisingBetween(ORIGIN, end));
        // Reported and fixed inside the window: as it is.
        FleetSnapshot.Consumption inside = new FleetSnapshot.Consumption(CUP_SEAL, 2, TESHVALE, "m1", true,
                ORIGIN.plusDays(30), 4, ORIGIN);
        assertEquals(inside, inside.arisingBetween(ORIGIN, end));
        // Reported in the window's last days and fixed after it: open at its end, dated by its report.
        assertEquals(end.minusDays(3), new FleetSnapshot.Consumption(O_RING, 3, MARROWFORD, "m2", true, end.plusDays(9),
                1, end.minusDays(3)).arisingBetween(ORIGIN, end).day());
        // Reported on the window's end: the next window's.
        assertNull(new FleetSnapshot.Consumption(O_RING, 3, MARROWFORD, "m2", true, end, 1, end).arisingBetween(ORIGIN, end));
        // Chained windows count every repair exactly once.
        FleetSnapshot.Consumption straddling = new FleetSnapshot.Consumption(CUP_SEAL, 2, TESHVALE, "m1", true,
                end.plusDays(5), 4, end.minusDays(5));
        assertEquals(1, (straddling.arisingBetween(ORIGIN, end) == null ? 0 : 1)
                + (straddling.arisingBetween(end, end.plusYears(1)) == null ? 0 : 1));
    }

    @Test
    void aRepairOpenOnTheOriginIsReadAsTheRecordsThenShowedIt() {
        // Reported before the origin and fixed after it: on the origin it was open, dated by its report.
        LocalDate reported = ORIGIN.minusDays(10), fixed = ORIGIN.plusDays(20);
        List<FleetSnapshot.Consumption> later = baseConsumption();
        later.add(new FleetSnapshot.Consumption(CUP_SEAL, 2, TESHVALE, "m1", true, fixed, 4, reported));
        later.add(new FleetSnapshot.Consumption(O_RING, 3, MARROWFORD, "m2", false, fixed, 1, reported));
        later.add(new FleetSnapshot.Consumption(CUP_SEAL, 1, TESHVALE, "m1", true, fixed, 6, ORIGIN));
        List<FleetSnapshot.Consumption> open = baseConsumption();
        open.add(new FleetSnapshot.Consumption(CUP_SEAL, 2, TESHVALE, "m1", true, reported, 4, reported));
        open.add(new FleetSnapshot.Consumption(O_RING, 3, MARROWFORD, "m2", false, reported, 1, reported));

        FleetSnapshot asOf = FleetSnapshotLoader.asOf(ORIGIN, 72, rows(basePumps(), baseReadings(), later));
        FleetSnapshot onTheDay = FleetSnapshotLoader.asOf(ORIGIN, 72, rows(basePumps(), baseReadings(), open));

        assertEquals(baseConsumption().size() + 2, asOf.consumption().size(), "the repair reported on the origin is left out");
        assertTrue(asOf.consumption().stream().anyMatch(c -> c.partId() == CUP_SEAL && c.quantity() == 4
                && c.day().equals(reported)), "the open breakdown is dated by its report");
        FleetSnapshot.PumpRecord serviced = asOf.pumps().stream().filter(p -> p.id() == 3).findFirst().orElseThrow();
        assertEquals(reported.toEpochDay(), serviced.lastServiceDay(), "the open service counts from its report");
        List<PartForecastResult> expected = forecast(onTheDay, "auto"), actual = forecast(asOf, "auto");
        assertEquals(expected.size(), actual.size());
        for (int i = 0; i < expected.size(); i++) {
            assertArrayEquals(expected.get(i).monthly(), actual.get(i).monthly(), 1e-12, expected.get(i).locationCode());
            assertArrayEquals(expected.get(i).history(), actual.get(i).history(), 1e-12);
        }
        // Left out, the breakdown would lower the cup seal's history at its depot.
        FleetSnapshot cut = FleetSnapshotLoader.asOf(ORIGIN, 72, rows(basePumps(), baseReadings(), baseConsumption()));
        double withOpen = forecast(asOf, "poisson").stream().filter(r -> r.partId() == CUP_SEAL && r.locationCode().equals("DEP-T"))
                .findFirst().orElseThrow().history()[23];
        double without = forecast(cut, "poisson").stream().filter(r -> r.partId() == CUP_SEAL && r.locationCode().equals("DEP-T"))
                .findFirst().orElseThrow().history()[23];
        assertEquals(without + 4, withOpen, 1e-12);
    }

    @Test
    void eachSeriesStartsAtItsRealBeginning() {
        FleetSnapshot snapshot = FleetSnapshotLoader.asOf(ORIGIN, 72, rows(basePumps(), baseReadings(), baseConsumption()));
        Map<String, PartForecastResult> byKey = new java.util.HashMap<>();
        forecast(snapshot, "poisson").forEach(r -> byKey.put(r.partId() + "|" + r.locationCode(), r));

        // Records start in January 2023: 24 months, not 72 with 48 unrecorded months counted as zero.
        PartForecastResult teshvale = byKey.get(CUP_SEAL + "|DEP-T");
        assertEquals(24, teshvale.history().length);
        assertEquals(LocalDate.of(2023, 1, 1), teshvale.historyFrom());
        assertEquals(2.0, teshvale.breakdownPerMonth(), 1e-12, "the Poisson mean of 24 months of 2 units");
        // A pump installed in July 2024 at its depot: its series starts in July.
        PartForecastResult marrowford = byKey.get(CUP_SEAL + "|DEP-M");
        assertEquals(6, marrowford.history().length);
        assertEquals(LocalDate.of(2024, 7, 1), marrowford.historyFrom());
        assertEquals(1.0, marrowford.breakdownPerMonth(), 1e-12);
        // The young pump's part with no demand yet still starts at its installation.
        assertEquals(LocalDate.of(2024, 7, 1), byKey.get(O_RING + "|DEP-M").historyFrom());
        PartForecastResult programme = byKey.get(CUP_SEAL + "|PROGRAMME");
        assertEquals(24, programme.history().length);
        assertEquals((24 * 2 + 6) / 24.0, programme.breakdownPerMonth(), 1e-12);
    }
}
