package org.depotcast.common;

import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * A database made by the migrations on one connection takes rows on another once that first one has closed, as the
 * packaged service's does on its first start: its pool closes the connection that ran the migrations when it stands
 * idle. H2 2.4.240 kept the closed session inside every "status in (…)" check, so after a few minutes each insert into
 * such a table (parts requests, purchase plans, spend runs, …) failed with "check constraint invalid".
 */
class H2ConstraintsAcrossConnectionsTest {
    @Test
    void rowsAreTakenAfterTheConnectionThatMadeTheTablesHasClosed() throws SQLException {
        String url = "jdbc:h2:mem:constraints-" + UUID.randomUUID() + ";DB_CLOSE_DELAY=-1";
        try (Connection keep = DriverManager.getConnection(url, "sa", "")) {
            // Flyway opens and closes its own connections; this one only keeps the in-memory database alive.
            Flyway.configure().dataSource(url, "sa", "").locations("classpath:db/migration").load().migrate();
            try (Connection later = DriverManager.getConnection(url, "sa", ""); Statement s = later.createStatement()) {
                int rows = s.executeUpdate("insert into forecast_run (trigger_kind, status, started_at, horizon_months) "
                        + "values ('manual', 'RUNNING', current_timestamp, 24)");
                assertEquals(1, rows);
                assertEquals(1, s.executeUpdate("update forecast_run set status = 'DONE'"));
            }
        }
    }
}
