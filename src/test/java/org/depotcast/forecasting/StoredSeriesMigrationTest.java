package org.depotcast.forecasting;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.MigrationInfo;
import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.configuration.FluentConfiguration;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import java.util.UUID;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * V22 turns forecasts stored in the old semicolon form into JSON arrays the entity reads. A database is migrated to
 * just before V22, rows are written as the old code wrote them, then V22 runs. On H2 always; on PostgreSQL too when
 * DEPOTCAST_TEST_JDBC_URL names one (ops/test-postgres.sh), in a schema of its own dropped afterwards.
 */
class StoredSeriesMigrationTest {
    private final MonthlySeriesJson converter = new MonthlySeriesJson();

    @Test
    void oldRowsBecomeJsonOnH2() throws SQLException {
        migrateAndCheck("jdbc:h2:mem:series-migration-" + UUID.randomUUID(), "sa", "", null);
    }

    @Test
    void oldRowsBecomeJsonOnPostgreSql() throws SQLException {
        String url = System.getenv().getOrDefault("DEPOTCAST_TEST_JDBC_URL", "");
        Assumptions.assumeTrue(url.startsWith("jdbc:postgresql:"), "no PostgreSQL test database configured");
        String user = System.getenv().getOrDefault("DEPOTCAST_TEST_DB_USER", "postgres");
        String password = System.getenv().getOrDefault("DEPOTCAST_TEST_DB_PASSWORD", "");
        String schema = "series_migration_" + UUID.randomUUID().toString().substring(0, 8);
        try {
            migrateAndCheck(url, user, password, schema);
        } finally {
            try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
                s.execute("drop schema if exists " + schema + " cascade");
            }
        }
    }

    /**
     * One connection throughout, given to Flyway as well: with Flyway's own connections, inserts on H2 2.4 after the
     * migration were refused ("check constraint invalid", caused by "the database has been closed").
     */
    private void migrateAndCheck(String url, String user, String password, String schema) throws SQLException {
        try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
            DataSource one = OneConnection.of(c);
            flyway(one, schema).target(versionBefore22(one, schema)).load().migrate();
            if (schema != null) {
                s.execute("set search_path to " + schema);
            }
            writeOldRows(s);
            flyway(one, schema).load().migrate();
            if (schema != null) {
                s.execute("set search_path to " + schema);
            }
            try (ResultSet rows = s.executeQuery("select location_code, monthly_forecast, preventive_monthly, "
                    + "monthly_history, monthly_variance from part_forecast order by location_code")) {
                assertTrue(rows.next());
                assertEquals("[0.5,1.25,1.0E-4]", rows.getString(2));
                assertArrayEquals(new double[]{0.5, 1.25, 1.0e-4}, converter.convertToEntityAttribute(rows.getString(2)), 0.0);
                assertArrayEquals(new double[]{0.0, 0.25, 0.0}, converter.convertToEntityAttribute(rows.getString(3)), 0.0);
                assertEquals("[]", rows.getString(4), "an empty history stays empty");
                assertArrayEquals(new double[]{0.6, Double.NaN, 0.7}, converter.convertToEntityAttribute(rows.getString(5)), 0.0);
                assertTrue(rows.next());
                assertArrayEquals(new double[]{0.0, 2.0, 0.0, 1.0}, converter.convertToEntityAttribute(rows.getString(4)), 0.0);
                assertNull(rows.getString(5), "a run made before monthly variances were kept still has none");
            }
        }
    }

    /** Rows as the code before V22 wrote them. */
    private static void writeOldRows(Statement s) throws SQLException {
        s.execute("insert into part (part_number, description, family, unit_of_issue, pack_size, min_order_qty, "
                + "unit_cost, currency, supplier, lead_time_days) values ('MIG-1', 'Migration test part', 'SEALS', "
                + "'each', 1, 1, 1.00, 'USD', 'Invented Supplier', 30)");
        s.execute("insert into forecast_run (trigger_kind, status, started_at, horizon_months) "
                + "values ('request', 'DONE', current_timestamp, 3)");
        String ids = "(select max(id) from forecast_run), (select max(id) from part)";
        s.execute("insert into part_forecast (run_id, part_id, location_code, method, demand_class, "
                + "breakdown_per_month, variance_per_month, monthly_forecast, preventive_monthly, monthly_history, "
                + "monthly_variance) values (" + ids + ", 'DEPOT-A', 'fleet', 'SMOOTH', 0.5, 0.6, "
                + "'0.5;1.25;1.0E-4', '0.0;0.25;0.0', '', '0.6;NaN;0.7')");
        s.execute("insert into part_forecast (run_id, part_id, location_code, method, demand_class, "
                + "breakdown_per_month, variance_per_month, monthly_forecast, preventive_monthly, monthly_history) "
                + "values (" + ids + ", 'DEPOT-B', 'croston', 'INTERMITTENT', 0.1, 0.2, '0.1;0.1;0.1', '0.0;0.0;0.0', "
                + "'0.0;2.0;0.0;1.0')");
    }

    /** The last migration before V22, whatever number other work has given it. */
    private static String versionBefore22(DataSource one, String schema) {
        MigrationVersion v22 = MigrationVersion.fromVersion("22");
        return Arrays.stream(flyway(one, schema).load().info().all()).map(MigrationInfo::getVersion)
                .filter(v -> v != null && v.compareTo(v22) < 0).max(MigrationVersion::compareTo).orElseThrow().getVersion();
    }

    private static FluentConfiguration flyway(DataSource one, String schema) {
        var config = Flyway.configure().dataSource(one).locations("classpath:db/migration");
        return schema == null ? config : config.schemas(schema).createSchemas(true);
    }
}
