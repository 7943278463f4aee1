package org.depotcast.core.sensors;

import org.apache.commons.math3.distribution.PoissonDistribution;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Units to have ready: Poisson quantiles worked by hand (e^−m Σ m^j / j!) and checked against Commons Math. */
class PartsToHaveReadyTest {
    @Test
    void handWorkedCases() {
        // m = 0.6: P(0) = 0.5488, P(≤1) = 0.8781 < 0.90 ≤ P(≤2) = 0.9769
        assertEquals(2, PartsToHaveReady.units(0.6, 0.90));
        // m = 0.4: P(0) = 0.6703 < 0.80 ≤ P(≤1) = 0.9384
        assertEquals(1, PartsToHaveReady.units(0.4, 0.80));
        // m = 0.04: P(0) = 0.9608 ≥ 0.95, so nothing need be set aside
        assertEquals(0, PartsToHaveReady.units(0.04, 0.95));
        // m = 0.04 at 98 %: P(0) = 0.9608 < 0.98 ≤ P(≤1) = 0.9992
        assertEquals(1, PartsToHaveReady.units(0.04, 0.98));
        // m = 2: P(≤3) = 0.8571, P(≤4) = 0.9473 < 0.95 ≤ P(≤5) = 0.9834
        assertEquals(5, PartsToHaveReady.units(2, 0.95));
        assertEquals(0, PartsToHaveReady.units(0, 0.98), "nothing expected, nothing to have ready");
    }

    @Test
    void theSmallestWholeNumberReachingTheCoverLevel() {
        for (double mean : new double[]{0.01, 0.05, 0.2, 0.79, 1, 3.3, 12, 150}) {
            PoissonDistribution poisson = new PoissonDistribution(mean);
            for (double level : new double[]{0.5, 0.8, 0.9, 0.95, 0.98, 0.995}) {
                int k = PartsToHaveReady.units(mean, level);
                assertTrue(poisson.cumulativeProbability(k) >= level, mean + " at " + level + ": " + k);
                assertTrue(k == 0 || poisson.cumulativeProbability(k - 1) < level, mean + " at " + level + ": " + k);
            }
        }
    }

    @Test
    void refusesWhatCannotBeAnAmountOrALevel() {
        assertThrows(IllegalArgumentException.class, () -> PartsToHaveReady.units(-0.1, 0.9));
        assertThrows(IllegalArgumentException.class, () -> PartsToHaveReady.units(Double.NaN, 0.9));
        assertThrows(IllegalArgumentException.class, () -> PartsToHaveReady.units(0.5, 1));
        assertThrows(IllegalArgumentException.class, () -> PartsToHaveReady.units(0.5, 0));
    }
}
