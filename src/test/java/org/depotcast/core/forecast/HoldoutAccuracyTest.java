package org.depotcast.core.forecast;

import org.depotcast.core.policy.PoissonDemand;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Scores of held-out totals on a case small enough to check by hand. */
class HoldoutAccuracyTest {

    @Test
    void rangesAreTheCentralQuantilesOfThePoisson() {
        // R 4.2.2: qpois(c(0.10, 0.90, 0.025, 0.975), 10) = 6 14 4 17; qpois(..., 4) = 2 7 1 8.
        HoldoutAccuracy.Scored ten = HoldoutAccuracy.score(new PoissonDemand(10), 7);
        assertEquals(new HoldoutAccuracy.Range(6, 14), ten.range80());
        assertEquals(new HoldoutAccuracy.Range(4, 17), ten.range95());
        HoldoutAccuracy.Scored four = HoldoutAccuracy.score(new PoissonDemand(4), 8);
        assertEquals(new HoldoutAccuracy.Range(2, 7), four.range80());
        assertEquals(new HoldoutAccuracy.Range(1, 8), four.range95());
        assertTrue(four.range95().holds(8), "both ends belong to the range");
    }

    @Test
    void maeBiasAndCoverageByHand() {
        // Forecasts 10, 4, 0 (Poisson); actuals 7, 8, 2.
        List<HoldoutAccuracy.Scored> series = List.of(HoldoutAccuracy.score(new PoissonDemand(10), 7),
                HoldoutAccuracy.score(new PoissonDemand(4), 8), HoldoutAccuracy.score(new PoissonDemand(0), 2));
        HoldoutAccuracy.Summary s = HoldoutAccuracy.summarise(series);
        // errors F − A: 3, −4, −2 → MAE (3 + 4 + 2)/3 = 3; mean error (3 − 4 − 2)/3 = −1
        assertEquals(3, s.series());
        assertEquals(3.0, s.mae(), 1e-12);
        assertEquals(-1.0, s.meanError(), 1e-12);
        // ΣF = 14, ΣA = 17 → total bias (14 − 17)/17 = −0.1764706
        assertEquals(14, s.forecastTotal(), 1e-12);
        assertEquals(17, s.actualTotal(), 1e-12);
        assertEquals(-3.0 / 17, s.totalBias(), 1e-12);
        // 7 in [6, 14] and [4, 17]; 8 outside [2, 7] but inside [1, 8]; 2 outside [0, 0] for both
        assertEquals(1.0 / 3, s.coverage80(), 1e-12);
        assertEquals(2.0 / 3, s.coverage95(), 1e-12);
    }

    @Test
    void noActualDemandLeavesTheBiasUndefined() {
        HoldoutAccuracy.Summary s = HoldoutAccuracy.summarise(List.of(HoldoutAccuracy.score(new PoissonDemand(2), 0)));
        assertTrue(Double.isNaN(s.totalBias()));
        assertEquals(2.0, s.mae(), 1e-12);
        // P(X ≤ 0) = e^-2 = 0.135 ≥ 0.10 for Poisson(2), so q(0.10) = 0 and an actual of 0 is inside the 80 % range.
        assertTrue(HoldoutAccuracy.score(new PoissonDemand(2), 0).range80().holds(0));
    }

    @Test
    void badInputIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> HoldoutAccuracy.summarise(List.of()));
        assertThrows(IllegalArgumentException.class, () -> new HoldoutAccuracy.Scored(-1, 0,
                new HoldoutAccuracy.Range(0, 0), new HoldoutAccuracy.Range(0, 0)));
    }
}
