package org.depotcast.core.spend;

import org.apache.commons.math3.distribution.PoissonDistribution;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SpendSimulationTest {
    private static final double[] NO_SD = {0, 0};
    private static final double[] POISSON = {1, 1};

    @Test
    void monteCarloQuantilesOfAPoissonSumMatchTheExactOnes() {
        // Three lines with means 4, 7 and 9 at one unit and price 1: the total is Poisson(20) (sum of independent
        // Poissons). With 20,000 draws a quantile's Monte Carlo standard error is about √(p(1−p)/N)/f(q) ≈ 0.05
        // units, so on integer-valued draws the estimate must fall on the exact quantile or next to it.
        SpendLine[] lines = {new SpendLine(0, 0, 0, 0, 4, 1, 0, 1), new SpendLine(0, 0, 1, 0, 7, 1, 0, 1),
                new SpendLine(0, 1, 2, 0, 9, 1, 0, 1)};
        SpendDraws draws = SpendSimulation.run(lines, 1, 2, 3, 1, NO_SD, POISSON, 20_000, 11);
        SpendSimulation.Summary s = SpendSimulation.Summary.of(draws.total(0));
        PoissonDistribution exact = new PoissonDistribution(20);
        assertEquals(exact.inverseCumulativeProbability(0.10), s.p10(), 1.0);
        assertEquals(exact.inverseCumulativeProbability(0.50), s.p50(), 1.0);
        assertEquals(exact.inverseCumulativeProbability(0.90), s.p90(), 1.0);
        assertEquals(exact.inverseCumulativeProbability(0.975), s.p97_5(), 1.0);
        assertEquals(20, s.mean(), 4 * s.meanStandardError());
        assertEquals(Math.sqrt(20.0 / 20_000), s.meanStandardError(), 0.005);
    }

    @Test
    void meanSpendIsTheClosedForm() {
        // 120 pumps × 0.2 breakdowns per 1,000 h × 1,825 h × 2 units × 1.40 = 122.64, plus 30 certain units × 1.40.
        double events = 120 * 0.2 / 1000 * 1825;
        SpendLine[] lines = {new SpendLine(0, 0, 0, 0, events, 2, 30, 1.40)};
        SpendSimulation.Summary s = SpendSimulation.Summary.of(
                SpendSimulation.run(lines, 1, 1, 1, 1, new double[]{0}, new double[]{1}, 10_000, 3).total(0));
        assertEquals(events * 2 * 1.40 + 30 * 1.40, s.mean(), 4 * s.meanStandardError());
    }

    @Test
    void sameSeedSameNumbers() {
        SpendLine[] lines = {new SpendLine(0, 0, 0, 0, 12.5, 1, 0, 3), new SpendLine(1, 1, 1, 1, 80, 2, 5, 7)};
        double[] sd = {0.2, 0.1}, phi = {1, 1.8};
        SpendDraws a = SpendSimulation.run(lines, 2, 2, 2, 2, sd, phi, 3_000, 99);
        SpendDraws b = SpendSimulation.run(lines, 2, 2, 2, 2, sd, phi, 3_000, 99);
        assertArrayEquals(a.total(1), b.total(1));
        assertArrayEquals(a.part(0, 0), b.part(0, 0));
    }

    @Test
    void rateUncertaintyAndOverdispersionWidenTheRange() {
        SpendLine[] lines = {new SpendLine(0, 0, 0, 0, 40, 1, 0, 1)};
        SpendSimulation.Summary plain = SpendSimulation.Summary.of(
                SpendSimulation.run(lines, 1, 1, 1, 1, new double[]{0}, new double[]{1}, 10_000, 5).total(0));
        SpendSimulation.Summary uncertain = SpendSimulation.Summary.of(
                SpendSimulation.run(lines, 1, 1, 1, 1, new double[]{0.3}, new double[]{1}, 10_000, 5).total(0));
        assertTrue(uncertain.p97_5() - uncertain.p2_5() > 1.5 * (plain.p97_5() - plain.p2_5()));
        // The lognormal multiplier has mean one: the expected spend does not move.
        assertEquals(40, uncertain.mean(), 4 * uncertain.meanStandardError());
        double[] nb = SpendSimulation.run(lines, 1, 1, 1, 1, new double[]{0}, new double[]{2.5}, 20_000, 5).total(0);
        double mean = 0, sq = 0;
        for (double v : nb) {
            mean += v;
            sq += v * v;
        }
        mean /= nb.length;
        double variance = sq / nb.length - mean * mean;
        assertEquals(2.5, variance / mean, 0.15);
    }
}
