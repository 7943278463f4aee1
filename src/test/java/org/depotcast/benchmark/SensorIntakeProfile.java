package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/**
 * An empty database for the sensor intake benchmark: a fresh H2 file by default (production mode loads no demo), or
 * the PostgreSQL database named by {@code -Dsensors.postgres=jdbc:postgresql://…} (user postgres; create it first).
 */
public class SensorIntakeProfile implements QuarkusTestProfile {
    @Override
    public Map<String, String> getConfigOverrides() {
        String postgres = System.getProperty("sensors.postgres");
        // Production mode loads no demo; it needs a session key, made here for this run only.
        String sessionKey = java.util.UUID.randomUUID() + "-" + java.util.UUID.randomUUID();
        if (postgres != null) {
            return Map.of("depotcast.session.key", sessionKey,"quarkus.datasource.db-kind", "postgresql", "quarkus.datasource.jdbc.url", postgres,
                    "quarkus.datasource.username", "postgres", "quarkus.datasource.password", "",
                    "depotcast.mode", "production", "quarkus.log.category.\"org.depotcast\".level", "INFO");
        }
        return Map.of("depotcast.session.key", sessionKey,
                "quarkus.datasource.jdbc.url", "jdbc:h2:file:./target/sensor-benchmark/db-" + System.nanoTime()
                        + ";DB_CLOSE_ON_EXIT=FALSE;WRITE_DELAY=0",
                "depotcast.mode", "production",
                "quarkus.log.category.\"org.depotcast\".level", "INFO");
    }
}
