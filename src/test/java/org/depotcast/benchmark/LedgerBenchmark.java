package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTest;

/** The ledger figures on the test database: in-memory H2, or PostgreSQL when run with {@code -Ppostgres}. */
@QuarkusTest
class LedgerBenchmark extends LedgerWorkload {
    @Override
    String database() {
        return System.getProperty("quarkus.test.profile", "test").contains("postgres")
                ? "PostgreSQL" : "in-memory H2";
    }
}
