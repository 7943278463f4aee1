package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/** An empty file-backed H2 database for the 40× scale benchmark: production mode loads no demo. */
public class ScaleProfile implements QuarkusTestProfile {
    @Override
    public Map<String, String> getConfigOverrides() {
        return Map.of(
                "quarkus.datasource.jdbc.url", "jdbc:h2:file:./target/scale-benchmark/db-" + System.nanoTime()
                        + ";DB_CLOSE_ON_EXIT=FALSE",
                "depotcast.mode", "production",
                // Production mode refuses to start without a session key; this one signs only the benchmark's cookies.
                "depotcast.session.key", "scale-benchmark-only-session-key-0123456789",
                "quarkus.log.category.\"org.depotcast\".level", "INFO");
    }
}
