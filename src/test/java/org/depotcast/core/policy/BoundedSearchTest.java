package org.depotcast.core.policy;

import org.junit.jupiter.api.Test;

import java.time.Duration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Quantile and fill-rate searches cost a few dozen evaluations whatever the demand, and agree with plain sums. */
class BoundedSearchTest {

    @Test
    void negativeBinomialLossInClosedFormMatchesTheSumOverThePmf() {
        for (double[] mv : new double[][]{{0.4, 0.9}, {3, 7.5}, {12, 60}, {40, 41}}) {
            NegativeBinomialDemand d = new NegativeBinomialDemand(mv[0], mv[1]);
            for (int s = 0; s <= 80; s++) {
                // G(s) = Σ_{k>s} (k − s) p(k), summed far into the tail.
                double sum = 0;
                for (int k = s + 1; k < 5000; k++) {
                    sum += (k - s) * d.pmf(k);
                }
                assertEquals(sum, d.expectedShortfall(s), 1e-9 * Math.max(1, sum), "m=" + mv[0] + " s=" + s);
            }
        }
    }

    @Test
    void quantilesAreTheSmallestWholeNumberReachingTheLevel() {
        NegativeBinomialDemand d = new NegativeBinomialDemand(5, 15);
        for (double p : new double[]{0.01, 0.5, 0.9, 0.95, 0.999}) {
            int k = (int) d.quantile(p);
            assertTrue(d.cdf(k) >= p - 1e-14, "F(k) reaches p");
            assertTrue(k == 0 || d.cdf(k - 1) < p - 1e-14, "F(k − 1) does not");
        }
    }

    @Test
    void largeDemandsAreSearchedQuickly() {
        // A walk one unit at a time took tens of seconds at a mean of 1e9; bisection takes about 60 evaluations.
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> {
            for (DemandDistribution d : new DemandDistribution[]{new PoissonDemand(1e6), new NegativeBinomialDemand(1e6, 4e6),
                    new NormalDemand(1e9, 1e12)}) {
                double csl = ReorderPoint.of(d, 0.95, ReorderPoint.Target.CYCLE_SERVICE_LEVEL, 1).reorderPoint();
                double fill = ReorderPoint.of(d, 0.999, ReorderPoint.Target.FILL_RATE, 10).reorderPoint();
                assertTrue(csl > d.mean() && fill > d.mean(), d.name());
                double sd = Math.sqrt(d.variance());
                assertEquals(d.mean() + 1.645 * sd, csl, 0.01 * sd + 1, d.name());
            }
        });
    }

    @Test
    void fillRateSearchGivesTheSmallestReorderPointReachingTheTarget() {
        PoissonDemand d = new PoissonDemand(6);
        ReorderPoint.Result r = ReorderPoint.of(d, 0.98, ReorderPoint.Target.FILL_RATE, 4);
        assertTrue(r.fillRate() >= 0.98);
        assertTrue(ReorderPoint.fillRate(d, r.reorderPoint() - 1, 4) < 0.98);
        assertEquals(7, ReorderPoint.smallestReaching(k -> k >= 7));
        assertEquals(0, ReorderPoint.smallestReaching(k -> true));
        assertEquals(1_000_001, ReorderPoint.smallestReaching(k -> k > 1_000_000));
    }
}
