package org.depotcast.benchmark;

import io.agroal.api.AgroalDataSource;
import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRun;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicLong;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Issue 3 figure: full forecast recomputation for a programme 40 times the demo (48,000 pumps, 120 parts in 10 pump
 * models, 40 depots, 400 kits, six years of history) including reading the history from H2. Target: under 30 s and
 * under 1 GiB of heap. The data are written straight through JDBC (setup, not measured); usage readings are yearly
 * here rather than quarterly to keep the setup short.
 */
@QuarkusTest
@TestProfile(ScaleProfile.class)
class ScaleBenchmark {
    private static final int DEPOTS = 40, KITS_PER_DEPOT = 10, MODELS = 10, PUMPS = 48_000;
    private static final String[] FAMILIES = {"CUP_SEAL", "O_RING", "PLUNGER", "FOOT_VALVE", "PUMP_ROD", "RISING_MAIN",
            "ROD_CENTRALISER", "BEARING", "FULCRUM_PIN", "HANGER_PIN", "HANDLE", "CYLINDER"};
    private static final double[] RATE_PER_1000H = {0.2, 0.06, 0.03, 0.035, 0.02, 0.02, 0.025, 0.05, 0.015, 0.015, 0.006, 0.006};

    @Inject
    AgroalDataSource dataSource;
    @Inject
    ForecastRunService runs;
    @Inject
    org.depotcast.planning.AlertService alertService;
    @Inject
    org.depotcast.planning.PurchasePlanService purchasePlans;
    @Inject
    org.depotcast.planning.TransferService transfers;
    @Inject
    org.depotcast.spend.SpendService spend;
    @Inject
    org.depotcast.spend.SpendScenarioService spendScenarios;
    @Inject
    org.depotcast.access.SystemWork system;

    @Test
    void fullRecomputationAtFortyTimesTheDemo() throws Exception {
        long setup = System.nanoTime();
        int[] counts = populate();
        Figures.report(String.format("scale data written in %.0f s: %d pumps, %d repairs, %d usage readings",
                (System.nanoTime() - setup) / 1e9, PUMPS, counts[0], counts[1]));
        MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
        System.gc();
        long baseline = memory.getHeapMemoryUsage().getUsed();
        AtomicLong peak = new AtomicLong(baseline);
        Thread sampler = new Thread(() -> {
            while (!Thread.currentThread().isInterrupted()) {
                peak.accumulateAndGet(memory.getHeapMemoryUsage().getUsed(), Math::max);
                try {
                    Thread.sleep(20);
                } catch (InterruptedException e) {
                    return;
                }
            }
        });
        sampler.setDaemon(true);
        sampler.start();
        long start = System.nanoTime();
        double cpuStart = Figures.processCpuSeconds();
        ForecastRun run = runs.runNow("benchmark", LocalDate.of(2026, 12, 2));
        double seconds = (System.nanoTime() - start) / 1e9;
        double cpu = Figures.processCpuSeconds() - cpuStart;
        sampler.interrupt();
        assertEquals(ForecastRun.Status.DONE, run.status, run.message);
        long liveAfterGc = 0;
        for (var pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == java.lang.management.MemoryType.HEAP && pool.getCollectionUsage() != null) {
                liveAfterGc += pool.getCollectionUsage().getUsed();
            }
        }
        Figures.report(String.format("full recomputation at 40x the demo: %.1f s (%.1f s of processor time) for %d series, JVM limited to -Xmx%d MiB; "
                        + "heap in use peaked at %.0f MiB (sampled every 20 ms, garbage included, database cache included), "
                        + "%.0f MiB live after the last collection",
                seconds, cpu, run.seriesTotal, Runtime.getRuntime().maxMemory() / 1048576, peak.get() / 1048576.0,
                liveAfterGc / 1048576.0));

        // Issue 4 figure: a full programme plan at the same scale (alerts everywhere, a purchase plan, transfers).
        double[] planSeconds = new double[3], planCpu = new double[3];
        int alerts = 0, suggestions = 0, lines = 0;
        for (int round = 0; round < planSeconds.length; round++) {
            long planStart = System.nanoTime();
            double planCpuStart = Figures.processCpuSeconds();
            // Called directly, with no one signed in: the programme-wide view is the system's.
            alerts = system.call("benchmark", () -> alertService.alerts(null, null, false).size());
            lines = system.call("benchmark", () -> purchasePlans.propose(new java.math.BigDecimal("250000"),
                    LocalDate.of(2026, 12, 2)).lines().size());
            suggestions = system.call("benchmark", () -> transfers.suggest(null).size());
            planSeconds[round] = (System.nanoTime() - planStart) / 1e9;
            planCpu[round] = Figures.processCpuSeconds() - planCpuStart;
        }
        Figures.report(String.format("full programme plan at 40x the demo (alerts for %d depots and the central store, "
                        + "purchase plan, transfer LPs for 120 parts): median %.1f s (%.1f s of processor time) over 3 rounds; %d alerts, %d plan lines, "
                        + "%d transfer suggestions", DEPOTS, Figures.median(planSeconds), Figures.median(planCpu), alerts, lines, suggestions));

        // Issue 6 figure: a 5-year projection with 10,000 Monte Carlo draws at the same scale.
        long scenario = system.call("benchmark", () -> spendScenarios.save(new org.depotcast.spend.ScenarioDefinition(
                "scale five years", 5, null, 2.0, null, 5.0, null, null, null, 10_000, 42L)).id);
        double[] spendSeconds = new double[3], spendCpu = new double[3];
        for (int round = 0; round < spendSeconds.length; round++) {
            long spendStart = System.nanoTime();
            double spendCpuStart = Figures.processCpuSeconds();
            var spendRun = system.call("benchmark", () -> spend.runNow(scenario));
            spendSeconds[round] = (System.nanoTime() - spendStart) / 1e9;
            spendCpu[round] = Figures.processCpuSeconds() - spendCpuStart;
            assertEquals(org.depotcast.spend.SpendRun.Status.DONE, spendRun.status, spendRun.message);
        }
        Figures.report(String.format("5-year spend projection at 40x the demo, 10,000 draws: median %.1f s (%.1f s of processor time) over 3 rounds",
                Figures.median(spendSeconds), Figures.median(spendCpu)));
    }

    private int[] populate() throws SQLException {
        SplittableRandom random = new SplittableRandom(40);
        try (Connection c = dataSource.getConnection()) {
            c.setAutoCommit(false);
            exec(c, "insert into location (id, code, name, kind) values (2, 'CENTRAL', 'Central store', 'CENTRAL_STORE')");
            try (PreparedStatement depot = c.prepareStatement("insert into location (id, code, name, kind, parent_id, mechanic_username, latitude, longitude) values (?, ?, ?, ?, ?, ?, ?, ?)")) {
                for (int d = 0; d < DEPOTS; d++) {
                    long depotId = 100 + d;
                    depot.setLong(1, depotId);
                    depot.setString(2, "D" + d);
                    depot.setString(3, "Depot " + d);
                    depot.setString(4, "DEPOT");
                    depot.setLong(5, 2);
                    depot.setString(6, null);
                    depot.setDouble(7, -2 + 4 * random(d, 1));
                    depot.setDouble(8, 1 + 4 * random(d, 2));
                    depot.addBatch();
                    for (int k = 0; k < KITS_PER_DEPOT; k++) {
                        depot.setLong(1, 1000 + d * KITS_PER_DEPOT + k);
                        depot.setString(2, "K" + d + "-" + k);
                        depot.setString(3, "Kit");
                        depot.setString(4, "KIT");
                        depot.setLong(5, depotId);
                        depot.setString(6, "m" + d + "-" + k);
                        depot.setNull(7, java.sql.Types.NUMERIC);
                        depot.setNull(8, java.sql.Types.NUMERIC);
                        depot.addBatch();
                    }
                }
                depot.executeBatch();
            }
            try (PreparedStatement part = c.prepareStatement("insert into part (id, part_number, description, family, unit_of_issue, pack_size, min_order_qty, unit_cost, currency, supplier, lead_time_days) values (?, ?, 'scale part', ?, 'EACH', 1, 1, 5.00, 'USD', 'S', 60)");
                 PreparedStatement model = c.prepareStatement("insert into pump_model (id, code, name, service_interval_hours) values (?, ?, 'Scale model', 9125)");
                 PreparedStatement bom = c.prepareStatement("insert into bom_line (pump_model_id, part_id, basis, quantity, service_kit_quantity) values (?, ?, 'PER_PUMP', 1, ?)")) {
                for (int m = 0; m < MODELS; m++) {
                    model.setLong(1, m + 1);
                    model.setString(2, "M" + m);
                    model.addBatch();
                    for (int f = 0; f < FAMILIES.length; f++) {
                        long partId = m * FAMILIES.length + f + 1;
                        part.setLong(1, partId);
                        part.setString(2, "P" + partId);
                        part.setString(3, FAMILIES[f]);
                        part.addBatch();
                        bom.setLong(1, m + 1);
                        bom.setLong(2, partId);
                        bom.setInt(3, f < 2 || f == 7 ? 1 : 0);
                        bom.addBatch();
                    }
                }
                model.executeBatch();
                part.executeBatch();
                bom.executeBatch();
            }
            int[] written = writeFleet(c, random);
            writeOpeningStock(c, random);
            c.commit();
            return written;
        }
    }

    private int[] writeFleet(Connection c, SplittableRandom random) throws SQLException {
        LocalDate historyStart = LocalDate.of(2020, 12, 1);
        int repairs = 0, readings = 0;
        try (PreparedStatement pump = c.prepareStatement("insert into pump (id, asset_id, pump_model_id, depth_m, installed_on, depot_id, assigned_mechanic, status, usage_hours_per_day, usage_source) values (?, ?, ?, ?, ?, ?, ?, 'WORKING', ?, 'MEASURED')");
             PreparedStatement usage = c.prepareStatement("insert into usage_reading (pump_id, read_on, hours_per_day, source) values (?, ?, ?, 'MEASURED')");
             PreparedStatement repair = c.prepareStatement("insert into repair (id, repair_ref, pump_id, mechanic, kind, reported_on, fixed_on, ledger_posted) values (?, ?, ?, ?, 'BREAKDOWN', ?, ?, false)");
             PreparedStatement line = c.prepareStatement("insert into repair_line (repair_id, part_id, quantity) values (?, ?, 1)")) {
            for (int p = 1; p <= PUMPS; p++) {
                int depot = random.nextInt(DEPOTS);
                int modelIndex = random.nextInt(MODELS);
                double depth = 10 + 80 * random.nextDouble();
                double hours = Math.max(0.5, Math.min(12, 5 * Math.exp(0.45 * (random.nextDouble() * 2 - 1))));
                LocalDate installed = LocalDate.of(2008, 1, 1).plusDays(random.nextInt(4700));
                pump.setLong(1, p);
                pump.setString(2, "S" + p);
                pump.setLong(3, modelIndex + 1);
                pump.setDouble(4, Math.round(depth * 10) / 10.0);
                pump.setDate(5, Date.valueOf(installed));
                pump.setLong(6, 100 + depot);
                String mechanic = "m" + depot + "-" + random.nextInt(KITS_PER_DEPOT);
                pump.setString(7, mechanic);
                pump.setDouble(8, Math.round(hours * 100) / 100.0);
                pump.addBatch();
                for (int year = 0; year < 6; year++) {
                    usage.setLong(1, p);
                    usage.setDate(2, Date.valueOf(historyStart.plusYears(year).plusDays(random.nextInt(300))));
                    usage.setDouble(3, Math.round(hours * 100) / 100.0);
                    usage.addBatch();
                    readings++;
                    for (int f = 0; f < FAMILIES.length; f++) {
                        double mean = RATE_PER_1000H[f] / 1000 * hours * 365 * Math.sqrt(depth / 30);
                        for (int e = poisson(random, mean); e > 0; e--) {
                            repairs++;
                            LocalDate day = historyStart.plusYears(year).plusDays(random.nextInt(365));
                            repair.setLong(1, repairs);
                            repair.setString(2, "SR" + repairs);
                            repair.setLong(3, p);
                            repair.setString(4, mechanic);
                            repair.setDate(5, Date.valueOf(day));
                            repair.setDate(6, Date.valueOf(day.plusDays(random.nextInt(5))));
                            repair.addBatch();
                            line.setLong(1, repairs);
                            line.setLong(2, modelIndex * FAMILIES.length + f + 1);
                            line.addBatch();
                        }
                    }
                }
                if (p % 2000 == 0) {
                    pump.executeBatch();
                    usage.executeBatch();
                    repair.executeBatch();
                    line.executeBatch();
                }
            }
            pump.executeBatch();
            usage.executeBatch();
            repair.executeBatch();
            line.executeBatch();
        }
        return new int[]{repairs, readings};
    }

    /** Uneven opening stock at every depot and the central store, as balance rows and the count movements behind them. */
    private void writeOpeningStock(Connection c, SplittableRandom random) throws SQLException {
        try (PreparedStatement balance = c.prepareStatement("insert into stock_balance (part_id, location_id, on_hand) values (?, ?, ?)");
             PreparedStatement movement = c.prepareStatement("insert into stock_movement (kind, part_id, to_location_id, quantity, occurred_at, recorded_at, actor, reason) values ('COUNT_ADJUSTMENT', ?, ?, ?, current_timestamp, current_timestamp, 'benchmark', 'opening count')")) {
            long parts = (long) MODELS * FAMILIES.length;
            for (long part = 1; part <= parts; part++) {
                for (int d = -1; d < DEPOTS; d++) {
                    long location = d < 0 ? 2 : 100 + d;
                    int quantity = random.nextDouble() < 0.2 ? 0 : random.nextInt(d < 0 ? 400 : 40);
                    if (quantity == 0) {
                        continue;
                    }
                    balance.setLong(1, part);
                    balance.setLong(2, location);
                    balance.setInt(3, quantity);
                    balance.addBatch();
                    movement.setLong(1, part);
                    movement.setLong(2, location);
                    movement.setInt(3, quantity);
                    movement.addBatch();
                }
            }
            balance.executeBatch();
            movement.executeBatch();
        }
    }

    /** A fixed pseudo-random coordinate in [0, 1) per depot, independent of the data generator's stream. */
    private static double random(int depot, int axis) {
        return new SplittableRandom(depot * 31L + axis).nextDouble();
    }

    private static int poisson(SplittableRandom random, double mean) {
        double limit = Math.exp(-mean), product = random.nextDouble();
        int count = 0;
        while (product > limit) {
            count++;
            product *= random.nextDouble();
        }
        return count;
    }

    private static void exec(Connection c, String sql) throws SQLException {
        try (var statement = c.createStatement()) {
            statement.execute(sql);
        }
    }
}
