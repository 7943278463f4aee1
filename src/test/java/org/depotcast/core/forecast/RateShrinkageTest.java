package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The BIC check before depot ratios are used (Schwarz 1978), on hand-worked deviance drops. */
class RateShrinkageTest {
    @Test
    void depotsThatDifferByChanceKeepOneFleetRate() {
        // O = (120, 80, 100), E = 100 each: drop 2[120 ln 1.2 + 80 ln 0.8] = 8.05 < 2 ln 1,000 = 13.82.
        assertFalse(RateShrinkage.groupsDiffer(new double[]{120, 80, 100}, new double[]{100, 100, 100}, 1000, 1));
    }

    @Test
    void depotsThatReallyDifferGetTheirRatios() {
        // O = (150, 60, 90): drop 2[150 ln 1.5 + 60 ln 0.6 + 90 ln 0.9] = 41.39 > 13.82 ...
        double[] observed = {150, 60, 90}, expected = {100, 100, 100};
        assertTrue(RateShrinkage.groupsDiffer(observed, expected, 1000, 1));
        // ... but not when the fit is overdispersed by 4 (quasi-Poisson: the drop counts a quarter, 10.35).
        assertFalse(RateShrinkage.groupsDiffer(observed, expected, 1000, 4));
        // A single depot has nothing to differ from.
        assertFalse(RateShrinkage.groupsDiffer(new double[]{150}, new double[]{100}, 1000, 1));
    }
}
