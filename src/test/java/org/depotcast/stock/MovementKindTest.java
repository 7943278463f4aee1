package org.depotcast.stock;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.depotcast.stock.LocationKind.CENTRAL_STORE;
import static org.depotcast.stock.LocationKind.DEPOT;
import static org.depotcast.stock.LocationKind.KIT;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

/** The shape rules of the ledger: which ends each kind of movement may have. */
class MovementKindTest {

    @ParameterizedTest(name = "{0} {1} -> {2} allowed")
    @CsvSource(nullValues = "-", value = {
            "RECEIPT, -, CENTRAL_STORE", "RECEIPT, -, DEPOT",
            "TRANSFER, CENTRAL_STORE, DEPOT", "TRANSFER, DEPOT, DEPOT", "TRANSFER, DEPOT, CENTRAL_STORE",
            "ISSUE_TO_KIT, DEPOT, KIT", "CONSUMPTION, KIT, -", "RETURN, KIT, DEPOT",
            "COUNT_ADJUSTMENT, -, KIT", "COUNT_ADJUSTMENT, DEPOT, -", "WRITE_OFF, DEPOT, -", "WRITE_OFF, KIT, -"})
    void allowedShapes(MovementKind kind, LocationKind from, LocationKind to) {
        assertNull(kind.endsProblem(from, to, false));
    }

    @ParameterizedTest(name = "{0} {1} -> {2} refused")
    @CsvSource(nullValues = "-", value = {
            "RECEIPT, DEPOT, KIT", "RECEIPT, -, -",
            "TRANSFER, DEPOT, KIT", "TRANSFER, KIT, DEPOT", "TRANSFER, -, DEPOT",
            "ISSUE_TO_KIT, CENTRAL_STORE, KIT", "ISSUE_TO_KIT, DEPOT, DEPOT",
            "CONSUMPTION, DEPOT, -", "CONSUMPTION, KIT, DEPOT", "RETURN, KIT, CENTRAL_STORE",
            "COUNT_ADJUSTMENT, DEPOT, KIT", "COUNT_ADJUSTMENT, -, -", "WRITE_OFF, -, DEPOT"})
    void refusedShapes(MovementKind kind, LocationKind from, LocationKind to) {
        assertNotNull(kind.endsProblem(from, to, false));
    }

    @Test
    void sameLocationOnBothEndsIsRefused() {
        assertEquals("from and to must be different locations", MovementKind.TRANSFER.endsProblem(DEPOT, DEPOT, true));
    }

    @Test
    void hierarchyRules() {
        assertNull(LocationService.hierarchyProblem(CENTRAL_STORE, null, null));
        assertNull(LocationService.hierarchyProblem(DEPOT, CENTRAL_STORE, null));
        assertNull(LocationService.hierarchyProblem(KIT, DEPOT, "mechanic1"));
        assertNotNull(LocationService.hierarchyProblem(KIT, DEPOT, null));
        assertNotNull(LocationService.hierarchyProblem(KIT, CENTRAL_STORE, "mechanic1"));
        assertNotNull(LocationService.hierarchyProblem(DEPOT, DEPOT, null));
        assertNotNull(LocationService.hierarchyProblem(CENTRAL_STORE, DEPOT, null));
    }
}
