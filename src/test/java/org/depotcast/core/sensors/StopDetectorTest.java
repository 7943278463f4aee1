package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Page's CUSUM (1954) on hand-made series, worked by hand with the default settings (baseline 28 days, watch 14,
 * k = 0.5σ, h = 4σ as in Montgomery 2009 §9.1.3, prior 1/365 a day).
 */
class StopDetectorTest {
    private final StopDetector detector = new StopDetector(StopSettings.DEFAULT);

    /** 28 baseline days alternating 5 and 7 h: μ₀ = 6, s = √(28/27) = 1.018350, so k = 0.509175, h = 4.073401. */
    private static double[] series(double... watch) {
        double[] hours = new double[42];
        for (int i = 0; i < 28; i++) {
            hours[i] = i % 2 == 0 ? 5 : 7;
        }
        System.arraycopy(watch, 0, hours, 28, 14);
        return hours;
    }

    private static double[] repeat(double value, int times) {
        double[] out = new double[times];
        Arrays.fill(out, value);
        return out;
    }

    private static double[] join(double[]... parts) {
        return Arrays.stream(parts).flatMapToDouble(Arrays::stream).toArray();
    }

    @Test
    void aCleanStopIsFlaggedOnItsFirstDayWithTheProbabilityOfTwoIdleDays() {
        StopDetector.Verdict v = detector.judge(series(join(repeat(6, 12), repeat(0, 2))));
        // Day 40: S = 0 + (6 − 0.509175) − 0 = 5.490825 > h = 4.073401, and S stood at 0 on day 39.
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(40, v.changeIndex());
        assertEquals(6.0, v.baselineMean(), 1e-12);
        assertEquals(1.018350, v.baselineSd(), 1e-6);
        // No idle day in 28 read: q = (0 + 1)/(28 + 2) = 1/30, judged alone as independent days; π = 1/365. Shiryaev's
        // posterior over the two days (StopPosterior): down π + π(1 − π)q (broken on day 1, or idle then broken on day
        // 2) against idle both days (1 − π)²q²: 0.719238 (the run rule of 3 Dec, π/(π + (1 − π)q²), gave 0.712025).
        double down = 1.0 / 365 + (1.0 / 365) * (364.0 / 365) / 30;
        assertEquals(down / (down + (364.0 / 365) * (364.0 / 365) / 900), v.probabilityDown(), 1e-12);
        assertEquals(0.719238, v.probabilityDown(), 1e-6);
        assertEquals(2, v.nearNothingDays());
    }

    @Test
    void thePumpsOwnBreakdownRateSetsTheDailyHazard() {
        double[] hours = series(join(repeat(6, 12), repeat(0, 2)));
        // 5e-4 breakdowns an operating hour at μ₀ = 6 h a day: π = 1 − e^(−0.003) = 0.00299551, above 1/365, so the
        // same two days are likelier a breakdown than with the flat prior.
        double pi = -Math.expm1(-0.003), q = 1.0 / 30;
        double down = pi + pi * (1 - pi) * q;
        double expected = down / (down + (1 - pi) * (1 - pi) * q * q);
        assertEquals(expected, detector.judge(hours, IdleDayPrior.ALONE, 5e-4).probabilityDown(), 1e-12);
        assertEquals(0.737002, expected, 1e-6);
        assertEquals(detector.judge(hours).probabilityDown(),
                detector.judge(hours, IdleDayPrior.ALONE, Double.NaN).probabilityDown(), 0.0, "no rate: 1/365");
    }

    @Test
    void aPumpIdleEverySeventhDayIsWatchedAtItsLevelInUseAndIsLessLikelyDown() {
        double[] hours = new double[42];
        for (int i = 0; i < 28; i++) {
            hours[i] = i % 7 == 6 ? 0 : 6;
        }
        System.arraycopy(join(repeat(6, 11), repeat(0, 3)), 0, hours, 28, 14);
        StopDetector.Verdict v = detector.judge(hours);
        // The level in use is read from the 24 days in use: μ₀ = 6, s = 0, so σ = its floor 0.1 μ₀ = 0.6; k = 0.3,
        // h = 2.4; the first idle day adds 5.7 > h → the signal and the change on day 39.
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(39, v.changeIndex());
        assertEquals(6.0, v.baselineMean(), 1e-12);
        assertEquals(0.0, v.baselineSd(), 1e-12);
        // 4 idle days of 28: q = 5/30 = 1/6; three idle days, by the recursion (checked in Python, independent days):
        // down π + π(1 − π)q + π(1 − π)²q², idle (1 − π)³q³: 0.416000.
        double pi = 1.0 / 365, q = 1.0 / 6;
        double down = pi + pi * (1 - pi) * q + pi * (1 - pi) * (1 - pi) * q * q;
        assertEquals(down / (down + Math.pow((1 - pi) * q, 3)), v.probabilityDown(), 1e-12);
        assertEquals(0.416000, v.probabilityDown(), 1e-6);
    }

    @Test
    void noReadingInTheLastThreeDaysIsATransmissionGapNotAStop() {
        double[] hours = series(join(repeat(6, 9), repeat(0, 2), repeat(Double.NaN, 3)));
        assertEquals(StopDetector.State.NO_DATA, detector.judge(hours).state());
        // Two missing days at the end are not yet a gap: the zeros before them are judged.
        double[] shorter = series(join(repeat(6, 9), repeat(0, 3), repeat(Double.NaN, 2)));
        assertEquals(StopDetector.State.STOPPED, detector.judge(shorter).state());
    }

    @Test
    void aGradualDeclineIsToldFromAStop() {
        double[] watch = new double[14];
        for (int i = 0; i < 14; i++) {
            watch[i] = 5.5 - 0.35 * i;
        }
        // S: 0 (5.5), 0.340825, 1.031650, 2.072475, 3.463300, 5.204125 > h on day 33; S last 0 on day 28 → change 29.
        StopDetector.Verdict v = detector.judge(series(watch));
        assertEquals(StopDetector.State.DECLINING, v.state());
        assertEquals(29, v.changeIndex());
        assertEquals(0.0, v.probabilityDown());
    }

    @Test
    void noiseAndADipThatRecoversAreNormalUse() {
        assertEquals(StopDetector.State.IN_USE, detector.judge(series(join(repeat(5, 1), repeat(7, 1), repeat(5, 1),
                repeat(7, 1), repeat(4.5, 1), repeat(7.5, 1), repeat(5, 1), repeat(7, 1), repeat(5, 1), repeat(7, 1),
                repeat(4.2, 1), repeat(6, 1), repeat(5.5, 1), repeat(6, 1)))).state());
        StopDetector.Verdict dip = detector.judge(series(join(repeat(6, 8), repeat(0, 2), repeat(6, 4))));
        assertEquals(StopDetector.State.IN_USE, dip.state());
        assertEquals(36, dip.changeIndex());
    }

    @Test
    void tooLittleBaselineIsSaid() {
        double[] hours = series(repeat(6, 14));
        for (int i = 0; i < 20; i++) {
            hours[i] = Double.NaN;
        }
        assertEquals(StopDetector.State.TOO_LITTLE_DATA, detector.judge(hours).state());
        assertEquals(StopDetector.State.TOO_LITTLE_DATA, detector.judge(join(repeat(0, 28), repeat(0, 14))).state());
    }

    @Test
    void aStopSoonAfterALongRepairIsJudgedAgainstTheUseBeforeThatBreakdown() {
        // 70 days: 30 in use alternating 5 and 7 h, 30 days of a recorded breakdown (left out: NaN, as
        // RecordedDowntime leaves them), then 8 days of use at 6 h and 2 days of nothing. The 28 days before the 14
        // watched (days 28–55) hold only 2 days read, too little to judge; the baseline reaches back past the
        // breakdown to the 28 days read before the watched days, days 2–29: μ₀ = 6, s = √(28/27), and the sum
        // signals on day 68 as in the first test (S = 6 − 0.509175 > h = 4.073401).
        double[] hours = new double[70];
        for (int i = 0; i < 30; i++) {
            hours[i] = i % 2 == 0 ? 5 : 7;
        }
        Arrays.fill(hours, 30, 60, Double.NaN);
        Arrays.fill(hours, 60, 68, 6);
        Arrays.fill(hours, 68, 70, 0);
        StopDetector.Verdict v = detector.judge(hours);
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(68, v.changeIndex());
        assertEquals(6.0, v.baselineMean(), 1e-12);
        assertEquals(Math.sqrt(28.0 / 27), v.baselineSd(), 1e-12);
        assertEquals(2, v.nearNothingDays());
    }

    @Test
    void brokenContractsNameTheArgument() {
        assertThrows(IllegalArgumentException.class, () -> detector.judge(new double[10]));
        assertThrows(IllegalArgumentException.class, () -> new StopSettings(28, 14, 3, 0.5, 4, 0.1, 10, 0,
                112));
        assertThrows(IllegalArgumentException.class, () -> new StopSettings(28, 14, 3, 0.5, 4, 0.1, 10,
                1.0 / 365, 20));
        assertThrows(IllegalArgumentException.class, () -> detector.judge(new double[127]));
    }

    /**
     * A programme of 100 pumps read 112 days each, 90 never idle and 10 with five one-day spells ({@link IdleDayPriorTest}):
     * spells start Beta(0.137169, 29.991561); no spell lasted two days, so L(2) = 1/52, L(3) = 1/104.
     */
    private static final IdleDayPrior RARELY_IDLE = IdleDayPriorTest.rarelyIdle();

    /** 112 days alternating 5 and 7 h (0.1 h on the given days), 13 days of 6 h, then one day of nothing. */
    private static double[] oneDayOfNothingAfter(int... idleDays) {
        double[] hours = new double[126];
        for (int i = 0; i < 112; i++) {
            hours[i] = i % 2 == 0 ? 5 : 7;
        }
        for (int d : idleDays) {
            hours[d] = 0.1;
        }
        Arrays.fill(hours, 112, 125, 6);
        hours[125] = 0;
        return hours;
    }

    @Test
    void oneDayOfNothingIsEnoughAtAPumpThatNeverIdlesInAProgrammeThatRarelyDoes() {
        StopDetector.Verdict v = detector.judge(oneDayOfNothingAfter(), RARELY_IDLE);
        // Day 125: S = 6 − 0.509175 − 0 > h. No spell in 112 days read: s = 0.137169/(112 + 30.128730) = 0.000965103;
        // P = π/(π + (1 − π) s) = 0.740030.
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(125, v.changeIndex());
        assertEquals(1, v.nearNothingDays());
        assertEquals(0.740030, v.probabilityDown(), 1e-6);
        // Judged alone (Laplace's rule, q = 1/114), the same day leaves 0.238: a second day is needed.
        assertEquals(1 / (1 + 364.0 / 114), detector.judge(oneDayOfNothingAfter()).probabilityDown(), 1e-12);
    }

    @Test
    void theSameDayAtAPumpThatIdlesOftenIsNotEnough() {
        int[] idle = new int[20];
        for (int i = 0; i < 20; i++) {
            idle[i] = 4 * i + 1;
        }
        double[] hours = oneDayOfNothingAfter(idle);
        IdleDays history = detector.idleDays(hours);
        assertEquals(112, history.read());
        assertEquals(20, history.idle());
        assertEquals(20, history.spells().length);
        StopDetector.Verdict v = detector.judge(hours, RARELY_IDLE);
        // 20 spells in 112 days: s = 20.137169/142.128730 = 0.141683; one day P = 0.019021.
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(0.019021, v.probabilityDown(), 1e-6);
        // Two days: no spell of the programme lasted two, so a spell goes on with chance 1/52; down π + π(1 − π)s
        // against idle (1 − π)²s/52: P = 0.535730 (the run rule of 3 Dec gave 0.502064).
        hours[124] = 0;
        assertEquals(0.535730, detector.judge(hours, RARELY_IDLE).probabilityDown(), 1e-6);
    }

    @Test
    void aNearNothingDayIsWeighedEvenBeforeTheSumSignals() {
        // Baseline alternating 2 and 10 h: μ₀ = 6, s = 4.073401, h = 16.29; one day of nothing adds 3.96 < h.
        double[] hours = oneDayOfNothingAfter();
        for (int i = 0; i < 112; i++) {
            hours[i] = i % 2 == 0 ? 2 : 10;
        }
        StopDetector.Verdict v = detector.judge(hours);
        assertEquals(StopDetector.State.STOPPED, v.state());
        assertEquals(125, v.changeIndex());
        assertEquals(1 / (1 + 364.0 / 114), v.probabilityDown(), 1e-12);
    }
}
