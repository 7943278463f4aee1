package org.depotcast.spend;

import io.quarkus.test.junit.QuarkusTestProfile;

import java.util.Map;

/**
 * The service on an in-memory database of its own holding the demo programme and nothing the other tests add
 * (pumps registered years back with no repairs, imported past repairs), for checks of the demo's own history.
 */
public class DemoOnlyProfile implements QuarkusTestProfile {
    @Override
    public Map<String, String> getConfigOverrides() {
        return Map.of("quarkus.datasource.jdbc.url", "jdbc:h2:mem:depotcast-demo-only;DB_CLOSE_DELAY=-1");
    }
}
