package org.depotcast.core.policy;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class ShortageReductionTest {
    @Test
    void oneUnitAtPositionSevenAgainstPoissonFour() {
        // Poisson mean 4 (Silver, Pyke & Thomas loss function): G(7) = 0.084761, G(8) = 0.033627.
        // Protection 21 days (14 transfer + 7 review): (0.084761 − 0.033627) × 21/2 = 0.536907 pump-days.
        PoissonDemand demand = new PoissonDemand(4);
        assertEquals(0.084761, demand.expectedShortfall(7), 1e-6);
        assertEquals(0.536907, ShortageReduction.pumpDaysAvoided(demand, 7, 1, 21), 1e-5);
        // From an empty shelf: G(0) = 4 (every unit of demand short), G(2) = 4 − 2 + 2·e⁻⁴ + 1·4e⁻⁴ = 2.109894.
        assertEquals((4 - (2 + 6 * Math.exp(-4))) * 10.5, ShortageReduction.pumpDaysAvoided(demand, 0, 2, 21), 1e-9);
        assertEquals(0, ShortageReduction.pumpDaysAvoided(demand, 5, 0, 21), 0);
    }

    @Test
    void aSlowMoverGainsLittleFromManyUnits() {
        // A depot using 0.06 rods a day over 21 days: Poisson mean 1.26. From position 0, the first unit removes
        // (G(0) − G(1)) × 10.5 = (1 − e^−1.26) × 10.5 = 7.522; all of 23 units remove G(0) × 10.5 = 13.23 at most.
        PoissonDemand rods = new PoissonDemand(1.26);
        assertEquals((1 - Math.exp(-1.26)) * 10.5, ShortageReduction.pumpDaysAvoided(rods, 0, 1, 21), 1e-9);
        assertEquals(1.26 * 10.5, ShortageReduction.pumpDaysAvoided(rods, 0, 23, 21), 1e-6);
        // Units that each remove at least 0.5 pump-days (a unit removes P(D > x) × 10.5): the third 1.405, the
        // fourth 0.412.
        assertEquals(3, ShortageReduction.worthwhileUnits(rods, 0, 23, 21, 0.5));
    }

    @Test
    void unitsCommittedBeyondStockAreWorthAWholeUnitShortEach() {
        // Two units approved for mechanics and none on hand or on order: position −2. G(x) = E(D − x)⁺ = m − x for
        // x ≤ 0, so G(−2) = 6 and G(−1) = 5 for Poisson 4: the first unit removes a whole unit short, 1 × 21/2.
        PoissonDemand demand = new PoissonDemand(4);
        assertEquals(10.5, ShortageReduction.pumpDaysAvoided(demand, -2, 1, 21), 1e-9);
        assertEquals((2 + 4 - (2 + 6 * Math.exp(-4))) * 10.5, ShortageReduction.pumpDaysAvoided(demand, -2, 4, 21),
                1e-9);
        // The rods of the slow mover, two committed: the two that fill them, then the three worth it from 0.
        PoissonDemand rods = new PoissonDemand(1.26);
        assertEquals(5, ShortageReduction.worthwhileUnits(rods, -2, 23, 21, 0.5));
    }

    @Test
    void brokenContractsNameTheArgument() {
        PoissonDemand demand = new PoissonDemand(1);
        assertEquals("units must be ≥ 0, was -1.0",
                assertThrows(IllegalArgumentException.class, () -> ShortageReduction.pumpDaysAvoided(demand, 0, -1, 21)).getMessage());
        assertThrows(IllegalArgumentException.class, () -> ShortageReduction.pumpDaysAvoided(demand, 0, 1, 0));
    }
}
