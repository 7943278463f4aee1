package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/**
 * The embedded H2 file database as the service runs it, with the demo loaded: with H2's default write delay (commits
 * reach the file up to 500 ms later) and with the durable setting the service ships with (WRITE_DELAY=0).
 */
final class H2FileProfiles {
    private H2FileProfiles() {
    }

    private static Map<String, String> withWriteDelay(int millis) {
        return Map.of("quarkus.datasource.jdbc.url", "jdbc:h2:file:./target/ledger-benchmark/db-" + System.nanoTime()
                + ";DB_CLOSE_ON_EXIT=FALSE;WRITE_DELAY=" + millis);
    }

    public static class DelayedWrites implements QuarkusTestProfile {
        @Override
        public Map<String, String> getConfigOverrides() {
            return withWriteDelay(500);
        }
    }

    public static class Durable implements QuarkusTestProfile {
        @Override
        public Map<String, String> getConfigOverrides() {
            return withWriteDelay(0);
        }
    }
}
