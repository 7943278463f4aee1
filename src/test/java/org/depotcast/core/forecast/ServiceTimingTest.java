package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Service timing under uncertain load: with no uncertainty it is {@link PreventiveSchedule}'s answer; with it, the
 * closed forms (log-normal tail and partial expectation) agree with a simulation of the same model.
 */
class ServiceTimingTest {
    private static final double INTERVAL = 9125;
    private static final double[] HOURS = monthly(150, 12);

    private static double[] monthly(double hours, int months) {
        double[] out = new double[months];
        java.util.Arrays.fill(out, hours);
        return out;
    }

    @Test
    void withoutUncertaintyItIsTheDeterministicSchedule() {
        ServiceTiming.Outlook known = ServiceTiming.outlook(HOURS, INTERVAL, 8500, true, 0, 12);
        assertArrayEquals(PreventiveSchedule.servicesDuePerMonth(8500, HOURS, INTERVAL), known.expected(), 1e-12);
        assertEquals(0, known.yearVariance(), 1e-12, "a certain service has no variance");
        ServiceTiming.Outlook overdue = ServiceTiming.outlook(HOURS, INTERVAL, 9300, true, 0, 12);
        assertArrayEquals(PreventiveSchedule.servicesDuePerMonth(9300, HOURS, INTERVAL), overdue.expected(), 1e-12);
        ServiceTiming.Outlook unknown = ServiceTiming.outlook(HOURS, INTERVAL, 3000, false, 0, 12);
        assertArrayEquals(PreventiveSchedule.expectedServices(HOURS, INTERVAL, 3000), unknown.expected(), 1e-12);
    }

    @Test
    void knownLastServiceMatchesASimulationOfTheUsageMultiplier() {
        double sigma = 0.2, since = 8300;
        ServiceTiming.Outlook outlook = ServiceTiming.outlook(HOURS, INTERVAL, since, true, sigma, 12);
        double[][] simulated = simulate(sigma, u -> INTERVAL - since);
        assertMoments(outlook, simulated);
    }

    @Test
    void unknownPhaseMatchesASimulationOfAUniformPlaceInTheCycle() {
        double sigma = 0.3, without = 4000;
        ServiceTiming.Outlook outlook = ServiceTiming.outlook(HOURS, INTERVAL, without, false, sigma, 12);
        double[][] simulated = simulate(sigma, u -> u * (INTERVAL - without));
        assertMoments(outlook, simulated);
    }

    /** Per draw: U log-normal (mean 1), first threshold from {@code first}; services every interval after it. */
    private static double[][] simulate(double sigma, java.util.function.DoubleUnaryOperator first) {
        SplittableRandom random = new SplittableRandom(42);
        int draws = 200_000;
        double[] sum = new double[12], sumSq = new double[12];
        double yearSum = 0, yearSq = 0;
        for (int i = 0; i < draws; i++) {
            double z = Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
            double u = Math.exp(sigma * z - sigma * sigma / 2);
            double threshold = first.applyAsDouble(random.nextDouble());
            double cumulative = 0;
            int year = 0;
            for (int m = 0; m < 12; m++) {
                double before = cumulative;
                cumulative += u * HOURS[m];
                int count = 0;
                for (double t = threshold; t <= cumulative; t += INTERVAL) {
                    count += t > before || (m == 0 && t <= 0) ? 1 : 0;
                }
                sum[m] += count;
                sumSq[m] += count * count;
                year += count;
            }
            yearSum += year;
            yearSq += year * year;
        }
        double[][] out = new double[3][12];
        for (int m = 0; m < 12; m++) {
            out[0][m] = sum[m] / draws;
            out[1][m] = sumSq[m] / draws - out[0][m] * out[0][m];
        }
        out[2][0] = yearSq / draws - (yearSum / draws) * (yearSum / draws);
        return out;
    }

    private static void assertMoments(ServiceTiming.Outlook outlook, double[][] simulated) {
        for (int m = 0; m < 12; m++) {
            assertEquals(simulated[0][m], outlook.expected()[m], 0.005, "expected services in month " + m);
            assertEquals(simulated[1][m], outlook.variance()[m], 0.005, "variance in month " + m);
        }
        assertEquals(simulated[2][0], outlook.yearVariance(), 0.005, "variance of the year's count");
    }

    @Test
    void coefficientCovarianceIsRsVcovOfThePublishedExample() {
        // METHODS sheet, Poisson regression check [C, R glm]: SE intercept 0.589128, depth 0.0132193.
        double[][] depth = {{20}, {25}, {30}, {45}, {50}, {60}, {35}, {40}};
        double[] hours = {2000, 3000, 5000, 1000, 3000, 4000, 2500, 3500};
        double[] counts = {2, 3, 5, 3, 4, 9, 3, 4};
        PoissonFit fit = PoissonRegression.fit(depth, counts, hours);
        assertEquals(0.589128 * 0.589128, fit.covariance()[0][0], 1e-5);
        assertEquals(0.0132193 * 0.0132193, fit.covariance()[1][1], 1e-8);
        assertEquals(fit.covariance()[0][1], fit.covariance()[1][0], 1e-15);
        // Var(β₀ + 40·β₁) by the delta method equals the quadratic form of the covariance.
        double expected = fit.covariance()[0][0] + 2 * 40 * fit.covariance()[0][1] + 1600 * fit.covariance()[1][1];
        assertEquals(expected, fit.linearVariance(new double[]{1, 40}), 1e-12);
    }
}
