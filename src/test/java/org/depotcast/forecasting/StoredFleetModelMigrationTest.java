package org.depotcast.forecasting;

import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.RateCovariate;
import org.junit.jupiter.api.Test;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * V23 turns fleet models stored with semicolon-joined lists into JSON the entity reads, and the model read back is
 * the one the old row described. A database is migrated to just before V23, rows are written as the old code wrote
 * them, then V23 runs. On H2 always; on PostgreSQL too when DEPOTCAST_TEST_JDBC_URL names one
 * (ops/test-postgres.sh), in a schema of its own dropped afterwards.
 */
class StoredFleetModelMigrationTest {
    private static final MigrationReplay REPLAY = new MigrationReplay("23");
    private final FleetFitJson.Terms terms = new FleetFitJson.Terms();
    private final FleetFitJson.Numbers numbers = new FleetFitJson.Numbers();

    @Test
    void oldFitsBecomeJsonOnH2() throws SQLException {
        REPLAY.onH2(StoredFleetModelMigrationTest::writeOldRows, this::check);
    }

    @Test
    void oldFitsBecomeJsonOnPostgreSql() throws SQLException {
        REPLAY.onPostgreSql(StoredFleetModelMigrationTest::writeOldRows, this::check);
    }

    private void check(Statement s) throws SQLException {
        try (ResultSet rows = s.executeQuery("select family, covariates, coefficients, standard_errors, covariance, "
                + "depot_ratios, source, deviance, df_residual, dispersion, units_per_event, events, exposure_hours "
                + "from fleet_model_fit order by family")) {
            assertTrue(rows.next());
            assertEquals("[\"log_depth\",\"age_years\"]", rows.getString(2));
            assertEquals("[-7.25,0.4,0.05]", rows.getString(3));
            assertEquals("[0.1,0.02,0.01]", rows.getString(4));
            assertNull(rows.getString(5), "an old run kept no covariance");
            assertNull(rows.getString(6), "an old run kept no depot ratios");
            FleetRateModel fitted = read(rows).rateModel();
            assertEquals(List.of(RateCovariate.LOG_DEPTH, RateCovariate.AGE_YEARS), fitted.covariates());
            // Rate of a pump at 60 m, aged 4 years: exp(−7.25 + 0.4 ln 2 + 0.05 × 4), by hand 1.14455e-3 per hour.
            assertEquals(Math.exp(-7.25 + 0.4 * Math.log(2) + 0.2), fitted.ratePerHour(60, 4, 6), 1e-15);
            assertEquals(1.14455e-3, fitted.ratePerHour(60, 4, 6), 1e-7);
            assertEquals(1.0, fitted.depotRatio(12), 0.0);
            assertEquals(0.1, fitted.logRateStandardError(new double[]{0, 0}), 1e-12);

            assertTrue(rows.next());
            assertEquals("[]", rows.getString(2), "a prior has no terms");
            assertEquals("[]", rows.getString(4), "nor standard errors");
            FleetRateModel prior = read(rows).rateModel();
            assertFalse(prior.fitted());
            assertEquals(0.002, prior.ratePerHour(60, 4, 6), 1e-12);
            assertFalse(rows.next());
        }
    }

    private FleetModelFitRecord read(ResultSet rows) throws SQLException {
        FleetModelFitRecord r = new FleetModelFitRecord();
        r.family = rows.getString(1);
        r.covariates = terms.convertToEntityAttribute(rows.getString(2));
        r.coefficients = numbers.convertToEntityAttribute(rows.getString(3));
        r.standardErrors = numbers.convertToEntityAttribute(rows.getString(4));
        r.covariance = new FleetFitJson.Matrix().convertToEntityAttribute(rows.getString(5));
        Map<Long, Double> ratios = new FleetFitJson.DepotRatios().convertToEntityAttribute(rows.getString(6));
        r.depotRatios = ratios;
        r.source = rows.getString(7);
        r.deviance = rows.getObject(8) == null ? null : rows.getDouble(8);
        r.dfResidual = rows.getObject(9) == null ? null : rows.getInt(9);
        r.dispersion = rows.getObject(10) == null ? null : rows.getDouble(10);
        r.unitsPerEvent = rows.getDouble(11);
        r.events = rows.getInt(12);
        r.exposureHours = rows.getDouble(13);
        return r;
    }

    /** Rows as the code before V23 wrote them: a fit with two terms and a prior. */
    private static void writeOldRows(Statement s) throws SQLException {
        s.execute("insert into forecast_run (trigger_kind, status, started_at, horizon_months) "
                + "values ('request', 'DONE', current_timestamp, 3)");
        s.execute("insert into fleet_model_fit (run_id, family, source, covariates, coefficients, standard_errors, "
                + "deviance, df_residual, dispersion, overdispersed, events, exposure_hours, units_per_event) values "
                + "((select max(id) from forecast_run), 'BEARING', 'fit', 'log_depth;age_years', '-7.25;0.4;0.05', "
                + "'0.1;0.02;0.01', 410.5, 397, 1.1, false, 120, 250000.0, 1.5)");
        s.execute("insert into fleet_model_fit (run_id, family, source, covariates, coefficients, standard_errors, "
                + "overdispersed, events, exposure_hours, units_per_event) values "
                + "((select max(id) from forecast_run), 'CUP_SEAL', 'prior', '', '" + Math.log(0.002) + "', '', false, 3, "
                + "9000.0, 1.0)");
    }
}
