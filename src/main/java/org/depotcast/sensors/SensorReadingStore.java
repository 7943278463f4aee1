package org.depotcast.sensors;

import io.agroal.api.AgroalDataSource;
import jakarta.enterprise.context.ApplicationScoped;

import java.math.BigDecimal;
import java.sql.Array;
import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The daily and monthly sensor tables through plain JDBC: intake writes hundreds of thousands of rows a file, which
 * entities would hold in memory and write one statement each. Writes are multi-row upserts (H2 {@code MERGE INTO …
 * KEY}, PostgreSQL {@code INSERT … ON CONFLICT}), so sending a day again can never make a second row. The connection
 * is the caller's transaction's (Agroal enlists it), so the audit entries written through JPA commit with the rows.
 */
@ApplicationScoped
class SensorReadingStore {
    /** Rows per multi-row statement: 3 parameters each, well under both databases' parameter limits. */
    static final int ROWS_PER_STATEMENT = 500;

    /** A day's reading to write, and the month delta it makes (hundredths of an hour, days newly covered). */
    record DayWrite(long pumpId, LocalDate day, int hundredths) {
    }

    record MonthDelta(long pumpId, LocalDate monthStart, long hundredths, int days) {
    }

    private final AgroalDataSource dataSource;
    private volatile Boolean postgres;

    SensorReadingStore(AgroalDataSource dataSource) {
        this.dataSource = dataSource;
    }

    static long key(long pumpId, LocalDate day) {
        return (pumpId << 20) | day.toEpochDay();
    }

    /** Hours already held (hundredths) for the given keys, read by pump and the chunk's span of days. */
    Map<Long, Integer> held(Collection<Long> pumpIds, LocalDate from, LocalDate to, java.util.Set<Long> keys)
            throws SQLException {
        Map<Long, Integer> held = new HashMap<>();
        try (Connection c = dataSource.getConnection(); PreparedStatement s = c.prepareStatement(
                "select pump_id, read_on, hours from sensor_daily_usage where pump_id = any(?) and read_on between ? and ?")) {
            Array ids = c.createArrayOf("BIGINT", pumpIds.toArray(new Long[0]));
            s.setArray(1, ids);
            s.setDate(2, Date.valueOf(from));
            s.setDate(3, Date.valueOf(to));
            try (ResultSet r = s.executeQuery()) {
                while (r.next()) {
                    long key = key(r.getLong(1), r.getDate(2).toLocalDate());
                    // Only the chunk's own days are kept, so memory stays bounded by the chunk.
                    if (keys.contains(key)) {
                        held.put(key, r.getBigDecimal(3).movePointRight(2).intValueExact());
                    }
                }
            }
        }
        return held;
    }

    void writeDays(List<DayWrite> days) throws SQLException {
        if (days.isEmpty()) {
            return;
        }
        try (Connection c = dataSource.getConnection()) {
            boolean pg = isPostgres(c);
            for (int from = 0; from < days.size(); from += ROWS_PER_STATEMENT) {
                List<DayWrite> part = days.subList(from, Math.min(days.size(), from + ROWS_PER_STATEMENT));
                try (PreparedStatement s = c.prepareStatement(upsertDays(pg, part.size()))) {
                    int i = 1;
                    for (DayWrite d : part) {
                        s.setLong(i++, d.pumpId());
                        s.setDate(i++, Date.valueOf(d.day()));
                        s.setBigDecimal(i++, BigDecimal.valueOf(d.hundredths(), 2));
                    }
                    s.executeUpdate();
                }
            }
        }
    }

    /** Adds the deltas to the monthly sums: the roll-up stays the sum of its days without reading them again. */
    void addToMonths(Collection<MonthDelta> deltas) throws SQLException {
        if (deltas.isEmpty()) {
            return;
        }
        try (Connection c = dataSource.getConnection();
             PreparedStatement s = c.prepareStatement(isPostgres(c) ? """
                     insert into sensor_monthly_usage (pump_id, month_start, hours, days_covered) values (?, ?, ?, ?)
                     on conflict (pump_id, month_start) do update
                     set hours = sensor_monthly_usage.hours + excluded.hours,
                         days_covered = sensor_monthly_usage.days_covered + excluded.days_covered""" : """
                     merge into sensor_monthly_usage m
                     using (values (cast(? as bigint), cast(? as date), cast(? as numeric(9, 2)), cast(? as integer)))
                         as d(pump_id, month_start, hours, days_covered)
                     on m.pump_id = d.pump_id and m.month_start = d.month_start
                     when matched then update set hours = m.hours + d.hours, days_covered = m.days_covered + d.days_covered
                     when not matched then insert (pump_id, month_start, hours, days_covered)
                         values (d.pump_id, d.month_start, d.hours, d.days_covered)""")) {
            for (MonthDelta d : deltas) {
                s.setLong(1, d.pumpId());
                s.setDate(2, Date.valueOf(d.monthStart()));
                s.setBigDecimal(3, BigDecimal.valueOf(d.hundredths(), 2));
                s.setInt(4, d.days());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    private static String upsertDays(boolean pg, int rows) {
        StringBuilder sql = new StringBuilder(pg ? "insert into sensor_daily_usage (pump_id, read_on, hours) values "
                : "merge into sensor_daily_usage (pump_id, read_on, hours) key (pump_id, read_on) values ");
        for (int i = 0; i < rows; i++) {
            sql.append(i == 0 ? "(?, ?, ?)" : ", (?, ?, ?)");
        }
        if (pg) {
            sql.append(" on conflict (pump_id, read_on) do update set hours = excluded.hours");
        }
        return sql.toString();
    }

    private boolean isPostgres(Connection c) throws SQLException {
        if (postgres == null) {
            postgres = c.getMetaData().getDatabaseProductName().toLowerCase(java.util.Locale.ROOT).contains("postgres");
        }
        return postgres;
    }
}
