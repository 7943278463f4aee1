package org.depotcast.repairs;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

class RepairDatesTest {
    private static final LocalDate D = LocalDate.of(2026, 3, 1);

    @Test
    void daysWaitingForPartsRunFromDiagnosisToPartsAtHand() {
        Repair repair = new Repair();
        repair.reportedOn = D;
        repair.diagnosedOn = D.plusDays(2);
        repair.partsAvailableOn = D.plusDays(16);
        repair.fixedOn = D.plusDays(17);
        assertEquals(14L, repair.daysWaitingForParts());
        assertEquals(17L, repair.downtimeDays());
    }

    @Test
    void partsAtHandMeanNoWait() {
        Repair repair = new Repair();
        repair.reportedOn = D;
        repair.diagnosedOn = D;
        repair.fixedOn = D.plusDays(1);
        assertEquals(0L, repair.daysWaitingForParts());
    }

    @Test
    void datesMustRunInOrder() {
        assertNull(RepairDates.dateOrderProblem(D, D.plusDays(1), null, D.plusDays(3)));
        assertEquals("fixedOn", RepairDates.dateOrderProblem(D, D.plusDays(2), null, D.plusDays(1)));
        assertEquals("diagnosedOn", RepairDates.dateOrderProblem(D, D.minusDays(1), null, null));
    }
}
