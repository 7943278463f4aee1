package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Worked examples; each names where its value comes from. */
class PublishedExamplesTest {
    private static final double[] S3 = {0, 2, 0, 0, 4, 0, 1, 0, 0, 0, 3, 0};

    @Test
    void crostonExampleFromTheForecastIssueTracker() {
        // y = (1,0,0,0,2,0,0), α = 0.1 → 0.8461538: the value discussed on R forecast's issue tracker,
        // re-derived by hand: ẑ = 1 + 0.1(2 − 1) = 1.1, p̂ = 1 + 0.1(4 − 1) = 1.3, 1.1/1.3.
        assertEquals(1.1 / 1.3, Smoothing.croston(new double[]{1, 0, 0, 0, 2, 0, 0}, 0.1, ForecastMethod.CROSTON, null), 1e-12);
    }

    @Test
    void crostonSbaSbjByHand() {
        // Hand-worked: sizes 2,4,1,3 and intervals 2,3,2,4 with α = 0.2 give ẑ = 2.296, p̂ = 2.528.
        double croston = Smoothing.croston(S3, 0.2, ForecastMethod.CROSTON, null);
        assertEquals(2.296 / 2.528, croston, 1e-12);
        assertEquals(0.9082278, croston, 1e-7);
        assertEquals(0.8174051, Smoothing.croston(S3, 0.2, ForecastMethod.SBA, null), 1e-7);
        assertEquals(0.8073136, Smoothing.croston(S3, 0.2, ForecastMethod.SBJ, null), 1e-7);
    }

    @Test
    void tsbByHandWithBothStarts() {
        double[] y = {0, 3, 0, 0, 5};
        // p̂ from 0.4 (mean share): 0.52, 0.416, 0.3328, 0.46624; ẑ: 3, 3, 3, 4 → 1.86496 (hand-worked).
        assertEquals(1.86496, Smoothing.tsb(y, 0.5, 0.2, Smoothing.TsbStart.MEAN, null), 1e-12);
        // p̂ from 0 (first period had no demand): 0.2, 0.16, 0.128, 0.3024 → 1.2096 (hand-worked).
        assertEquals(1.2096, Smoothing.tsb(y, 0.5, 0.2, Smoothing.TsbStart.NAIVE, null), 1e-12);
    }

    @Test
    void classificationBySyntetosBoylanCroston() {
        DemandProfile p = DemandProfile.of(S3);
        assertEquals(2.75, p.adi(), 1e-12);                 // intervals 2,3,2,4 (leading zero counted)
        assertEquals(0.8 / 3.0, p.cv2(), 1e-12);            // sizes 2,4,1,3: s² = 5/3, mean 2.5
        assertEquals(DemandClass.INTERMITTENT, p.demandClass());
        assertEquals(1, p.leadingZeros());
        assertEquals(1, p.trailingZeros());
        assertEquals(DemandClass.SMOOTH, DemandProfile.of(new double[]{3, 4, 3, 5, 4, 3}).demandClass());
        assertEquals(DemandClass.ERRATIC, DemandProfile.of(new double[]{1, 9, 1, 12, 2, 1}).demandClass());
        assertEquals(DemandClass.LUMPY, DemandProfile.of(new double[]{0, 9, 0, 0, 1, 0, 0, 14, 0}).demandClass());
        assertEquals(DemandClass.TOO_LITTLE_HISTORY, DemandProfile.of(new double[]{0, 0, 5, 0}).demandClass());
    }

    @Test
    void scaledErrorsByHand() {
        // Train (0,2,0,1,0,0,3,0): naive |diffs| 2,2,1,1,0,3,3 (mean 12/7), squares mean 4.
        // Test (0,1,0,0) with flat 0.5: mean |e| 0.5 → MASE 0.5/(12/7) = 0.291667; RMSSE √(0.25/4) = 0.25.
        ErrorScores s = ErrorScores.of(new double[]{0, 2, 0, 1, 0, 0, 3, 0}, new double[]{0.5, 0.5, 0.5, 0.5},
                new double[]{0, 1, 0, 0});
        assertEquals(7.0 / 24.0, s.mase(), 1e-12);
        assertEquals(0.25, s.rmsse(), 1e-12);
        assertEquals((0.5 - 0.25) / 0.75, s.scaledBias(), 1e-12);
    }

    @Test
    void poissonRegressionClosedForm() {
        // Two groups, one binary covariate: the MLE is the log of each group's events per hour.
        // Shallow 10 events in 10,000 h, deep 16 in 8,000 h → intercept log(0.001), deep effect log 2.
        double[][] x = {{0}, {1}};
        PoissonFit fit = PoissonRegression.fit(x, new double[]{10, 16}, new double[]{10_000, 8_000});
        assertEquals(Math.log(0.001), fit.coefficients()[0], 1e-9);
        assertEquals(Math.log(2), fit.coefficients()[1], 1e-9);
        // Standard errors: √(1/10) and √(1/10 + 1/16) in closed form.
        assertEquals(Math.sqrt(0.1), fit.standardErrors()[0], 1e-9);
        assertEquals(Math.sqrt(0.1 + 1.0 / 16), fit.standardErrors()[1], 1e-9);
    }

    @Test
    void singularDesignIsRefused() {
        double[][] constant = {{1, 2}, {1, 2}, {1, 2}, {1, 2}};
        assertThrows(PoissonRegression.SingularDesignException.class,
                () -> PoissonRegression.fit(constant, new double[]{1, 2, 3, 4}, new double[]{1, 1, 1, 1}));
    }

    @Test
    void empiricalBayesShrinksSmallGroupsMore() {
        // Hand-worked with Marshall's estimator: O = (30, 2, 10), E = (20, 4, 10): m = 42/34,
        // s² = Σ E (O/E − m)² / ΣE, A = s² − m/ē. The group with E = 4 moves most toward m.
        double[] o = {30, 2, 10}, e = {20, 4, 10};
        double m = 42.0 / 34.0;
        double s2 = (20 * Math.pow(1.5 - m, 2) + 4 * Math.pow(0.5 - m, 2) + 10 * Math.pow(1.0 - m, 2)) / 34.0;
        double a = s2 - m / (34.0 / 3);
        double[] shrunk = RateShrinkage.shrink(o, e);
        assertEquals(m + a / (a + m / 20) * (1.5 - m), shrunk[0], 1e-12);
        assertEquals(m + a / (a + m / 4) * (0.5 - m), shrunk[1], 1e-12);
        assertTrue(Math.abs(shrunk[1] - 0.5) > Math.abs(shrunk[0] - 1.5));
        // No spread beyond Poisson noise: everything shrinks to the common ratio.
        double[] flat = RateShrinkage.shrink(new double[]{10, 11, 9}, new double[]{10, 10, 10});
        assertEquals(1.0, flat[0], 1e-12);
        assertEquals(1.0, flat[2], 1e-12);
    }

    @Test
    void badArgumentsAreNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SeriesForecaster.forecast(new double[]{1, -2}, null, Double.NaN, Double.NaN, 3));
        assertTrue(e.getMessage().startsWith("history[1]"));
        assertThrows(IllegalArgumentException.class, () -> SeriesForecaster.forecast(new double[]{1}, null, 1.5, Double.NaN, 3));
        assertThrows(IllegalArgumentException.class, () -> SeriesForecaster.forecast(new double[]{1}, null, 0.1, Double.NaN, 61));
        assertThrows(IllegalArgumentException.class, () -> SeriesForecaster.forecast(new double[0], null, 0.1, Double.NaN, 1));
    }
}
