package org.depotcast.planning;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/**
 * A fresh install: its own empty database (in-memory H2, or the empty PostgreSQL database that
 * {@code DEPOTCAST_TEST_EMPTY_JDBC_URL} names in the PostgreSQL run), production mode (no demo), one admin account.
 */
public class EmptyProgrammeProfile implements QuarkusTestProfile {
    static final String ADMIN_PASSWORD = "fresh-install-admin-1";

    @Override
    public Map<String, String> getConfigOverrides() {
        return Map.of(
                "quarkus.datasource.jdbc.url", System.getenv().getOrDefault("DEPOTCAST_TEST_EMPTY_JDBC_URL",
                        "jdbc:h2:mem:depotcast-fresh;DB_CLOSE_DELAY=-1"),
                "depotcast.mode", "production",
                "depotcast.session.key", "an-empty-programme-test-session-key-0123456789",
                "depotcast.bootstrap.admin-password", ADMIN_PASSWORD);
    }
}
