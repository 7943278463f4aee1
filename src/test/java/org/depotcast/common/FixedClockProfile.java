package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/**
 * The service with its clock fixed at 2027-06-15 08:00 UTC, after every date in the demo programme (so the demo loads
 * as it does today), on an in-memory database of its own: runs and demo sensor readings made "in 2027" stay out of
 * the database the other tests share.
 */
public class FixedClockProfile implements QuarkusTestProfile {
    static final String FIXED = "2027-06-15T08:00:00Z";

    @Override
    public Map<String, String> getConfigOverrides() {
        return Map.of("depotcast.clock.fixed", FIXED,
                "quarkus.datasource.jdbc.url", "jdbc:h2:mem:depotcast-fixed-clock;DB_CLOSE_DELAY=-1");
    }
}
