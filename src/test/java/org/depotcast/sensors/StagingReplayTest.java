package org.depotcast.sensors;

import org.apache.commons.csv.CSVRecord;
import org.depotcast.core.sensors.PartsToHaveReady;
import org.depotcast.core.sensors.StoppedPumpParts;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Pump-days waiting for parts over the demo's held-out year (2025-12-01 to 2026-11-30), with and without staging
 * parts for the pumps the sensors flag as probably down, for sensor seeds 14 (the demo's) and 15 under the demo's
 * report delay (Poisson, mean 3 days). Figures print as EVIDENCE lines.
 *
 * <p>What is replayed: every repair reported in the year ({@code repairs.csv}: breakdowns and preventive services,
 * each needing its recorded part and quantity at its pump's depot on its reported day), through
 * {@link DepotStockReplay}: each depot (its shelves and its mechanics' kits together) starts the year with, and orders
 * back up to, the demo's stock count of that depot and its kits; a part not at hand comes from the central store
 * after the service's depot transfer lead time ({@code depotcast.planning.depot-transfer-lead-days}, 14 days). A
 * breakdown waits from its reported day to the day all its parts are at hand; that is its pump-days waiting.
 * <ul>
 *   <li>Without staging, parts are ordered only when repairs are reported.</li>
 *   <li>With staging, each morning the officer sets, per depot and part, the expected units of the pumps flagged
 *   by the previous evening and still open ({@link DemoSensorYear}: the service's flag rules and probability), summed
 *   ({@link StoppedPumpParts}) and turned into whole units to have ready by one of two rules, and the depot orders up
 *   to that many when it holds less (on hand and on the way, less what waiting repairs are owed). The rules
 *   ({@link Rule}): the sum rounded up to whole pieces, as the officer's page showed it before, and the service's
 *   rule ({@link PartsToHaveReady}: the Poisson quantile of the sum at the part's class's service level, the
 *   configured defaults, as the demo sets none).</li>
 * </ul>
 * Simplifications: the stock counts are those of 2026-12-01 (the demo has none for the year's start) used as each
 * depot's base stock all year; the central store always has the part (its purchasing is outside the replay), so no
 * wait is longer than the transfer lead time and staging draws on no other depot; lateral transfers between depots
 * are not replayed; preventive services take their parts on their reported day but their waits are not counted
 * (the pump works meanwhile); the parts expectation uses the demo's planted family rates and units per repair
 * ({@code planted-rates.csv}) in place of a fitted fleet model (the fleet model estimates those rates and has a load
 * term the planted rates set to 0). Because staging only raises a depot's target, it never delays any repair here.
 */
class StagingReplayTest {
    private static final int DAYS = DemoSensorYear.DAYS;

    private record Pump(String depot, String model, double depthM, LocalDate installedOn) {
    }

    private record Repair(String asset, boolean breakdown, DepotStockReplay.Demand demand) {
    }

    /** How the summed expected units of a part at a depot become whole units to have ready. */
    enum Rule {
        ROUNDED_UP("expected units rounded up"), COVER_LEVEL("Poisson cover at the part's service level");

        final String words;

        Rule(String words) {
            this.words = words;
        }

        double units(double expected, double coverLevel) {
            return this == ROUNDED_UP ? Math.ceil(expected - 1e-9) : PartsToHaveReady.units(expected, coverLevel);
        }
    }

    @Test
    void stagingPartsForProbablyDownPumpsNeverDelaysARepairAndShortensTheWaitsOfFlaggedOnes() throws IOException {
        int leadDays = depotTransferLeadDays();
        Map<String, Pump> pumps = pumps();
        List<Repair> repairs = repairsInYear(pumps);
        List<DepotStockReplay.Demand> demands = repairs.stream().map(Repair::demand).toList();
        Map<String, Map<String, Double>> base = baseStock();
        Map<String, Double> cover = coverLevels();
        DepotStockReplay.Result without = DepotStockReplay.run(demands, base, leadDays, DAYS, (d, p, t) -> 0);
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            List<DemoSensorYear.PumpYear> year = DemoSensorYear.replay(seed,
                    DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC);
            Map<String, Map<String, double[]>> ready = readyUnits(year, pumps);
            Set<String> flaggedFirst = flaggedBeforeReport(year);
            Set<String> sensorPumps = new HashSet<>();
            year.forEach(p -> sensorPumps.add(p.assetId()));
            for (Rule rule : Rule.values()) {
                DepotStockReplay.Result with = DepotStockReplay.run(demands, base, leadDays, DAYS, (depot, part, t) ->
                        rule.units(ready.getOrDefault(depot, Map.of()).getOrDefault(part, new double[DAYS])[t],
                                cover.get(part)));
                long[][] sums = new long[3][3];
                int shortened = waits(repairs, without, with, leadDays, sensorPumps, flaggedFirst, sums);
                double[] list = listRead(ready, rule, cover);
                System.out.printf("EVIDENCE staging, seed %d, %s: %d breakdowns reported, pump-days waiting for "
                                + "parts %d without staging, %d with (%+.1f %%); %d breakdowns at sensor pumps %d → %d; "
                                + "%d flagged before the report %d → %d; %d breakdowns waited less; %.0f more units "
                                + "sent to depots (%.0f without staging); on %.0f depot-days with a flag the officer "
                                + "reads %.2f parts and %.2f units to have ready a day%n",
                        seed, rule.words, sums[0][0], sums[0][1], sums[0][2], change(sums[0]), sums[1][0], sums[1][1],
                        sums[1][2], sums[2][0], sums[2][1], sums[2][2], shortened,
                        with.unitsSent() - without.unitsSent(), without.unitsSent(), list[0], list[1] / list[0],
                        list[2] / list[0]);
                assertTrue(sums[2][0] >= 30, "flagged breakdowns to judge: " + sums[2][0]);
                assertTrue(sums[0][1] > 0, "some breakdowns wait without staging");
                assertEquals(sums[0][1] - sums[0][2] > 0, shortened > 0, "the totals follow the repairs' waits");
            }
        }
    }

    /**
     * Checks each breakdown's waits without and with staging and adds them up in {@code sums}: {breakdowns, days
     * without, days with} for all, those at sensor pumps and those flagged before the report; returns how many
     * breakdowns waited less.
     */
    private static int waits(List<Repair> repairs, DepotStockReplay.Result without, DepotStockReplay.Result with,
                             int leadDays, Set<String> sensorPumps, Set<String> flaggedFirst, long[][] sums) {
        int shortened = 0;
        for (int i = 0; i < repairs.size(); i++) {
            Repair r = repairs.get(i);
            if (!r.breakdown()) {
                continue;
            }
            int before = without.atHandDay()[i] - r.demand().day();
            int after = with.atHandDay()[i] - r.demand().day();
            assertTrue(before >= 0 && before <= leadDays && after >= 0, r + ": waits " + before + ", " + after);
            assertTrue(after <= before, "staging never delays a repair: " + r + " " + before + " → " + after);
            shortened += after < before ? 1 : 0;
            boolean[] in = {true, sensorPumps.contains(r.asset()), flaggedFirst.contains(r.asset() + "|" + r.demand().day())};
            for (int g = 0; g < 3; g++) {
                if (in[g]) {
                    sums[g][0]++;
                    sums[g][1] += before;
                    sums[g][2] += after;
                }
            }
        }
        return shortened;
    }

    /**
     * What the officer is asked to set aside: {depot-days with some part expected, part lines with at least one unit
     * to have ready, units to have ready}, summed over the year.
     */
    private static double[] listRead(Map<String, Map<String, double[]>> ready, Rule rule, Map<String, Double> cover) {
        double[] totals = new double[3];
        for (Map<String, double[]> depot : ready.values()) {
            for (int t = 0; t < DAYS; t++) {
                boolean flagged = false;
                for (Map.Entry<String, double[]> part : depot.entrySet()) {
                    double units = rule.units(part.getValue()[t], cover.get(part.getKey()));
                    flagged |= part.getValue()[t] > 0;
                    totals[1] += units > 0 ? 1 : 0;
                    totals[2] += units;
                }
                totals[0] += flagged ? 1 : 0;
            }
        }
        return totals;
    }

    private static double change(long[] sums) {
        return 100.0 * (sums[2] - sums[1]) / sums[1];
    }

    /** Per depot and part, the flagged pumps' expected units summed for each day (the flags open the evening before). */
    private static Map<String, Map<String, double[]>> readyUnits(List<DemoSensorYear.PumpYear> year,
                                                                 Map<String, Pump> pumps) throws IOException {
        PartsExpectation expectation = new PartsExpectation();
        Map<String, Map<String, double[]>> ready = new HashMap<>();
        for (DemoSensorYear.PumpYear pumpYear : year) {
            Pump pump = pumps.get(pumpYear.assetId());
            for (DemoSensorYear.Flag flag : pumpYear.flags()) {
                Map<String, Double> perUnitProbability = expectation.unitsByPart(pump.model(), pump.depthM(),
                        ageYears(pump, flag.stoppedFrom()));
                for (int t = flag.openDay() + 1; t < Math.min(flag.closeDay(), DAYS); t++) {
                    double p = flag.probabilityOn(t - 1);
                    int day = t;
                    perUnitProbability.forEach((part, units) -> ready.computeIfAbsent(pump.depot(), k -> new HashMap<>())
                            .computeIfAbsent(part, k -> new double[DAYS])[day] += p * units);
                }
            }
        }
        return ready;
    }

    private static double ageYears(Pump pump, int stoppedFromDay) {
        LocalDate stopped = DemoSensorYear.FIRST.plusDays(stoppedFromDay);
        return Math.max(0, ChronoUnit.DAYS.between(pump.installedOn(), stopped) / 365.25);
    }

    /** Keys asset|report day of the planted breakdowns whose first flag opened before their report. */
    private static Set<String> flaggedBeforeReport(List<DemoSensorYear.PumpYear> year) {
        Set<String> keys = new HashSet<>();
        for (DemoSensorYear.PumpYear pump : year) {
            Set<Integer> caught = new HashSet<>();
            for (DemoSensorYear.Flag flag : pump.flags()) {
                if (flag.covering() >= 0 && caught.add(flag.covering())
                        && flag.openDay() < pump.planted().get(flag.covering()).report()) {
                    keys.add(pump.assetId() + "|" + pump.planted().get(flag.covering()).report());
                }
            }
        }
        return keys;
    }

    private static Map<String, Pump> pumps() throws IOException {
        Map<String, Pump> pumps = new HashMap<>();
        for (CSVRecord r : DemoSensorYear.csv("pumps.csv")) {
            pumps.put(r.get("asset_id"), new Pump(r.get("depot_code"), r.get("model_code"),
                    Double.parseDouble(r.get("depth_m")), LocalDate.parse(r.get("installed_on"))));
        }
        return pumps;
    }

    /** Repairs reported in the year, in day order (the file's order within a day). */
    private static List<Repair> repairsInYear(Map<String, Pump> pumps) throws IOException {
        List<Repair> repairs = new ArrayList<>();
        for (CSVRecord r : DemoSensorYear.csv("repairs.csv")) {
            int day = DemoSensorYear.index(LocalDate.parse(r.get("reported_on")));
            if (day < 0 || day >= DAYS || r.get("part_number").isBlank()) {
                continue;
            }
            repairs.add(new Repair(r.get("asset_id"), r.get("kind").equals("BREAKDOWN"),
                    new DepotStockReplay.Demand(day, pumps.get(r.get("asset_id")).depot(), r.get("part_number"),
                            Double.parseDouble(r.get("quantity")))));
        }
        repairs.sort((a, b) -> Integer.compare(a.demand().day(), b.demand().day()));
        return repairs;
    }

    /** Per depot and part, the demo's counts of the depot and its mechanics' kits (the central store left out). */
    private static Map<String, Map<String, Double>> baseStock() throws IOException {
        Map<String, String> depotOf = new HashMap<>();
        for (CSVRecord r : DemoSensorYear.csv("locations.csv")) {
            depotOf.put(r.get("code"), r.get("kind").equals("KIT") ? r.get("parent_code")
                    : r.get("kind").equals("DEPOT") ? r.get("code") : null);
        }
        Map<String, Map<String, Double>> base = new HashMap<>();
        for (CSVRecord r : DemoSensorYear.csv("opening-stock.csv")) {
            String depot = depotOf.get(r.get("location_code"));
            if (depot != null) {
                base.computeIfAbsent(depot, k -> new HashMap<>()).merge(r.get("part_number"),
                        Double.parseDouble(r.get("quantity")), Double::sum);
            }
        }
        return base;
    }

    /** The service's setting, read from its configuration so the replay follows it. */
    private static int depotTransferLeadDays() throws IOException {
        return (int) planningSetting("depot-transfer-lead-days");
    }

    /** Per part, the configured service level of its class (critical or standard) in the demo's catalogue. */
    private static Map<String, Double> coverLevels() throws IOException {
        double critical = planningSetting("service-level-critical");
        double standard = planningSetting("service-level-standard");
        Map<String, Double> cover = new HashMap<>();
        for (CSVRecord r : DemoSensorYear.csv("parts.csv")) {
            cover.put(r.get("part_number"), Boolean.parseBoolean(r.get("critical")) ? critical : standard);
        }
        return cover;
    }

    private static double planningSetting(String name) throws IOException {
        String key = "depotcast.planning." + name + "=";
        return Files.readAllLines(Path.of("src/main/resources/application.properties")).stream()
                .filter(l -> l.startsWith(key)).map(l -> Double.parseDouble(l.substring(key.length()).trim()))
                .findFirst().orElseThrow();
    }
}
