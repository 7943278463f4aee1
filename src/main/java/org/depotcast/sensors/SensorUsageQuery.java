package org.depotcast.sensors;

import io.agroal.api.AgroalDataSource;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.core.sensors.ServiceByHours;

import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Measured operating hours for other features (the fleet model's usage, the preventive schedule, spend): read from
 * the monthly roll-up only, never the daily table. Programme-wide reads without an access check: callers are
 * planning runs that already see the whole programme; endpoints check the caller before using this.
 */
@ApplicationScoped
public class SensorUsageQuery implements org.depotcast.fleet.MeasuredLoads {
    /** Fewer days read in a month than this and the month gives no measured load (the estimate stands). */
    public static final int LEAST_DAYS_IN_A_MONTH = 7;
    /** Whole months before the origin that make a pump's measured daily load. */
    public static final int USAGE_WINDOW_MONTHS = 3;
    /** Fewer days read than this in the window and the quarterly estimate stands (too little to measure a load). */
    public static final int LEAST_DAYS_FOR_A_LOAD = 14;

    private final AgroalDataSource dataSource;

    SensorUsageQuery(AgroalDataSource dataSource) {
        this.dataSource = dataSource;
    }

    /** The pump's months, oldest first. */
    public List<MonthlyOperatingHours> monthsOf(long pumpId) {
        List<MonthlyOperatingHours> months = new ArrayList<>();
        query("select pump_id, month_start, hours, days_covered from sensor_month where pump_id = ? "
                + "order by month_start", s -> s.setLong(1, pumpId), r -> months.add(month(r)));
        return months;
    }

    /** Each pump's measured load per month with at least {@link #LEAST_DAYS_IN_A_MONTH} days read. */
    @Override
    public List<org.depotcast.fleet.UsageReadingRow> monthlyLoads() {
        List<org.depotcast.fleet.UsageReadingRow> loads = new ArrayList<>();
        query("select pump_id, month_start, hours, days_covered from sensor_month where days_covered >= ? "
                + "order by pump_id, month_start", s -> s.setInt(1, LEAST_DAYS_IN_A_MONTH), r -> {
            MonthlyOperatingHours month = month(r);
            loads.add(new org.depotcast.fleet.UsageReadingRow(month.pumpId(), month.monthStart(),
                    java.math.BigDecimal.valueOf(month.hoursPerDayRead()).setScale(3, java.math.RoundingMode.HALF_UP)));
        });
        return loads;
    }

    /** Every pump's months in [from, to) (first days of months), for model runs. */
    public List<MonthlyOperatingHours> monthsBetween(LocalDate from, LocalDate to) {
        List<MonthlyOperatingHours> months = new ArrayList<>();
        query("select pump_id, month_start, hours, days_covered from sensor_month where month_start >= ? "
                + "and month_start < ? order by pump_id, month_start", s -> {
            s.setDate(1, Date.valueOf(from.withDayOfMonth(1)));
            s.setDate(2, Date.valueOf(to.withDayOfMonth(1)));
        }, r -> months.add(month(r)));
        return months;
    }

    /**
     * Per pump with at least {@link #LEAST_DAYS_FOR_A_LOAD} days read in the {@link #USAGE_WINDOW_MONTHS} whole months
     * before {@code origin}: measured hours per day over the days read. Pumps not in the map keep their estimate.
     */
    public Map<Long, MeasuredUsage> measuredUsageBefore(LocalDate origin) {
        return measuredUsage(origin, null);
    }

    /** One pump's measured usage as {@link #measuredUsageBefore}; null when it keeps its estimate. */
    public MeasuredUsage measuredUsageOf(long pumpId, LocalDate origin) {
        return measuredUsage(origin, pumpId).get(pumpId);
    }

    private Map<Long, MeasuredUsage> measuredUsage(LocalDate origin, Long pumpId) {
        LocalDate to = origin.withDayOfMonth(1);
        LocalDate from = to.minusMonths(USAGE_WINDOW_MONTHS);
        Map<Long, MeasuredUsage> usage = new HashMap<>();
        query("select pump_id, sum(hours), sum(days_covered) from sensor_month where month_start >= ? "
                + "and month_start < ?" + (pumpId == null ? "" : " and pump_id = ?") + " group by pump_id", s -> {
            s.setDate(1, Date.valueOf(from));
            s.setDate(2, Date.valueOf(to));
            if (pumpId != null) {
                s.setLong(3, pumpId);
            }
        }, r -> {
            int days = r.getInt(3);
            if (days >= LEAST_DAYS_FOR_A_LOAD) {
                double hours = r.getBigDecimal(2).doubleValue();
                usage.put(r.getLong(1), new MeasuredUsage(r.getLong(1), hours / days, hours, days, from,
                        to.minusDays(1)));
            }
        });
        return usage;
    }

    /** Daily hours of one pump in [from, to]; days without a reading are absent. */
    public Map<LocalDate, Double> daysOf(long pumpId, LocalDate from, LocalDate to) {
        Map<LocalDate, Double> days = new HashMap<>();
        query("select month_start, day_hours from sensor_month where pump_id = ? and month_start between ? and ?", s -> {
            s.setLong(1, pumpId);
            s.setDate(2, Date.valueOf(from.withDayOfMonth(1)));
            s.setDate(3, Date.valueOf(to));
        }, r -> {
            MonthDays month = MonthDays.decode(r.getDate(1).toLocalDate(), r.getString(2));
            for (LocalDate day = month.monthStart(); day.getMonth() == month.monthStart().getMonth();
                 day = day.plusDays(1)) {
                int hundredths = month.get(day);
                if (hundredths != MonthDays.MISSING && !day.isBefore(from) && !day.isAfter(to)) {
                    days.put(day, hundredths / 100.0);
                }
            }
        });
        return days;
    }

    /**
     * Per pump, its last {@code days} days up to {@code lastDay}, oldest first, hours a day; NaN for a day with no
     * reading. Pumps with no month in that span are absent.
     */
    public Map<Long, double[]> windows(java.util.Collection<Long> pumpIds, LocalDate lastDay, int days) {
        LocalDate firstDay = lastDay.minusDays(days - 1L);
        Map<Long, double[]> windows = new HashMap<>();
        List<Long> ids = new ArrayList<>(pumpIds);
        for (int from = 0; from < ids.size(); from += 5_000) {
            List<Long> part = ids.subList(from, Math.min(ids.size(), from + 5_000));
            query("select pump_id, month_start, day_hours from sensor_month where "
                    + SensorReadingStore.pumpIdIn(part) + " and month_start between ? and ?", s -> {
                s.setDate(1, Date.valueOf(firstDay.withDayOfMonth(1)));
                s.setDate(2, Date.valueOf(lastDay.withDayOfMonth(1)));
            }, r -> {
                double[] window = windows.computeIfAbsent(r.getLong(1), k -> {
                    double[] empty = new double[days];
                    java.util.Arrays.fill(empty, Double.NaN);
                    return empty;
                });
                // Only the month's days inside the window are read, straight from the stored text: the stop check
                // reads the idle history of every pump judged, five or six months each.
                LocalDate monthStart = r.getDate(2).toLocalDate();
                String text = r.getString(3);
                int offset = (int) (monthStart.toEpochDay() - firstDay.toEpochDay());
                int last = Math.min(monthStart.lengthOfMonth(), days - offset);
                for (int d = Math.max(0, -offset); d < last; d++) {
                    int hundredths = MonthDays.hundredthsOn(text, d);
                    if (hundredths != MonthDays.MISSING) {
                        window[offset + d] = hundredths / 100.0;
                    }
                }
            });
        }
        return windows;
    }

    @Override
    public Map<Long, ServiceByHours.Measured> measuredSince(Map<Long, LocalDate> firstDays, LocalDate until,
                                                            int lastDaysKept) {
        Map<Long, double[]> totals = new HashMap<>();
        Map<Long, java.util.ArrayDeque<Double>> last = new HashMap<>();
        List<Long> ids = new ArrayList<>(firstDays.keySet());
        LocalDate earliest = firstDays.values().stream().min(LocalDate::compareTo).orElse(until);
        for (int from = 0; from < ids.size(); from += 5_000) {
            List<Long> part = ids.subList(from, Math.min(ids.size(), from + 5_000));
            query("select pump_id, month_start, day_hours from sensor_month where " + SensorReadingStore.pumpIdIn(part)
                    + " and month_start between ? and ? order by pump_id, month_start", s -> {
                s.setDate(1, Date.valueOf(earliest.withDayOfMonth(1)));
                s.setDate(2, Date.valueOf(until.withDayOfMonth(1)));
            }, r -> {
                long pumpId = r.getLong(1);
                LocalDate first = firstDays.get(pumpId);
                MonthDays month = MonthDays.decode(r.getDate(2).toLocalDate(), r.getString(3));
                double[] total = totals.computeIfAbsent(pumpId, k -> new double[2]);
                java.util.ArrayDeque<Double> kept = last.computeIfAbsent(pumpId, k -> new java.util.ArrayDeque<>());
                for (LocalDate day = month.monthStart(); day.getMonth() == month.monthStart().getMonth();
                     day = day.plusDays(1)) {
                    int hundredths = month.get(day);
                    // The span is the estimate's: the days before until (today counts in neither).
                    if (hundredths == MonthDays.MISSING || !day.isBefore(until)) {
                        continue;
                    }
                    if (!day.isBefore(first)) {
                        total[0] += hundredths / 100.0;
                        total[1]++;
                    }
                    kept.addLast(hundredths / 100.0);
                    if (kept.size() > lastDaysKept) {
                        kept.removeFirst();
                    }
                }
            });
        }
        Map<Long, ServiceByHours.Measured> read = new HashMap<>();
        totals.forEach((pumpId, t) -> read.put(pumpId, new ServiceByHours.Measured(t[0], (int) t[1],
                last.get(pumpId).stream().mapToDouble(Double::doubleValue).toArray())));
        return read;
    }

    /** Pumps with at least one month of readings from {@code fromMonth} on. */
    public List<Long> pumpsReadSince(LocalDate fromMonth) {
        List<Long> pumps = new ArrayList<>();
        query("select distinct pump_id from sensor_month where month_start >= ?",
                s -> s.setDate(1, Date.valueOf(fromMonth.withDayOfMonth(1))), r -> pumps.add(r.getLong(1)));
        return pumps;
    }

    private static MonthlyOperatingHours month(ResultSet r) throws SQLException {
        LocalDate start = r.getDate(2).toLocalDate();
        return new MonthlyOperatingHours(r.getLong(1), start, r.getBigDecimal(3), r.getInt(4), start.lengthOfMonth());
    }

    interface Binder {
        void bind(PreparedStatement s) throws SQLException;
    }

    interface RowReader {
        void read(ResultSet r) throws SQLException;
    }

    void query(String sql, Binder binder, RowReader reader) {
        try (Connection c = dataSource.getConnection(); PreparedStatement s = c.prepareStatement(sql)) {
            binder.bind(s);
            try (ResultSet r = s.executeQuery()) {
                while (r.next()) {
                    reader.read(r);
                }
            }
        } catch (SQLException e) {
            throw new IllegalStateException("sensor readings could not be read", e);
        }
    }

}
