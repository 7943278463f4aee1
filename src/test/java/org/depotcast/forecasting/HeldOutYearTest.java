package org.depotcast.forecasting;

import org.depotcast.PlantedRate;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.SeriesForecaster;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.function.ToDoubleFunction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Forecasts a year the service has not seen: the demo generator writes a programme with another seed than the
 * demo's, the records are cut a year before their end, the service forecasts as of the cut, and its 12-month
 * breakdown totals per depot × part are compared with what the generator then drew, beside the forecast from the
 * generator's planted rates (each pump's planted rate × its daily load at the cut × 365.25 days, age at mid-year).
 * Scheduled-service demand is left out of the MAE comparison (the planted rates are breakdown rates); it is in the
 * ranges' check ({@link RangeCoverage}): every month's and the 12-month total's demand at each depot and for the
 * programme against the stored 80 % and 95 % ranges. Beside them, the fleet model alone (policy "fleet") and each
 * single history method on every series, scored alike.
 * {@code -Dheldout.seeds=7,8,9} measures other seeds (printed; the default seed is the one asserted in CI).
 */
class HeldOutYearTest {
    private static final LocalDate ORIGIN = LocalDate.of(2025, 12, 1);

    /** Mean absolute error of 12-month totals over depot × part series and over parts (programme), and total bias. */
    record Accuracy(double depotMae, double programmeMae, double bias) {
    }

    /**
     * @param others the fleet model alone and each single history method, by name, scored like the service
     */
    record Score(Accuracy service, Accuracy planted, Map<String, Accuracy> others, int series, RangeCoverage.Table ranges) {
        Accuracy fleet() {
            return others.get("fleet model alone");
        }

        /** The single history method with the lowest value of the given measure. */
        Map.Entry<String, Accuracy> bestHistory(ToDoubleFunction<Accuracy> measure) {
            return others.entrySet().stream().filter(e -> !e.getKey().equals("fleet model alone"))
                    .min(java.util.Comparator.comparingDouble(e -> measure.applyAsDouble(e.getValue()))).orElseThrow();
        }
    }

    @Test
    void forecastAsOfTheCutIsAsAccurateAsThePlantedRates(@TempDir Path dir) throws Exception {
        String seeds = System.getProperty("heldout.seeds", "7");
        List<Score> scores = new ArrayList<>();
        for (String seed : seeds.split(",")) {
            Score s = heldOut(dir.resolve("seed-" + seed.strip()), Long.parseLong(seed.strip()));
            System.out.printf(Locale.ROOT, "held-out year, seed %s: %d depot x part series%n", seed, s.series());
            print("service", s.service());
            print("planted rates", s.planted());
            s.others().forEach(HeldOutYearTest::print);
            System.out.print(s.ranges().describe("seed " + seed));
            scores.add(s);
        }
        for (Score s : scores) {
            assertEquals(57, s.series());
            assertTrue(s.service().depotMae() <= 1.05 * s.planted().depotMae(),
                    "depot MAE " + s.service().depotMae() + " vs planted " + s.planted().depotMae());
            // At least as accurate as the better of the fleet model alone and the best single history method
            // (chosen in hindsight, per measure), by MAE and by total bias (2 % slack on MAE for the credibility
            // update, half a point on bias). At programme level (19 part totals) that best-in-hindsight of eight
            // methods beats even the planted rates on some seeds by luck; there the bar is the planted rates'.
            ToDoubleFunction<Accuracy> depot = Accuracy::depotMae, programme = Accuracy::programmeMae;
            ToDoubleFunction<Accuracy> absBias = a -> Math.abs(a.bias());
            assertTrue(s.service().depotMae() <= 1.02 * better(s, depot), "depot MAE " + s.service() + " vs " + s.others());
            assertTrue(s.service().programmeMae() <= Math.max(1.02 * better(s, programme),
                    1.05 * s.planted().programmeMae()), "programme MAE " + s.service() + " vs " + s.others());
            assertTrue(Math.abs(s.service().bias()) <= Math.max(better(s, absBias) + 0.005,
                    Math.abs(s.planted().bias()) + 0.01), "bias " + s.service() + " vs " + s.others());
            s.ranges().assertCalibrated();
        }
    }

    private static double better(Score s, ToDoubleFunction<Accuracy> measure) {
        return Math.min(measure.applyAsDouble(s.fleet()), measure.applyAsDouble(s.bestHistory(measure).getValue()));
    }

    private static void print(String name, Accuracy a) {
        System.out.printf(Locale.ROOT, "  %-22s depot MAE %6.2f  programme MAE %6.2f  total bias %+5.1f%%%n", name,
                a.depotMae(), a.programmeMae(), 100 * a.bias());
    }

    private static Score heldOut(Path out, long seed) throws IOException, InterruptedException {
        Files.createDirectories(out);
        Process generator = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "seed-data/generator/GenerateDemoProgramme.java", out.toString(), Long.toString(seed))
                .redirectErrorStream(true).start();
        String log = new String(generator.getInputStream().readAllBytes());
        assertTrue(generator.waitFor(120, TimeUnit.SECONDS) && generator.exitValue() == 0, log);

        Programme p = Programme.read(out);
        FleetSnapshot snapshot = FleetSnapshotLoader.asOf(ORIGIN, 72, p.rows);
        Map<ComponentFamily, ForecastModelDefinition> definitions = new EnumMap<>(ComponentFamily.class);
        try (var files = Files.list(Path.of("forecast-models"))) {
            for (Path file : files.filter(f -> f.toString().endsWith(".json")).toList()) {
                ForecastModelDefinition d = ForecastModelFiles.parse(file.getFileName().toString(), Files.readString(file));
                definitions.put(d.family(), d);
            }
        }
        Map<ComponentFamily, FleetModelFitter.Breakdowns> breakdowns = FleetModelFitter.Breakdowns.of(snapshot);
        Map<ComponentFamily, org.depotcast.core.forecast.FleetRateModel> models = new EnumMap<>(ComponentFamily.class);
        Map<ComponentFamily, org.depotcast.core.forecast.FleetRateModel> holdout = new EnumMap<>(ComponentFamily.class);
        definitions.forEach((family, d) -> {
            models.put(family, FleetModelFitter.fit(d, snapshot, breakdowns.get(family), 0));
            holdout.put(family, FleetModelFitter.fit(d, snapshot, breakdowns.get(family), 1));
        });
        Map<String, PartForecastResult> forecasts = new HashMap<>();
        new DemandAssembler(snapshot, definitions, models, holdout, 12).assemble(done -> { })
                .forEach(r -> forecasts.put(r.partId() + "|" + r.locationCode(), r));
        Map<ComponentFamily, ForecastModelDefinition> fleetOnly = new EnumMap<>(ComponentFamily.class);
        definitions.forEach((family, d) -> fleetOnly.put(family, new ForecastModelDefinition(d.family(), d.covariates(),
                d.priorEventsPer1000Hours(), d.unitsPerEvent(), "fleet", d.preventive(), d.source())));
        Map<String, PartForecastResult> fleetForecasts = new HashMap<>();
        new DemandAssembler(snapshot, fleetOnly, models, holdout, 12).assemble(done -> { })
                .forEach(r -> fleetForecasts.put(r.partId() + "|" + r.locationCode(), r));

        // What happened in the held-out year, and what the planted rates expected of the pumps known at the cut.
        Map<String, Double> actual = new TreeMap<>(), planted = new TreeMap<>();
        for (FleetSnapshot.Consumption line : p.rows.consumption()) {
            FleetSnapshot.Consumption c = line.arisingBetween(ORIGIN, ORIGIN.plusYears(1));
            if (c != null && c.breakdown()) {
                actual.merge(c.partId() + "|" + p.rows.locationCodes().get(c.depotId()), c.quantity(), Double::sum);
            }
        }
        long origin = ORIGIN.toEpochDay();
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            if (pump.endDay() <= origin) {
                continue;
            }
            double hours = pump.usage().hoursPerDayOn(origin) * 365.25;
            double age = (origin + 365.25 / 2 - pump.installedDay()) / 365.25;
            for (FleetSnapshot.BomPart part : pump.bom()) {
                PlantedRate rate = p.planted.get(part.family());
                if (rate != null) {
                    planted.merge(part.partId() + "|" + p.rows.locationCodes().get(pump.depotId()),
                            rate.perHour(pump.depthM(), age) * hours * rate.unitsPerEvent(), Double::sum);
                }
            }
        }
        Map<String, Accuracy> others = new java.util.LinkedHashMap<>();
        others.put("fleet model alone", accuracy(planted.keySet(), k -> breakdownTotal(fleetForecasts.get(k)), actual));
        for (ForecastMethod method : ForecastMethod.values()) {
            others.put(method.name().toLowerCase(Locale.ROOT), accuracy(planted.keySet(), k -> {
                PartForecastResult f = forecasts.get(k);
                return f == null ? 0 : 12 * SeriesForecaster.forecast(f.history(), method, Double.NaN, Double.NaN, 1).forecast()[0];
            }, actual));
        }
        return new Score(accuracy(planted.keySet(), k -> breakdownTotal(forecasts.get(k)), actual),
                accuracy(planted.keySet(), planted::get, actual), others, planted.size(),
                RangeCoverage.score(forecasts, p.rows, ORIGIN));
    }

    /** The breakdown part of a forecast's first 12 months (scheduled services left out, as in the planted rates). */
    private static double breakdownTotal(PartForecastResult f) {
        double total = 0;
        for (int m = 0; f != null && m < 12; m++) {
            total += f.monthly()[m] - f.preventive()[m];
        }
        return total;
    }

    private static Accuracy accuracy(java.util.Set<String> keys, ToDoubleFunction<String> forecast,
                                     Map<String, Double> actual) {
        double error = 0, sumForecast = 0, sumActual = 0;
        Map<String, double[]> byPart = new HashMap<>();
        for (String key : keys) {
            double f = forecast.applyAsDouble(key), happened = actual.getOrDefault(key, 0.0);
            error += Math.abs(f - happened);
            sumForecast += f;
            sumActual += happened;
            double[] part = byPart.computeIfAbsent(key.substring(0, key.indexOf('|')), k -> new double[2]);
            part[0] += f;
            part[1] += happened;
        }
        double programmeError = byPart.values().stream().mapToDouble(t -> Math.abs(t[0] - t[1])).sum();
        return new Accuracy(error / keys.size(), programmeError / byPart.size(), sumForecast / sumActual - 1);
    }

    /** The generated CSV files as the loader's plain rows, and the planted rates per family. */
    record Programme(FleetSnapshotLoader.Rows rows, Map<ComponentFamily, PlantedRate> planted) {
        static Programme read(Path dir) throws IOException {
            Map<String, Long> locationIds = new HashMap<>();
            Map<Long, String> codes = new HashMap<>();
            Map<String, String> kits = new HashMap<>();
            for (CSVRecord r : csv(dir.resolve("locations.csv"))) {
                long id = locationIds.size() + 1;
                locationIds.put(r.get("code"), id);
                codes.put(id, r.get("code"));
                if (r.get("kind").equals("KIT")) {
                    kits.put(r.get("mechanic_username"), r.get("code"));
                }
            }
            Map<String, Long> partIds = new HashMap<>();
            Map<Long, String> numbers = new HashMap<>();
            Map<Long, ComponentFamily> families = new HashMap<>();
            for (CSVRecord r : csv(dir.resolve("parts.csv"))) {
                long id = partIds.size() + 100;
                partIds.put(r.get("part_number"), id);
                numbers.put(id, r.get("part_number"));
                families.put(id, ComponentFamily.valueOf(r.get("family")));
            }
            Map<String, List<CSVRecord>> bomByModel = new HashMap<>();
            Map<String, Integer> interval = new HashMap<>();
            for (CSVRecord r : csv(dir.resolve("pump-models.csv"))) {
                bomByModel.computeIfAbsent(r.get("model_code"), k -> new ArrayList<>()).add(r);
                interval.put(r.get("model_code"), Integer.parseInt(r.get("service_interval_hours")));
            }
            Map<String, FleetSnapshotLoader.Pump> pumps = new HashMap<>();
            List<FleetSnapshotLoader.Pump> register = new ArrayList<>();
            for (CSVRecord r : csv(dir.resolve("pumps.csv"))) {
                double depth = Double.parseDouble(r.get("depth_m"));
                List<FleetSnapshot.BomPart> bom = new ArrayList<>();
                for (CSVRecord line : bomByModel.get(r.get("model_code"))) {
                    double kit = Double.parseDouble(line.get("service_kit_quantity"));
                    long part = partIds.get(line.get("part_number"));
                    bom.add(new FleetSnapshot.BomPart(part, families.get(part),
                            line.get("basis").equals("PER_PUMP") ? kit : Math.ceil(kit * depth - 1e-9)));
                }
                FleetSnapshotLoader.Pump pump = new FleetSnapshotLoader.Pump(register.size() + 1,
                        locationIds.get(r.get("depot_code")), r.get("assigned_mechanic"), depth,
                        LocalDate.parse(r.get("installed_on")),
                        r.get("status").equals("DECOMMISSIONED") ? LocalDate.parse(r.get("status_since")) : null,
                        interval.get(r.get("model_code")), Double.parseDouble(r.get("usage_hours_per_day")), List.copyOf(bom));
                register.add(pump);
                pumps.put(r.get("asset_id"), pump);
            }
            List<FleetSnapshotLoader.Reading> readings = new ArrayList<>();
            for (CSVRecord r : csv(dir.resolve("usage-readings.csv"))) {
                readings.add(new FleetSnapshotLoader.Reading(pumps.get(r.get("asset_id")).id(),
                        LocalDate.parse(r.get("read_on")), Double.parseDouble(r.get("hours_per_day"))));
            }
            List<FleetSnapshot.Consumption> consumption = new ArrayList<>();
            for (CSVRecord r : csv(dir.resolve("repairs.csv"))) {
                FleetSnapshotLoader.Pump pump = pumps.get(r.get("asset_id"));
                // As the service's own consumption rows: the day fixed, or reported while the repair is open.
                String fixed = r.get("fixed_on");
                consumption.add(new FleetSnapshot.Consumption(partIds.get(r.get("part_number")), pump.id(), pump.depotId(),
                        r.get("mechanic"), r.get("kind").equals("BREAKDOWN"),
                        LocalDate.parse(fixed.isEmpty() ? r.get("reported_on") : fixed), Double.parseDouble(r.get("quantity")),
                        LocalDate.parse(r.get("reported_on"))));
            }
            Map<ComponentFamily, PlantedRate> planted = new EnumMap<>(ComponentFamily.class);
            PlantedRate.read(dir.resolve("planted-rates.csv")).forEach((family, rate) ->
                    planted.put(ComponentFamily.valueOf(family), rate));
            return new Programme(new FleetSnapshotLoader.Rows(readings, consumption, register, kits, codes, numbers, families),
                    planted);
        }

        private static List<CSVRecord> csv(Path file) throws IOException {
            try (Reader reader = Files.newBufferedReader(file)) {
                return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(reader).getRecords();
            }
        }
    }
}
