package org.depotcast.core.policy;

import org.apache.commons.csv.CSVRecord;
import org.apache.commons.math3.distribution.PascalDistribution;
import org.apache.commons.math3.distribution.PoissonDistribution;
import org.depotcast.core.Fixtures;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DemandDistributionTest {

    @Test
    void poissonAgainstTheCumulativeTable() {
        // Cumulative Poisson, mean 4: F(7) = 0.9489, F(8) = 0.9786 as tabled in standard cumulative Poisson tables
        // (e.g. the appendix tables of Silver, Pyke & Thomas 2017; four decimals, from memory), six decimals here
        // from Commons Math.
        PoissonDemand d = new PoissonDemand(4);
        assertEquals(0.9489, d.cdf(7), 5e-5);
        assertEquals(0.9786, d.cdf(8), 5e-5);
        assertEquals(0.948866, d.cdf(7), 1e-6);
        assertEquals(0.978637, d.cdf(8), 1e-6);
        assertEquals(8, d.quantile(0.95));
        assertEquals(7, d.quantile(0.90));
        // Loss G(x) = (m − x)(1 − F(x)) + m p(x), hand-worked: G(7) = 0.084761, G(8) = 0.033627.
        assertEquals(0.084761, d.expectedShortfall(7), 1e-6);
        assertEquals(0.033627, d.expectedShortfall(8), 1e-6);
        assertEquals(4.0, d.expectedShortfall(0), 1e-12);
    }

    @Test
    void lossBelowZeroCountsTheUnitsAlreadyOwed() {
        // D ≥ 0, so for x ≤ 0 G(x) = E(D − x)⁺ = m − x: a position of −2 is two units short before any demand.
        assertEquals(6.0, new PoissonDemand(4).expectedShortfall(-2), 1e-12);
        assertEquals(7.0, new NegativeBinomialDemand(4, 8).expectedShortfall(-3), 1e-12);
        assertEquals(4.0, new NegativeBinomialDemand(4, 8).expectedShortfall(0), 1e-12);
    }

    @Test
    void poissonAgreesWithCommonsMathEverywhere() {
        for (double m : new double[]{0.2, 1.7, 6.0, 25.0}) {
            PoissonDistribution reference = new PoissonDistribution(m);
            PoissonDemand d = new PoissonDemand(m);
            for (int k = 0; k < 60; k++) {
                assertEquals(reference.cumulativeProbability(k), d.cdf(k), 1e-12);
            }
            for (double p : new double[]{0.5, 0.9, 0.95, 0.99}) {
                assertEquals(reference.inverseCumulativeProbability(p), d.quantile(p), 0);
            }
        }
    }

    @Test
    void negativeBinomialAgreesWithCommonsMathForWholeSize() {
        // mean 4, variance 8 → r = m²/(v − m) = 4, p = m/v = 0.5: Commons Math's Pascal distribution counts failures the same way.
        NegativeBinomialDemand d = new NegativeBinomialDemand(4, 8);
        PascalDistribution reference = new PascalDistribution(4, 0.5);
        for (int k = 0; k < 40; k++) {
            assertEquals(reference.cumulativeProbability(k), d.cdf(k), 1e-12);
        }
        // Hand-worked check values: F(8) = 0.927002, F(9) = 0.953857 → s = 9 at 95%.
        assertEquals(0.927002, d.cdf(8), 1e-6);
        assertEquals(0.953857, d.cdf(9), 1e-6);
        assertEquals(9, d.quantile(0.95));
    }

    @Test
    void quantilesAgreeWithR() {
        for (CSVRecord r : Fixtures.read("distributions.csv")) {
            DemandDistribution d = DemandDistribution.fromMoments(Double.parseDouble(r.get("mean")),
                    Double.parseDouble(r.get("variance")));
            assertEquals(r.get("dist"), d.name());
            double p = Double.parseDouble(r.get("p"));
            assertEquals(Double.parseDouble(r.get("quantile")), d.quantile(p), 0, r.toString());
            assertEquals(Double.parseDouble(r.get("cdf_at_quantile")), d.cdf(d.quantile(p)), 1e-9, r.toString());
        }
    }

    @Test
    void zeroMeanIsNoDemand() {
        DemandDistribution none = DemandDistribution.fromMoments(0, 3);
        assertEquals("poisson", none.name());
        assertEquals(0, none.quantile(0.99));
        assertEquals(1.0, none.cdf(0), 0);
    }

    @Test
    void lossIsTheSumOfTheTail() {
        NegativeBinomialDemand d = new NegativeBinomialDemand(2.5, 7.0);
        for (int x = 0; x < 10; x++) {
            double tail = 0;
            for (int k = x + 1; k < 400; k++) {
                tail += (k - x) * d.pmf(k);
            }
            assertEquals(tail, d.expectedShortfall(x), 1e-10);
        }
    }

    @Test
    void unitNormalLossAgainstTheTable() {
        // Unit normal loss G_u(k), as tabled in Silver, Pyke & Thomas (2017), appendix (values from memory,
        // recomputed here to six decimals).
        assertEquals(0.398942, NormalDemand.unitLoss(0), 1e-6);
        assertEquals(0.083315, NormalDemand.unitLoss(1), 1e-6);
        assertEquals(0.008491, NormalDemand.unitLoss(2), 1e-6);
        NormalDemand d = new NormalDemand(100, 400);
        assertEquals(100 + 20 * 1.6448536269514722, d.quantile(0.95), 1e-9);
        assertTrue(d.cdf(100) > 0.4999 && d.cdf(100) < 0.5001);
    }
}
