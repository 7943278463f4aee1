package org.depotcast.forecasting;

import org.junit.jupiter.api.Test;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

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
    private static final MigrationReplay REPLAY = new MigrationReplay("22");
    private final MonthlySeriesJson converter = new MonthlySeriesJson();

    @Test
    void oldRowsBecomeJsonOnH2() throws SQLException {
        REPLAY.onH2(StoredSeriesMigrationTest::writeOldRows, this::check);
    }

    @Test
    void oldRowsBecomeJsonOnPostgreSql() throws SQLException {
        REPLAY.onPostgreSql(StoredSeriesMigrationTest::writeOldRows, this::check);
    }

    private void check(Statement s) throws SQLException {
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
}
