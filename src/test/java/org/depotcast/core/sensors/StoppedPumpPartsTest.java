package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/** The parts expectation on a small case worked by hand. */
class StoppedPumpPartsTest {
    @Test
    void partsFollowTheFamiliesShareOfTheRateAndTheBillsQuantities() {
        // Rates per hour 0.0002 + 0.00005 + 0.00015 = 0.0004: shares 1/2, 1/8, 3/8. p = 0.8.
        var rates = List.of(new StoppedPumpParts.FamilyRate("CUP_SEAL", 0.0002, 2),
                new StoppedPumpParts.FamilyRate("PUMP_ROD", 0.00005, 1),
                new StoppedPumpParts.FamilyRate("BEARING", 0.00015, 1));
        var bom = List.of(new StoppedPumpParts.BomPart("CS-1", "CUP_SEAL", 2),
                new StoppedPumpParts.BomPart("BRG-1", "BEARING", 2),
                new StoppedPumpParts.BomPart("BRG-2", "BEARING", 2),
                new StoppedPumpParts.BomPart("HANDLE-1", "HANDLE", 1));
        var expectation = StoppedPumpParts.expect(0.8, rates, bom);
        assertEquals(0.4, expectation.repairsByFamily().get("CUP_SEAL"), 1e-12);
        assertEquals(0.1, expectation.repairsByFamily().get("PUMP_ROD"), 1e-12);
        assertEquals(0.3, expectation.repairsByFamily().get("BEARING"), 1e-12);
        // Cup seals: 0.8 × 1/2 × 2 units = 0.8; bearings: 0.8 × 3/8 × 1 unit, half each = 0.15.
        assertEquals(0.8, expectation.unitsByPart().get("CS-1"), 1e-12);
        assertEquals(0.15, expectation.unitsByPart().get("BRG-1"), 1e-12);
        assertEquals(0.15, expectation.unitsByPart().get("BRG-2"), 1e-12);
        // No rod on this bill: the repair is expected, no part is named; the handle has no rate, so no units.
        assertFalse(expectation.unitsByPart().containsKey("HANDLE-1"));
        assertEquals(3, expectation.unitsByPart().size());
    }
}
