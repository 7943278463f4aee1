package org.depotcast.sensors;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.runtime.StartupEvent;
import jakarta.annotation.Priority;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.depotcast.access.SystemWork;
import org.depotcast.common.DateBounds;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpStatus;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.fleet.RepairRecords;
import org.depotcast.fleet.RepairSpan;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Demo mode: after the demo programme is loaded, gives about 40 % of its pumps a year of daily sensor readings up to
 * yesterday, made from each pump's recorded load and its recorded breakdowns ({@link DemoSensorSeries}), seeded so
 * every first start makes the same readings. Written as whole pump-months straight through the store (a few
 * thousand rows), then judged for stops once. One steady pump per depot ends the year with a stop nobody has reported
 * yet ({@value #UNREPORTED_STOP_DAYS} days of near-nothing use), so the demo shows pumps probably down.
 */
@ApplicationScoped
class DemoSensorReadings {
    static final long SEED = 14;
    static final int DAYS = 365;
    /** Days of near-nothing use at the end of the year for the one pump per depot whose stop nobody reported yet. */
    static final int UNREPORTED_STOP_DAYS = 3;

    private final PumpQueryService pumps;
    private final RepairRecords repairs;
    private final SensorReadingStore store;
    private final SensorUsageQuery usage;
    private final StopFlagService flags;
    private final SystemWork system;
    private final String mode;

    DemoSensorReadings(PumpQueryService pumps, RepairRecords repairs, SensorReadingStore store, SensorUsageQuery usage,
                       StopFlagService flags, SystemWork system, @ConfigProperty(name = "depotcast.mode") String mode) {
        this.pumps = pumps;
        this.repairs = repairs;
        this.store = store;
        this.usage = usage;
        this.flags = flags;
        this.system = system;
        this.mode = mode;
    }

    /** After the demo loader (priority 20). */
    void load(@Observes @Priority(30) StartupEvent event) {
        if ("demo".equals(mode)) {
            system.run("demo-sensors", this::loadIfEmpty);
        }
    }

    private void loadIfEmpty() {
        LocalDate lastDay = DateBounds.today().minusDays(1);
        if (!usage.pumpsReadSince(LocalDate.of(1900, 1, 1)).isEmpty()) {
            return;
        }
        long started = System.nanoTime();
        int months = QuarkusTransaction.requiringNew().timeout(600).call(() -> write(lastDay));
        if (months > 0) {
            int probablyDown = flags.refreshAll(lastDay);
            Log.infof("demo sensor readings: %d pump-months in %d ms; %d pumps probably down", months,
                    (System.nanoTime() - started) / 1_000_000, probablyDown);
        }
    }

    private int write(LocalDate lastDay) throws SQLException {
        LocalDate firstDay = lastDay.minusDays(DAYS - 1L);
        Map<Long, List<RepairSpan>> breakdowns = repairs.breakdownsReportedSince(firstDay.minusDays(60));
        Map<Long, MonthDays> months = new LinkedHashMap<>();
        java.util.Set<String> depotsWithUnreportedStop = new java.util.HashSet<>();
        List<PumpSummary> all = new ArrayList<>(pumps.all());
        all.sort(java.util.Comparator.comparing(PumpSummary::assetId));
        for (PumpSummary pump : all) {
            if (pump.status() == PumpStatus.DECOMMISSIONED || !DemoSensorSeries.hasSensor(pump.assetId(), SEED)) {
                continue;
            }
            List<RepairSpan> spans = breakdowns.getOrDefault(pump.id(), List.of());
            List<DemoSensorSeries.Stop> stops = new ArrayList<>();
            for (RepairSpan r : spans) {
                stops.add(new DemoSensorSeries.Stop(r.reportedOn(), r.fixedOn()));
            }
            double[] hours = DemoSensorSeries.of(pump.assetId(), SEED, pump.usageHoursPerDay().doubleValue(),
                    firstDay, DAYS, stops).hours();
            if (quietLately(pump, spans, lastDay, firstDay) && depotsWithUnreportedStop.add(pump.depotCode())) {
                stopUnreported(hours);
            }
            for (int d = 0; d < DAYS; d++) {
                LocalDate day = firstDay.plusDays(d);
                if (Double.isNaN(hours[d]) || day.isBefore(pump.installedOn())) {
                    continue;
                }
                LocalDate month = day.withDayOfMonth(1);
                months.computeIfAbsent(SensorReadingStore.key(pump.id(), month), k -> MonthDays.empty(month))
                        .set(day, (int) Math.round(hours[d] * 100));
            }
        }
        store.write(new ArrayList<>(months.entrySet()));
        return months.size();
    }

    /**
     * Every recorded breakdown is reported, so without this the demo would show no pump probably down: a working
     * pump in steady use for the whole year, with no breakdown in its last 60 days, is one that may stop unseen.
     */
    private static boolean quietLately(PumpSummary pump, List<RepairSpan> breakdowns, LocalDate lastDay,
                                       LocalDate firstDay) {
        LocalDate recent = lastDay.minusDays(60);
        return pump.status() == PumpStatus.WORKING && pump.installedOn().isBefore(firstDay)
                && pump.usageHoursPerDay().doubleValue() >= 4
                && breakdowns.stream().noneMatch(r -> r.fixedOn() == null || r.fixedOn().isAfter(recent));
    }

    /** Use near nothing on the last days, as the planted breakdowns look, with no repair reported. */
    private static void stopUnreported(double[] hours) {
        for (int d = DAYS - UNREPORTED_STOP_DAYS; d < DAYS; d++) {
            hours[d] = d % 2 == 0 ? 0 : 0.05;
        }
    }
}
