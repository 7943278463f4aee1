package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;

/** The ledger figures on an H2 file as the service ships: each commit written before it returns (WRITE_DELAY=0). */
@QuarkusTest
@TestProfile(H2FileProfiles.Durable.class)
class LedgerH2FileDurableBenchmark extends LedgerWorkload {
    @Override
    String database() {
        return "H2 file, WRITE_DELAY=0 (durable)";
    }
}
