package org.depotcast.sensors;

import io.agroal.api.AgroalDataSource;
import jakarta.enterprise.context.ApplicationScoped;

import org.postgresql.PGConnection;
import org.postgresql.copy.CopyIn;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The {@code sensor_month} table through plain JDBC: intake writes hundreds of thousands of readings a file, which
 * entities would hold in memory and write one statement each. Writes are upserts of whole pump-months with their
 * sum and days covered (H2: multi-row {@code MERGE INTO … KEY}; PostgreSQL: COPY into a staging table, then one
 * {@code INSERT … ON CONFLICT}), so a month can never hold two readings for a day nor a sum that disagrees with its
 * days. The connection is the caller's
 * transaction's (Agroal enlists it), so audit entries written through JPA commit with the rows.
 */
@ApplicationScoped
class SensorReadingStore {
    /** Pump-months per multi-row statement: 5 parameters each, well under both databases' parameter limits. */
    static final int ROWS_PER_STATEMENT = 400;
    /** Characters of COPY text sent at a time. */
    private static final int COPY_BUFFER_CHARS = 1 << 16;
    /** Pump ids per look-up query. */
    static final int IDS_PER_QUERY = 5_000;

    private final AgroalDataSource dataSource;
    private volatile Boolean postgres;

    SensorReadingStore(AgroalDataSource dataSource) {
        this.dataSource = dataSource;
    }

    /**
     * A key for a pump and the month of {@code day}: the month counted as year x 12 + month, which needs no epoch-day
     * arithmetic (that was a tenth of intake time) and spreads pumps and months over a hash table's buckets.
     */
    static long key(long pumpId, LocalDate day) {
        return (pumpId << 20) | (day.getYear() * 12L + day.getMonthValue() - 1);
    }

    /** The months held for the given keys (pump and month start), read by pump and the span of months. */
    Map<Long, MonthDays> held(Collection<Long> pumpIds, LocalDate fromMonth, LocalDate toMonth, Set<Long> keys)
            throws SQLException {
        Map<Long, MonthDays> held = new HashMap<>();
        List<Long> ids = new java.util.ArrayList<>(pumpIds);
        try (Connection c = dataSource.getConnection()) {
            for (int from = 0; from < ids.size(); from += IDS_PER_QUERY) {
                String sql = "select pump_id, month_start, day_hours from sensor_month where "
                        + pumpIdIn(ids.subList(from, Math.min(ids.size(), from + IDS_PER_QUERY)))
                        + " and month_start between ? and ?";
                try (PreparedStatement s = c.prepareStatement(sql)) {
                    s.setDate(1, Date.valueOf(fromMonth));
                    s.setDate(2, Date.valueOf(toMonth));
                    try (ResultSet r = s.executeQuery()) {
                        while (r.next()) {
                            LocalDate month = r.getDate(2).toLocalDate();
                            long key = key(r.getLong(1), month);
                            // Only the chunk's own months are kept, so memory stays bounded by the chunk.
                            if (keys.contains(key)) {
                                held.put(key, MonthDays.decode(month, r.getString(3)));
                            }
                        }
                    }
                }
            }
        }
        return held;
    }

    /**
     * {@code pump_id in (…)} with the ids written out. Ids are our own numbers, never text from a request. H2 plans
     * {@code pump_id = any(?)} with an array parameter as a scan of the whole table on a statement's first run (6.5 s
     * for 1,000 ids in 600,000 rows, against 0.1–0.4 s for the written-out list), and each chunk prepares afresh.
     */
    static String pumpIdIn(Collection<Long> pumpIds) {
        StringBuilder sql = new StringBuilder(pumpIds.size() * 8).append("pump_id in (");
        boolean first = true;
        for (Long id : pumpIds) {
            sql.append(first ? "" : ",").append(id.longValue());
            first = false;
        }
        return sql.append(')').toString();
    }

    /** Writes whole pump-months: their days, sum and days covered. */
    void write(List<Map.Entry<Long, MonthDays>> months) throws SQLException {
        if (months.isEmpty()) {
            return;
        }
        try (Connection c = dataSource.getConnection()) {
            if (isPostgres(c)) {
                copyThenUpsert(c, months);
            } else {
                multiRowMerge(c, months);
            }
        }
    }

    /**
     * PostgreSQL: the months go by COPY into a staging table private to the session, then into {@code sensor_month}
     * by one {@code INSERT … SELECT … ON CONFLICT}. The staging table empties itself at commit and after each chunk;
     * a rolled-back file leaves nothing behind.
     */
    private static void copyThenUpsert(Connection c, List<Map.Entry<Long, MonthDays>> months) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute("create temporary table if not exists sensor_month_incoming (pump_id bigint, month_start date, "
                    + "day_hours varchar(124), hours numeric(9, 2), days_covered integer) on commit delete rows");
        }
        CopyIn copy = c.unwrap(PGConnection.class).getCopyAPI()
                .copyIn("copy sensor_month_incoming from stdin");
        try {
            StringBuilder text = new StringBuilder(COPY_BUFFER_CHARS + 256);
            for (Map.Entry<Long, MonthDays> m : months) {
                // Text format: every value is digits, dots, dashes (no tab, newline or backslash to escape).
                text.append(m.getKey() >>> 20).append('\t').append(m.getValue().monthStart()).append('\t')
                        .append(m.getValue().encode()).append('\t')
                        .append(BigDecimal.valueOf(m.getValue().sumHundredths(), 2).toPlainString()).append('\t')
                        .append(m.getValue().daysCovered()).append('\n');
                if (text.length() >= COPY_BUFFER_CHARS) {
                    send(copy, text);
                }
            }
            send(copy, text);
            copy.endCopy();
        } finally {
            if (copy.isActive()) {
                copy.cancelCopy();
            }
        }
        try (Statement s = c.createStatement()) {
            s.executeUpdate("insert into sensor_month (pump_id, month_start, day_hours, hours, days_covered) "
                    + "select pump_id, month_start, day_hours, hours, days_covered from sensor_month_incoming "
                    + "on conflict (pump_id, month_start) do update set day_hours = excluded.day_hours, "
                    + "hours = excluded.hours, days_covered = excluded.days_covered");
            s.execute("truncate sensor_month_incoming");
        }
    }

    private static void send(CopyIn copy, StringBuilder text) throws SQLException {
        byte[] bytes = text.toString().getBytes(StandardCharsets.US_ASCII);
        copy.writeToCopy(bytes, 0, bytes.length);
        text.setLength(0);
    }

    /** H2: multi-row {@code MERGE … KEY} statements of {@value #ROWS_PER_STATEMENT} months. */
    private static void multiRowMerge(Connection c, List<Map.Entry<Long, MonthDays>> months) throws SQLException {
        for (int from = 0; from < months.size(); from += ROWS_PER_STATEMENT) {
            List<Map.Entry<Long, MonthDays>> part = months.subList(from,
                    Math.min(months.size(), from + ROWS_PER_STATEMENT));
            try (PreparedStatement s = c.prepareStatement(h2Merge(part.size()))) {
                int i = 1;
                for (Map.Entry<Long, MonthDays> m : part) {
                    s.setLong(i++, m.getKey() >>> 20);
                    s.setDate(i++, Date.valueOf(m.getValue().monthStart()));
                    s.setString(i++, m.getValue().encode());
                    s.setBigDecimal(i++, BigDecimal.valueOf(m.getValue().sumHundredths(), 2));
                    s.setInt(i++, m.getValue().daysCovered());
                }
                s.executeUpdate();
            }
        }
    }

    private static String h2Merge(int rows) {
        StringBuilder sql = new StringBuilder("merge into sensor_month (pump_id, month_start, day_hours, hours, "
                + "days_covered) key (pump_id, month_start) values ");
        for (int i = 0; i < rows; i++) {
            sql.append(i == 0 ? "(?, ?, ?, ?, ?)" : ", (?, ?, ?, ?, ?)");
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
