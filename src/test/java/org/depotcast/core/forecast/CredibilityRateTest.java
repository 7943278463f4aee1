package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

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
        // Same data, φ = 2 (two units per event): Σφ·E = 120 → τ² = 80/1,200, Z = 20τ²/(20τ² + 2) = 0.4.
        CredibilityRate.Result r = CredibilityRate.combine(new double[]{30, 10, 20}, new double[]{20, 20, 20},
                new double[]{2, 2, 2});
        assertEquals(80.0 / 1200, r.priorVariance(), 1e-12);
        assertEquals(0.4, r.credibility()[0], 1e-12);
        assertArrayEquals(new double[]{1.2, 0.8, 1.0}, r.ratio(), 1e-12);
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
