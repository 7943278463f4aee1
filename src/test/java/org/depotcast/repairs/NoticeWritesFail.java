package org.depotcast.repairs;

import io.quarkus.test.junit.QuarkusMock;

import java.util.Optional;

/**
 * Provokes the failure a refused repair's notice can meet after the repair's own transaction has rolled back (the
 * database refusing the write, say): while {@link #fail} is on, reading a notice by its repair reference throws, so
 * the notice's transaction fails and nothing is written. Installed for one test method; off, it reads as the real one.
 */
public final class NoticeWritesFail extends RefusedRepairRepository {
    private volatile boolean failing;

    private NoticeWritesFail() {
    }

    /** Installs the repository for the running test method (QuarkusMock removes it after the method). */
    public static NoticeWritesFail install() {
        NoticeWritesFail notices = new NoticeWritesFail();
        QuarkusMock.installMockForType(notices, RefusedRepairRepository.class);
        return notices;
    }

    public void fail(boolean on) {
        failing = on;
    }

    @Override
    Optional<RefusedRepair> byRef(String repairRef) {
        if (failing) {
            throw new IllegalStateException("the notice's write was made to fail by the test");
        }
        return super.byRef(repairRef);
    }
}
