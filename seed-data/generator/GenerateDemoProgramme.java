import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;

/**
 * Writes the invented demo programme (the Ostrevane Basin rural water programme) as CSV files.
 * Breakdowns are drawn from planted per-component Poisson rates that depend on depth and pump age, per operating
 * hour, so that the forecasting can be checked against known truth. Run from the repository root:
 *
 *   java seed-data/generator/GenerateDemoProgramme.java seed-data [seed]
 *
 * Plain JDK only, seeded: the same command always writes the same files. The demo is the default seed; the tests
 * write programmes with other seeds to check forecasts on data they were not tuned on.
 */
public class GenerateDemoProgramme {
    static final long SEED = 20261202L;
    static final LocalDate HISTORY_START = LocalDate.of(2020, 12, 1);
    static final LocalDate HISTORY_END = LocalDate.of(2026, 11, 30);
    static final LocalDate COUNTED_ON = LocalDate.of(2026, 12, 1);
    static final double REFERENCE_DEPTH_M = 30.0;
    static final int SERVICE_INTERVAL_HOURS = 9125; // 5 years at 5 h/day, common practice
    static final int PUMPS = 1200;

    /** Planted truth: events per 1,000 operating hours at 30 m for a new pump, depth elasticity, age coefficient per year. */
    record Rate(String family, double per1000h, double depthExponent, double agePerYear, int unitsPerEvent) {
        double perHour(double depthM, double ageYears) {
            return per1000h / 1000.0 * Math.pow(depthM / REFERENCE_DEPTH_M, depthExponent) * Math.exp(agePerYear * ageYears);
        }
    }

    static final List<Rate> RATES = List.of(
            new Rate("CUP_SEAL", 0.200, 0.5, 0.00, 2),
            new Rate("O_RING", 0.060, 0.3, 0.00, 2),
            new Rate("PLUNGER", 0.030, 0.4, 0.00, 1),
            new Rate("FOOT_VALVE", 0.035, 0.4, 0.00, 1),
            new Rate("PUMP_ROD", 0.020, 1.0, 0.06, 1),
            new Rate("RISING_MAIN", 0.020, 1.0, 0.06, 1),
            new Rate("ROD_CENTRALISER", 0.025, 0.8, 0.00, 1),
            new Rate("BEARING", 0.050, 0.2, 0.03, 2),
            new Rate("FULCRUM_PIN", 0.015, 0.2, 0.00, 1),
            new Rate("HANGER_PIN", 0.015, 0.2, 0.00, 1),
            new Rate("HANDLE", 0.006, 0.0, 0.00, 1),
            new Rate("CYLINDER", 0.006, 0.3, 0.04, 1));

    record PartRow(String number, String description, String family, String unit, int pack, int moq, double cost,
                   String supplier, int leadDays, Integer shelfDays, boolean critical) {
    }

    record Depot(String code, String name, double lat, double lon, int pumpShare) {
    }

    /** model code -> family -> part number; depth range the model is installed at. */
    record Model(String code, String name, double minDepth, double maxDepth, Map<String, String> partByFamily) {
    }

    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "seed-data");
        Files.createDirectories(out);
        SplittableRandom random = new SplittableRandom(args.length > 1 ? Long.parseLong(args[1]) : SEED);
        List<PartRow> parts = parts();
        List<Model> models = models();
        List<Depot> depots = List.of(
                new Depot("DEP-TESHVALE", "Teshvale district depot", 0.42, 1.18, 40),
                new Depot("DEP-MARROWFORD", "Marrowford district depot", -0.61, 2.05, 35),
                new Depot("DEP-PELLOWDENE", "Pellowdene Flats district depot", 0.95, 2.86, 25));
        writeLocations(out, depots);
        writeParts(out, parts);
        writeModels(out, models);
        writeRates(out);
        new History(random, models, depots, out).write();
        writeOpeningStockAndOrders(out, random, parts, depots);
    }

    static List<PartRow> parts() {
        String a = "Tolvery Castings", b = "Veyra Polymers", c = "Ostrevane Steel Supply";
        return List.of(
                new PartRow("OB-CS-50", "Cup seal, 50 mm cylinder, nitrile", "CUP_SEAL", "EACH", 10, 20, 1.40, b, 45, 1095, true),
                new PartRow("OB-CS-63", "Cup seal, 63 mm cylinder, nitrile", "CUP_SEAL", "EACH", 10, 20, 1.75, b, 45, 1095, true),
                new PartRow("OB-OR-SET", "O-ring set, cylinder and foot valve", "O_RING", "SET", 5, 10, 0.90, b, 45, 1460, false),
                new PartRow("OB-PL-50", "Plunger assembly, 50 mm", "PLUNGER", "EACH", 1, 2, 18.00, a, 90, null, false),
                new PartRow("OB-PL-63", "Plunger assembly, 63 mm", "PLUNGER", "EACH", 1, 2, 22.50, a, 90, null, false),
                new PartRow("OB-FV-50", "Foot valve assembly, 50 mm", "FOOT_VALVE", "EACH", 1, 2, 16.00, a, 90, null, true),
                new PartRow("OB-FV-63", "Foot valve assembly, 63 mm", "FOOT_VALVE", "EACH", 1, 2, 19.00, a, 90, null, true),
                new PartRow("OB-ROD-12", "Pump rod, 12 mm stainless, 3 m length", "PUMP_ROD", "LENGTH", 10, 10, 14.00, c, 120, null, false),
                new PartRow("OB-ROD-16", "Pump rod, 16 mm stainless, 3 m length", "PUMP_ROD", "LENGTH", 10, 10, 19.50, c, 120, null, false),
                new PartRow("OB-RM-40", "Rising main, 40 mm uPVC, 3 m length", "RISING_MAIN", "LENGTH", 10, 10, 9.00, b, 60, null, false),
                new PartRow("OB-RM-50", "Rising main, 50 mm stainless, 3 m length", "RISING_MAIN", "LENGTH", 5, 5, 31.00, c, 120, null, false),
                new PartRow("OB-RC-40", "Rod centraliser for 40 mm main", "ROD_CENTRALISER", "EACH", 20, 20, 0.80, b, 45, null, false),
                new PartRow("OB-RC-50", "Rod centraliser for 50 mm main", "ROD_CENTRALISER", "EACH", 20, 20, 0.95, b, 45, null, false),
                new PartRow("OB-BR-20", "Bush bearing, 20 mm, sealed", "BEARING", "EACH", 10, 10, 3.10, a, 60, null, true),
                new PartRow("OB-FP-20", "Fulcrum pin, 20 mm", "FULCRUM_PIN", "EACH", 5, 5, 4.20, a, 60, null, false),
                new PartRow("OB-HP-20", "Hanger pin, 20 mm", "HANGER_PIN", "EACH", 5, 5, 3.80, a, 60, null, false),
                new PartRow("OB-HD-STD", "Handle assembly, standard lever", "HANDLE", "EACH", 1, 1, 42.00, a, 90, null, false),
                new PartRow("OB-CY-50", "Cylinder, 50 mm brass-lined", "CYLINDER", "EACH", 1, 1, 65.00, a, 120, null, false),
                new PartRow("OB-CY-63", "Cylinder, 63 mm brass-lined", "CYLINDER", "EACH", 1, 1, 78.00, a, 120, null, false),
                new PartRow("OB-GR-1KG", "Grease for pump head bearings (check local approval for drinking-water contact)", "OTHER", "KILOGRAM", 1, 5, 6.00, b, 30, 730, false));
    }

    static List<Model> models() {
        Map<String, String> tl = new LinkedHashMap<>(), rb = new LinkedHashMap<>(), dr = new LinkedHashMap<>();
        String[][] common = {{"O_RING", "OB-OR-SET"}, {"BEARING", "OB-BR-20"}, {"FULCRUM_PIN", "OB-FP-20"},
                {"HANGER_PIN", "OB-HP-20"}, {"HANDLE", "OB-HD-STD"}};
        for (String[] c : common) {
            tl.put(c[0], c[1]);
            rb.put(c[0], c[1]);
            dr.put(c[0], c[1]);
        }
        put(tl, "CUP_SEAL", "OB-CS-63", "PLUNGER", "OB-PL-63", "FOOT_VALVE", "OB-FV-63", "PUMP_ROD", "OB-ROD-12",
                "RISING_MAIN", "OB-RM-40", "ROD_CENTRALISER", "OB-RC-40", "CYLINDER", "OB-CY-63");
        put(rb, "CUP_SEAL", "OB-CS-50", "PLUNGER", "OB-PL-50", "FOOT_VALVE", "OB-FV-50", "PUMP_ROD", "OB-ROD-12",
                "RISING_MAIN", "OB-RM-40", "ROD_CENTRALISER", "OB-RC-40", "CYLINDER", "OB-CY-50");
        put(dr, "CUP_SEAL", "OB-CS-50", "PLUNGER", "OB-PL-50", "FOOT_VALVE", "OB-FV-50", "PUMP_ROD", "OB-ROD-16",
                "RISING_MAIN", "OB-RM-50", "ROD_CENTRALISER", "OB-RC-50", "CYLINDER", "OB-CY-50");
        return List.of(new Model("TL-1", "Tallowbrook TL-1 shallow lever pump", 10, 40, tl),
                new Model("RB-2", "Rookbend RB-2 medium-lift lever pump", 25, 60, rb),
                new Model("DR-3", "Duskridge DR-3 deep-lift lever pump", 45, 90, dr));
    }

    static void put(Map<String, String> map, String... pairs) {
        for (int i = 0; i < pairs.length; i += 2) {
            map.put(pairs[i], pairs[i + 1]);
        }
    }

    static void writeLocations(Path out, List<Depot> depots) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("locations.csv")))) {
            w.println("code,name,kind,parent_code,latitude,longitude,mechanic_username");
            w.println("CENTRAL,Ostrevane Basin central store,CENTRAL_STORE,,0.100000,1.900000,");
            int mechanic = 1;
            for (Depot d : depots) {
                w.printf(Locale.ROOT, "%s,%s,DEPOT,CENTRAL,%.6f,%.6f,%n", d.code(), d.name(), d.lat(), d.lon());
            }
            for (Depot d : depots) {
                for (int i = 0; i < 4; i++, mechanic++) {
                    w.printf(Locale.ROOT, "KIT-M%02d,Kit of mechanic%d,KIT,%s,,,mechanic%d%n", mechanic, mechanic, d.code(), mechanic);
                }
            }
        }
    }

    static void writeParts(Path out, List<PartRow> parts) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("parts.csv")))) {
            w.println("part_number,description,family,unit_of_issue,pack_size,min_order_qty,unit_cost,currency,supplier,lead_time_days,shelf_life_days,critical");
            for (PartRow p : parts) {
                w.printf(Locale.ROOT, "%s,\"%s\",%s,%s,%d,%d,%.2f,USD,%s,%d,%s,%s%n", p.number(), p.description(), p.family(),
                        p.unit(), p.pack(), p.moq(), p.cost(), p.supplier(), p.leadDays(),
                        p.shelfDays() == null ? "" : p.shelfDays(), p.critical());
            }
        }
    }

    static void writeModels(Path out, List<Model> models) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("pump-models.csv")))) {
            w.println("model_code,model_name,service_interval_hours,part_number,basis,quantity,service_kit_quantity");
            for (Model m : models) {
                for (Map.Entry<String, String> e : m.partByFamily().entrySet()) {
                    String[] bom = switch (e.getKey()) {
                        case "CUP_SEAL" -> new String[]{"PER_PUMP", "2", "2"};
                        case "O_RING" -> new String[]{"PER_PUMP", "1", "1"};
                        case "BEARING" -> new String[]{"PER_PUMP", "4", "4"};
                        case "PUMP_ROD", "RISING_MAIN" -> new String[]{"PER_METRE", "0.3334", "0"};
                        case "ROD_CENTRALISER" -> new String[]{"PER_METRE", "0.3334", "0.1667"};
                        case "FULCRUM_PIN", "HANGER_PIN" -> new String[]{"PER_PUMP", "1", "1"};
                        default -> new String[]{"PER_PUMP", "1", "0"};
                    };
                    w.printf("%s,%s,%d,%s,%s,%s,%s%n", m.code(), m.name(), SERVICE_INTERVAL_HOURS, e.getValue(), bom[0], bom[1], bom[2]);
                }
            }
        }
    }

    static void writeRates(Path out) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("planted-rates.csv")))) {
            w.println("family,events_per_1000h_at_30m_new,depth_exponent,age_coefficient_per_year,units_per_event");
            for (Rate r : RATES) {
                w.printf(Locale.ROOT, "%s,%.4f,%.2f,%.3f,%d%n", r.family(), r.per1000h(), r.depthExponent(), r.agePerYear(), r.unitsPerEvent());
            }
        }
    }

    /** Pumps, usage readings and six years of repairs, drawn month by month. */
    static final class History {
        final SplittableRandom random;
        final List<Model> models;
        final List<Depot> depots;
        final Path out;

        History(SplittableRandom random, List<Model> models, List<Depot> depots, Path out) {
            this.random = random;
            this.models = models;
            this.depots = depots;
            this.out = out;
        }

        void write() throws IOException {
            try (PrintWriter pumps = new PrintWriter(Files.newBufferedWriter(out.resolve("pumps.csv")));
                 PrintWriter usage = new PrintWriter(Files.newBufferedWriter(out.resolve("usage-readings.csv")));
                 PrintWriter repairs = new PrintWriter(Files.newBufferedWriter(out.resolve("repairs.csv")))) {
                pumps.println("asset_id,model_code,depth_m,installed_on,latitude,longitude,depot_code,assigned_mechanic,status,status_since,usage_hours_per_day,usage_source");
                usage.println("asset_id,read_on,hours_per_day,source");
                repairs.println("repair_ref,asset_id,mechanic,kind,reported_on,diagnosed_on,parts_available_on,fixed_on,fault,part_number,quantity");
                int repairNo = 0;
                for (int i = 1; i <= PUMPS; i++) {
                    repairNo = onePump(i, pumps, usage, repairs, repairNo);
                }
            }
        }

        int onePump(int index, PrintWriter pumps, PrintWriter usage, PrintWriter repairs, int repairNo) {
            String asset = String.format("OB-%05d", index);
            int depotIndex = pick(new double[]{0.40, 0.35, 0.25});
            Depot depot = depots.get(depotIndex);
            String mechanic = "mechanic" + (depotIndex * 4 + 1 + random.nextInt(4));
            double depth = Math.round((10 + 80 * Math.pow(random.nextDouble(), 1.3)) * 10) / 10.0;
            Model model = depth < 30 ? models.get(0) : depth < 50 ? models.get(random.nextDouble() < 0.5 ? 0 : 1)
                    : depth < 60 ? models.get(random.nextDouble() < 0.5 ? 1 : 2) : models.get(2);
            if (model.code().equals("TL-1") && depth > 40) {
                model = models.get(1);
            }
            LocalDate installed = random.nextDouble() < 0.85
                    ? LocalDate.of(2008, 1, 1).plusDays(random.nextInt((int) ChronoUnit.DAYS.between(LocalDate.of(2008, 1, 1), HISTORY_START)))
                    : HISTORY_START.plusDays(random.nextInt((int) ChronoUnit.DAYS.between(HISTORY_START, LocalDate.of(2026, 6, 30))));
            LocalDate decommissioned = random.nextDouble() < 0.02 ? HISTORY_START.plusDays(365 + random.nextInt(1500)) : null;
            if (decommissioned != null && !decommissioned.isAfter(installed)) {
                decommissioned = null;
            }
            // Daily load: log-normal around the 5 h/day design load, 0.5 to 12 h.
            double baseHours = Math.min(12, Math.max(0.5, 5 * Math.exp(0.45 * gaussian())));
            double lat = depot.lat() + 0.35 * gaussian(), lon = depot.lon() + 0.35 * gaussian();
            double currentHours = baseHours;
            // A pump installed within the records starts its service clock at zero, as the service assumes. One
            // installed before them has run an unknown time: its clock is at a random phase, which is what the
            // service assumes of a pump with no service on record (uniform place in the cycle). The draw is made
            // either way so that the rest of the programme stays the same stream.
            double phase = random.nextDouble() * SERVICE_INTERVAL_HOURS;
            double hoursSinceService = installed.isBefore(HISTORY_START) ? phase : 0;
            LocalDate month = HISTORY_START.isAfter(installed) ? HISTORY_START : installed.withDayOfMonth(1);
            double quarterHours = baseHours;
            boolean firstMonth = true;
            while (!month.isAfter(HISTORY_END) && (decommissioned == null || month.isBefore(decommissioned))) {
                LocalDate from = month.isBefore(installed) ? installed : month;
                LocalDate to = month.plusMonths(1);
                if (decommissioned != null && decommissioned.isBefore(to)) {
                    to = decommissioned;
                }
                if (month.getMonthValue() % 3 == 0 || firstMonth) {
                    firstMonth = false;
                    quarterHours = Math.round(Math.min(14, Math.max(0.2, baseHours * Math.exp(0.12 * gaussian()))) * 100) / 100.0;
                    LocalDate readOn = from.plusDays(random.nextInt(Math.max(1, (int) ChronoUnit.DAYS.between(from, to))));
                    usage.printf(Locale.ROOT, "%s,%s,%.2f,%s%n", asset, readOn, quarterHours, random.nextDouble() < 0.6 ? "MEASURED" : "SURVEYED");
                    currentHours = quarterHours;
                }
                long days = ChronoUnit.DAYS.between(from, to);
                double exposure = days * quarterHours;
                double ageYears = ChronoUnit.DAYS.between(installed, from.plusDays(days / 2)) / 365.25;
                for (Rate rate : RATES) {
                    int events = poisson(rate.perHour(depth, ageYears) * exposure);
                    for (int e = 0; e < events; e++) {
                        repairNo++;
                        LocalDate reported = from.plusDays(random.nextInt((int) Math.max(1, days)));
                        writeRepair(repairs, repairNo, asset, mechanic, "BREAKDOWN", reported, model,
                                Map.of(rate.family(), rate.unitsPerEvent()), rate.family().toLowerCase(Locale.ROOT).replace('_', ' ') + " worn or broken");
                    }
                }
                hoursSinceService += exposure;
                if (hoursSinceService >= SERVICE_INTERVAL_HOURS) {
                    hoursSinceService -= SERVICE_INTERVAL_HOURS;
                    repairNo++;
                    Map<String, Integer> kit = new LinkedHashMap<>();
                    kit.put("CUP_SEAL", 2);
                    kit.put("O_RING", 1);
                    kit.put("BEARING", 4);
                    kit.put("FULCRUM_PIN", 1);
                    kit.put("HANGER_PIN", 1);
                    kit.put("ROD_CENTRALISER", (int) Math.ceil(depth * 0.1667 - 1e-9));
                    writeRepair(repairs, repairNo, asset, mechanic, "PREVENTIVE", from.plusDays(random.nextInt((int) Math.max(1, days))),
                            model, kit, "scheduled service at " + SERVICE_INTERVAL_HOURS + " h");
                }
                month = month.plusMonths(1).withDayOfMonth(1);
            }
            String status = decommissioned != null ? "DECOMMISSIONED" : random.nextDouble() < 0.04 ? "BROKEN" : "WORKING";
            String since = decommissioned != null ? decommissioned.toString()
                    : status.equals("BROKEN") ? HISTORY_END.minusDays(random.nextInt(40)).toString() : "";
            pumps.printf(Locale.ROOT, "%s,%s,%.1f,%s,%.6f,%.6f,%s,%s,%s,%s,%.2f,%s%n", asset, model.code(), depth, installed,
                    lat, lon, depot.code(), mechanic, status, since, currentHours, "MEASURED");
            return repairNo;
        }

        void writeRepair(PrintWriter w, int no, String asset, String mechanic, String kind, LocalDate reported, Model model,
                         Map<String, Integer> unitsByFamily, String fault) {
            if (reported.isAfter(HISTORY_END)) {
                reported = HISTORY_END;
            }
            LocalDate diagnosed = reported.plusDays(random.nextInt(kind.equals("PREVENTIVE") ? 1 : 6));
            // About a third of breakdowns wait for parts: the part was neither in the kit nor at the depot.
            int wait = kind.equals("BREAKDOWN") && random.nextDouble() < 0.33 ? 3 + random.nextInt(40) : 0;
            LocalDate available = diagnosed.plusDays(wait);
            LocalDate fixed = available.plusDays(random.nextInt(3));
            String ref = String.format("R%06d", no);
            for (Map.Entry<String, Integer> e : unitsByFamily.entrySet()) {
                String part = model.partByFamily().get(e.getKey());
                // Steps not yet reached by the end of the history stay blank: the repair is still open.
                w.printf("%s,%s,%s,%s,%s,%s,%s,%s,%s,%s,%d%n", ref, asset, mechanic, kind, reported, upToEnd(diagnosed),
                        upToEnd(available), upToEnd(fixed), fault, part, e.getValue());
            }
        }

        static String upToEnd(LocalDate date) {
            return date.isAfter(HISTORY_END) ? "" : date.toString();
        }

        int pick(double[] shares) {
            double u = random.nextDouble(), sum = 0;
            for (int i = 0; i < shares.length; i++) {
                sum += shares[i];
                if (u < sum) {
                    return i;
                }
            }
            return shares.length - 1;
        }

        double gaussian() {
            // Box-Muller from the seeded generator, so output does not depend on the JDK's nextGaussian.
            double u1 = 1 - random.nextDouble(), u2 = random.nextDouble();
            return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
        }

        /** Knuth's multiplication method; means here are far below 1 per pump-month. */
        int poisson(double mean) {
            double limit = Math.exp(-mean), product = random.nextDouble();
            int count = 0;
            while (product > limit) {
                count++;
                product *= random.nextDouble();
            }
            return count;
        }
    }

    static void writeOpeningStockAndOrders(Path out, SplittableRandom random, List<PartRow> parts, List<Depot> depots)
            throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("opening-stock.csv")))) {
            w.println("location_code,part_number,quantity,counted_on");
            for (PartRow p : parts) {
                int central = (int) Math.round(p.pack() * (1 + random.nextInt(6)) * (p.cost() > 30 ? 0.5 : 1.0));
                w.printf("CENTRAL,%s,%d,%s%n", p.number(), Math.max(1, central), COUNTED_ON);
            }
            for (Depot d : depots) {
                for (PartRow p : parts) {
                    // Uneven on purpose: some depots sit on slow movers while others run short.
                    int qty = random.nextDouble() < 0.15 ? 0 : (int) Math.round(p.pack() * random.nextDouble() * 3);
                    if (qty > 0) {
                        w.printf("%s,%s,%d,%s%n", d.code(), p.number(), qty, COUNTED_ON);
                    }
                }
            }
            String[] kitParts = {"OB-CS-50", "OB-CS-63", "OB-OR-SET", "OB-BR-20", "OB-FP-20", "OB-HP-20"};
            for (int m = 1; m <= 12; m++) {
                for (String part : kitParts) {
                    int qty = random.nextInt(5);
                    if (qty > 0) {
                        w.printf("KIT-M%02d,%s,%d,%s%n", m, part, qty, COUNTED_ON);
                    }
                }
            }
        }
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(out.resolve("purchase-orders.csv")))) {
            w.println("order_number,supplier,destination_code,ordered_on,expected_on,part_number,quantity");
            w.println("PO-2026-031,Veyra Polymers,CENTRAL,2026-10-20,2026-12-04,OB-CS-50,200");
            w.println("PO-2026-031,Veyra Polymers,CENTRAL,2026-10-20,2026-12-04,OB-CS-63,100");
            w.println("PO-2026-031,Veyra Polymers,CENTRAL,2026-10-20,2026-12-04,OB-OR-SET,50");
            w.println("PO-2026-034,Tolvery Castings,CENTRAL,2026-11-02,2027-01-31,OB-FV-50,20");
            w.println("PO-2026-034,Tolvery Castings,CENTRAL,2026-11-02,2027-01-31,OB-PL-50,10");
            w.println("PO-2026-036,Ostrevane Steel Supply,DEP-MARROWFORD,2026-11-15,2027-03-15,OB-ROD-16,30");
        }
    }
}
