package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;

/** The ledger figures on an H2 file with H2's default 500 ms write delay: the setting before commits were durable. */
@QuarkusTest
@TestProfile(H2FileProfiles.DelayedWrites.class)
class LedgerH2FileDelayedBenchmark extends LedgerWorkload {
    @Override
    String database() {
        return "H2 file, WRITE_DELAY=500 (not durable)";
    }
}
