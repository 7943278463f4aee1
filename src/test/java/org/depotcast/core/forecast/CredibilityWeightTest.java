package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A group's credibility weights: CredibilityRate's ratio and Z with the ratio's gamma posterior variance. */
class CredibilityWeightTest {
    @Test
    void aGroupThatSpreadsMoreThanChanceGetsRatiosWithAPosteriorVariance() {
        double[] o = {30, 5, 18}, e = {10, 10, 10}, phi = {1, 1, 1};
        CredibilityWeight[] w = CredibilityWeight.ofGroup(o, e, phi);
        CredibilityRate.Result r = CredibilityRate.combine(o, e, phi);
        assertTrue(r.priorVariance() > 0, "30, 5 and 18 against 10 each spread more than Poisson noise");
        for (int i = 0; i < 3; i++) {
            assertEquals(r.ratio()[i], w[i].ratio(), 0.0);
            assertEquals(r.credibility()[i], w[i].credibility(), 0.0);
            // Gamma(1/τ² + O, 1/τ² + E): mean (1/τ² + O) / (1/τ² + E) is the ratio, variance that over the rate.
            double rate = 1 / r.priorVariance() + e[i];
            assertEquals(w[i].ratio() / rate, w[i].ratioVariance(), 1e-12);
            assertEquals(o[i], w[i].observed(), 0.0);
        }
        assertTrue(w[0].ratio() > 1 && w[1].ratio() < 1);
        assertEquals(String.format(java.util.Locale.ROOT, "its rate × %.2f, because 30 units were used here from June "
                + "2023 where it expected 10; this place's own history carries %.0f %% of the weight", w[0].ratio(),
                100 * w[0].credibility()), w[0].describe(LocalDate.of(2023, 6, 1)));
    }

    @Test
    void aGroupWithinChanceKeepsTheFleetRate() {
        CredibilityWeight[] w = CredibilityWeight.ofGroup(new double[]{10, 11, 9}, new double[]{10, 10, 10},
                new double[]{1, 1, 1});
        for (CredibilityWeight weight : w) {
            assertEquals(1, weight.ratio(), 1e-12);
            assertEquals(0, weight.credibility(), 0.0);
            assertEquals(0, weight.ratioVariance(), 0.0);
        }
        assertEquals("fleet model", CredibilityWeight.FLEET_ONLY.describe(LocalDate.of(2023, 6, 1)));
        assertEquals("its rate as it is, since the 1,928 units used here from December 2020 are within chance of the "
                + "1,903.5 it expected", new CredibilityWeight(1, 0, 0, 1928, 1903.5).describe(LocalDate.of(2020, 12, 1)));
        assertThrows(IllegalArgumentException.class, () -> new CredibilityWeight(-1, 0, 0, 1, 1));
    }
}
