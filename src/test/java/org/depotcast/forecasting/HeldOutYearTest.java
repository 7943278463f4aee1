package org.depotcast.forecasting;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.depotcast.catalogue.ComponentFamily;
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

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Forecasts a year the service has not seen: the demo generator writes a programme with another seed than the
 * demo's, the records are cut a year before their end, the service forecasts as of the cut, and its 12-month
 * breakdown totals per depot × part are compared with what the generator then drew, beside the forecast from the
 * generator's planted rates (each pump's planted rate × its daily load at the cut × 365.25 days, age at mid-year).
 * Scheduled-service demand is left out of the MAE comparison (the planted rates are breakdown rates); it is in the
 * ranges' check ({@link RangeCoverage}): every month's and the 12-month total's demand at each depot and for the
 * programme against the stored 80 % and 95 % ranges.
 * {@code -Dheldout.seeds=7,8,9} measures other seeds (printed; the default seed is the one asserted in CI).
 */
class HeldOutYearTest {
    private static final LocalDate ORIGIN = LocalDate.of(2025, 12, 1);

    record Score(double maeDepot, double maePlanted, double maeProgramme, double maePlantedProgramme, double bias,
                 double biasPlanted, int series, RangeCoverage.Table ranges) {
    }

    @Test
    void forecastAsOfTheCutIsAsAccurateAsThePlantedRates(@TempDir Path dir) throws Exception {
        String seeds = System.getProperty("heldout.seeds", "7");
        List<Score> scores = new ArrayList<>();
        for (String seed : seeds.split(",")) {
            Score s = heldOut(dir.resolve("seed-" + seed.strip()), Long.parseLong(seed.strip()));
            System.out.printf(Locale.ROOT, "held-out year, seed %s: %d depot x part series; MAE %.2f (planted %.2f); "
                            + "programme MAE %.2f (planted %.2f); total bias %+.1f%% (planted %+.1f%%)%n", seed, s.series(),
                    s.maeDepot(), s.maePlanted(), s.maeProgramme(), s.maePlantedProgramme(), 100 * s.bias(),
                    100 * s.biasPlanted());
            System.out.print(s.ranges().describe("seed " + seed));
            scores.add(s);
        }
        for (Score s : scores) {
            assertEquals(57, s.series());
            assertTrue(s.maeDepot() <= 1.05 * s.maePlanted(), "depot MAE " + s.maeDepot() + " vs planted " + s.maePlanted());
            assertTrue(s.maeProgramme() <= 1.05 * s.maePlantedProgramme(),
                    "programme MAE " + s.maeProgramme() + " vs planted " + s.maePlantedProgramme());
            assertTrue(Math.abs(s.bias()) <= Math.abs(s.biasPlanted()) + 0.01, "bias " + s.bias());
            s.ranges().assertCalibrated();
        }
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

        // What happened in the held-out year, and what the planted rates expected of the pumps known at the cut.
        Map<String, Double> actual = new TreeMap<>(), planted = new TreeMap<>();
        for (FleetSnapshot.Consumption c : p.rows.consumption()) {
            if (c.breakdown() && !c.day().isBefore(ORIGIN) && c.day().isBefore(ORIGIN.plusYears(1))) {
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
                double[] rate = p.planted.get(part.family());
                if (rate != null) {
                    double perHour = rate[0] / 1000 * Math.pow(pump.depthM() / 30.0, rate[1]) * Math.exp(rate[2] * age);
                    planted.merge(part.partId() + "|" + p.rows.locationCodes().get(pump.depotId()),
                            perHour * hours * rate[3], Double::sum);
                }
            }
        }
        double errService = 0, errPlanted = 0, sumService = 0, sumPlanted = 0, sumActual = 0;
        Map<Long, double[]> programme = new HashMap<>();
        for (Map.Entry<String, Double> e : planted.entrySet()) {
            PartForecastResult f = forecasts.get(e.getKey());
            double service = 0;
            for (int m = 0; f != null && m < 12; m++) {
                service += f.monthly()[m] - f.preventive()[m];
            }
            double happened = actual.getOrDefault(e.getKey(), 0.0);
            errService += Math.abs(service - happened);
            errPlanted += Math.abs(e.getValue() - happened);
            sumService += service;
            sumPlanted += e.getValue();
            sumActual += happened;
            double[] total = programme.computeIfAbsent(Long.parseLong(e.getKey().substring(0, e.getKey().indexOf('|'))),
                    k -> new double[3]);
            total[0] += service;
            total[1] += e.getValue();
            total[2] += happened;
        }
        RangeCoverage.Table ranges = RangeCoverage.score(forecasts, p.rows, ORIGIN);
        double progService = 0, progPlanted = 0;
        for (double[] t : programme.values()) {
            progService += Math.abs(t[0] - t[2]);
            progPlanted += Math.abs(t[1] - t[2]);
        }
        int n = planted.size();
        return new Score(errService / n, errPlanted / n, progService / programme.size(), progPlanted / programme.size(),
                sumService / sumActual - 1, sumPlanted / sumActual - 1, n, ranges);
    }

    /** The generated CSV files as the loader's plain rows, and the planted rates per family. */
    record Programme(FleetSnapshotLoader.Rows rows, Map<ComponentFamily, double[]> planted) {
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
                        LocalDate.parse(fixed.isEmpty() ? r.get("reported_on") : fixed), Double.parseDouble(r.get("quantity"))));
            }
            Map<ComponentFamily, double[]> planted = new EnumMap<>(ComponentFamily.class);
            for (CSVRecord r : csv(dir.resolve("planted-rates.csv"))) {
                planted.put(ComponentFamily.valueOf(r.get("family")), new double[]{
                        Double.parseDouble(r.get("events_per_1000h_at_30m_new")), Double.parseDouble(r.get("depth_exponent")),
                        Double.parseDouble(r.get("age_coefficient_per_year")), Double.parseDouble(r.get("units_per_event"))});
            }
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
