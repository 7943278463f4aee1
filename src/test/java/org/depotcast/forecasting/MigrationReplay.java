package org.depotcast.forecasting;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.MigrationInfo;
import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.configuration.FluentConfiguration;
import org.junit.jupiter.api.Assumptions;

import javax.sql.DataSource;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import java.util.UUID;

/**
 * Replays one data migration on rows written as the code before it wrote them: the database is migrated to just
 * before the version, the old rows are written, the rest of the migrations run, and the check reads the result. On an
 * in-memory H2 database, or on the PostgreSQL database named by DEPOTCAST_TEST_JDBC_URL (ops/test-postgres.sh) in a
 * schema of its own, dropped afterwards. One connection throughout, given to Flyway as well: with Flyway's own
 * connections, inserts on H2 2.4 after the migration were refused ("check constraint invalid", caused by "the
 * database has been closed").
 */
final class MigrationReplay {
    /** Works on the open statement, whose search path is the replay's schema. */
    interface Step {
        void run(Statement statement) throws SQLException;
    }

    private final String version;

    /** @param version the migration replayed, e.g. "22" */
    MigrationReplay(String version) {
        this.version = version;
    }

    void onH2(Step writeOldRows, Step check) throws SQLException {
        replay("jdbc:h2:mem:migration-" + version + "-" + UUID.randomUUID(), "sa", "", null, writeOldRows, check);
    }

    /** Skipped (an assumption) when no PostgreSQL test database is configured. */
    void onPostgreSql(Step writeOldRows, Step check) throws SQLException {
        String url = System.getenv().getOrDefault("DEPOTCAST_TEST_JDBC_URL", "");
        Assumptions.assumeTrue(url.startsWith("jdbc:postgresql:"), "no PostgreSQL test database configured");
        String user = System.getenv().getOrDefault("DEPOTCAST_TEST_DB_USER", "postgres");
        String password = System.getenv().getOrDefault("DEPOTCAST_TEST_DB_PASSWORD", "");
        String schema = "migration_" + version + "_" + UUID.randomUUID().toString().substring(0, 8);
        try {
            replay(url, user, password, schema, writeOldRows, check);
        } finally {
            try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
                s.execute("drop schema if exists " + schema + " cascade");
            }
        }
    }

    private void replay(String url, String user, String password, String schema, Step writeOldRows, Step check)
            throws SQLException {
        try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
            DataSource one = OneConnection.of(c);
            flyway(one, schema).target(versionBefore(one, schema)).load().migrate();
            useSchema(s, schema);
            writeOldRows.run(s);
            flyway(one, schema).load().migrate();
            useSchema(s, schema);
            check.run(s);
        }
    }

    private static void useSchema(Statement s, String schema) throws SQLException {
        if (schema != null) {
            s.execute("set search_path to " + schema);
        }
    }

    /** The last migration before the replayed one, whatever number other work has given it. */
    private String versionBefore(DataSource one, String schema) {
        MigrationVersion replayed = MigrationVersion.fromVersion(version);
        return Arrays.stream(flyway(one, schema).load().info().all()).map(MigrationInfo::getVersion)
                .filter(v -> v != null && v.compareTo(replayed) < 0).max(MigrationVersion::compareTo).orElseThrow()
                .getVersion();
    }

    private static FluentConfiguration flyway(DataSource one, String schema) {
        var config = Flyway.configure().dataSource(one).locations("classpath:db/migration");
        return schema == null ? config : config.schemas(schema).createSchemas(true);
    }
}
