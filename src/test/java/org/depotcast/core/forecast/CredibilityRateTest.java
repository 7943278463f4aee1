package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CredibilityRateTest {
    @Test
    void handWorkedCaseAgreesWithBuhlmannAndTheGammaPoissonPosterior() {
        // O = (30, 10, 20), E = 20 each, φ = 1: Σ(O − E)² = 200, Σφ·E = 60, ΣE² = 1,200 → τ² = 140/1,200.
        double[] observed = {30, 10, 20}, expected = {20, 20, 20}, phi = {1, 1, 1};
        CredibilityRate.Result r = CredibilityRate.combine(observed, expected, phi);
        double tau2 = 140.0 / 1200;
        assertEquals(tau2, r.priorVariance(), 1e-12);
        // Bühlmann: Z = n/(n + k), exposure n = 20, k = EPV/VHM = φ/τ² = 8.5714 → Z = 0.7.
        double k = 1 / tau2;
        assertEquals(20 / (20 + k), r.credibility()[0], 1e-12);
        assertEquals(0.7, r.credibility()[0], 1e-12);
        assertArrayEquals(new double[]{1.35, 0.65, 1.0}, r.ratio(), 1e-12);
        // Conjugate gamma–Poisson: prior Gamma(shape 1/τ², rate 1/τ²), posterior mean (1/τ² + O)/(1/τ² + E).
        assertEquals((k + 30) / (k + 20), r.ratio()[0], 1e-12);
        assertEquals((k + 10) / (k + 20), r.ratio()[1], 1e-12);
    }

    @Test
    void unitsInEventsOfTwoWidenTheNoiseAndLowerTheWeight() {
        // O = (40, 0, 20), E = 20 each, φ = 2 (two units per event): Σ(O − E)² = 800, Σφ·E = 120 → τ² = 680/1,200,
        // Z = 20τ²/(20τ² + 2) = 0.85; Dean's score 680/√(3 × 2 × 2² × 20²) = 6.94 clears √ln 3.
        CredibilityRate.Result r = CredibilityRate.combine(new double[]{40, 0, 20}, new double[]{20, 20, 20},
                new double[]{2, 2, 2});
        assertEquals(680.0 / 1200, r.priorVariance(), 1e-12);
        assertEquals(0.85, r.credibility()[0], 1e-12);
        assertArrayEquals(new double[]{1.85, 0.15, 1.0}, r.ratio(), 1e-12);
    }

    @Test
    void aSpreadChanceExplainsLeavesTheFleetRate() {
        // O = (30, 10, 20), E = 20, φ = 2: the moment estimate τ² = 80/1,200 is positive, but Dean's score (1992)
        // 80/√(3 × 2 × 2² × 20²) = 0.816 is under √ln 3 = 1.048: no spread shown, every series keeps the fleet rate.
        CredibilityRate.Result r = CredibilityRate.combine(new double[]{30, 10, 20}, new double[]{20, 20, 20},
                new double[]{2, 2, 2});
        assertEquals(0, r.priorVariance());
        assertArrayEquals(new double[]{0, 0, 0}, r.credibility(), 0);
        assertArrayEquals(new double[]{1, 1, 1}, r.ratio(), 0);
        // The threshold grows with the number of series: a score of 100/√9,600 = 1.02 clears √ln 2 = 0.83, not √ln 3.
        assertTrue(CredibilityRate.spreadShown(100, 9600, 2));
        assertFalse(CredibilityRate.spreadShown(100, 9600, 3));
    }

    @Test
    void noiseWithinWhatTheFleetModelExpectsLeavesTheFleetRate() {
        // Deviations smaller than Poisson noise: τ² = 0, every series keeps the fleet rate.
        CredibilityRate.Result r = CredibilityRate.combine(new double[]{22, 18, 20}, new double[]{20, 20, 20},
                new double[]{1, 1, 1});
        assertEquals(0, r.priorVariance());
        assertArrayEquals(new double[]{1, 1, 1}, r.ratio(), 0);
    }

    @Test
    void brokenContractsNameTheArgument() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> CredibilityRate.combine(new double[]{1}, new double[]{0}, new double[]{1}));
        assertEquals("expected[0] must be > 0, was 0.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> CredibilityRate.combine(new double[0], new double[0], new double[0]));
    }
}
