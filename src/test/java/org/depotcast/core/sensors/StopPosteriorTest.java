package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Shiryaev's change-point posterior with idle spells as the other explanation, on hand-made days after a day in use:
 * short cases worked by hand, longer ones against an independent computation, the sum over every path of hidden states
 * (in use, the j-th day of a spell, down) of its chance, the recursion's model written out path by path.
 */
class StopPosteriorTest {
    private static final double N = Double.NaN;
    private static final double PI = 1.0 / 365;
    /** 112 days read, none near nothing. */
    private static final IdleDays NEVER_IDLE = new IdleDays(112, 0, new int[0]);
    /** Near nothing: 0.25 h, so the classes of hours are 0, up to 0.083, 0.167 and 0.25 h. */
    private static final double NN = 0.25;

    /**
     * 60 pumps that never idle, 30 of them with 5 broken days on record (4 of nothing at all, 1 up to 0.083 h), and 40
     * with spells of 1, 2, 1, 3 and 2 days in 112 days read, their 9 idle days' hours 0, 3 × up to 0.083, 3 × up to
     * 0.167, 2 × up to 0.25 h.
     */
    private static IdleDayPrior spellsOfOneToThreeDays() {
        List<IdleDays> pumps = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            pumps.add(i < 30 ? new IdleDays(112, 0, new int[0], new int[4], new int[]{4, 1, 0, 0})
                    : i < 60 ? NEVER_IDLE : IDLER);
        }
        return IdleDayPrior.pooled(pumps);
    }

    private static final IdleDays IDLER = new IdleDays(112, 9, new int[]{1, 2, 1, 3, 2}, new int[]{1, 3, 3, 2},
            new int[4]);

    @Test
    void theHoursOfANearNothingDayAreWeighedByEachKindsSharesShrunkTowardsBoth() {
        IdleDayPrior prior = spellsOfOneToThreeDays();
        // Idle days by class 40, 120, 120, 80 (360); broken 120, 30, 0, 0 (150). Both, by Laplace: (160 + 1)/514,
        // 151/514, 121/514, 81/514; each kind (n_b + 10 p_b)/(n + 10).
        double[] both = {161.0 / 514, 151.0 / 514, 121.0 / 514, 81.0 / 514};
        double[] idle = {40, 120, 120, 80};
        double[] broken = {120, 30, 0, 0};
        for (int bin = 0; bin < 4; bin++) {
            assertEquals((idle[bin] + 10 * both[bin]) / 370, prior.idleHoursChance(bin), 1e-15);
            assertEquals((broken[bin] + 10 * both[bin]) / 160, prior.brokenHoursChance(bin), 1e-15);
        }
        // A day of nothing at all at a pump that never idles: π f_broken(0) against (1 − π) s f_idle(0).
        double s = prior.spellChance(NEVER_IDLE);
        double down = PI * prior.brokenHoursChance(0);
        assertEquals(down / (down + (1 - PI) * s * prior.idleHoursChance(0)),
                StopPosterior.probabilityDown(new double[]{6, 0}, 0, NN, PI, prior, NEVER_IDLE), 1e-15);
        assertEquals(0, IdleDays.bin(0, NN));
        assertEquals(1, IdleDays.bin(0.08, NN));
        assertEquals(3, IdleDays.bin(0.25, NN));
        assertEquals(1.0, IdleDayPrior.ALONE.idleHoursChance(0) / IdleDayPrior.ALONE.brokenHoursChance(0), 0.0,
                "judged alone, the hours weigh nothing");
    }

    @Test
    void oneNearNothingDayWeighsABreakdownAgainstASpellStarting() {
        IdleDayPrior prior = IdleDayPriorTest.rarelyIdle();
        double s = prior.spellChance(NEVER_IDLE);
        // By hand: D = π, I₁ = (1 − π) s, W = 0 after the near-nothing day.
        assertEquals(PI / (PI + (1 - PI) * s), StopPosterior.probabilityDown(new double[]{6, 0}, 0, NN, PI, prior,
                NEVER_IDLE), 1e-15);
    }

    @Test
    void aCleanStopOfTwoDaysJudgedAloneByHand() {
        // Alone, 28 days read, none near nothing: q = 1/30 for a spell's start and for its going on.
        IdleDays own = new IdleDays(28, 0, new int[0]);
        double q = 1.0 / 30;
        // Day 1: D = π, I₁ = (1 − π) q. Day 2: D = π + π (1 − π) q, I₂ = (1 − π)² q², W = 0 again.
        double down = PI + PI * (1 - PI) * q;
        double expected = down / (down + (1 - PI) * (1 - PI) * q * q);
        assertEquals(expected, StopPosterior.probabilityDown(new double[]{5, 7, 0, 0}, 1, NN, PI, IdleDayPrior.ALONE, own),
                1e-15);
        assertEquals(0.719238, expected, 1e-6);
    }

    @Test
    void aGapIsNoEvidence() {
        IdleDayPrior prior = spellsOfOneToThreeDays();
        // Days with no reading after a day in use: only the prior chance of a breakdown by then, 1 − (1 − π)².
        assertEquals(1 - (1 - PI) * (1 - PI), StopPosterior.probabilityDown(new double[]{6, N, N}, 0, NN, PI, prior,
                NEVER_IDLE), 1e-15);
        // A gap between near-nothing days lets time pass: equal to the path sum, and below a run read every day.
        double[] withGap = {6, 0, N, 0};
        double gapped = StopPosterior.probabilityDown(withGap, 0, NN, PI, prior, NEVER_IDLE);
        assertEquals(byPaths(withGap, PI, prior, NEVER_IDLE), gapped, 1e-12);
        assertTrue(gapped < StopPosterior.probabilityDown(new double[]{6, 0, 0, 0}, 0, NN, PI, prior, NEVER_IDLE));
    }

    @Test
    void longerRunsAgreeWithTheSumOverEveryPathOfHiddenStates() {
        IdleDayPrior prior = spellsOfOneToThreeDays();
        IdleDays idler = IDLER;
        double[][] cases = {{6, 0}, {6, 0, 0}, {6, 0, 0, 0}, {6, 0, 0, 0, 0}, {6, N, 0, 0}, {6, 0, N, N, 0},
                {6, 0.1, 0, N, 0, 0.05}};
        for (double[] days : cases) {
            for (IdleDays own : new IdleDays[]{NEVER_IDLE, idler}) {
                for (double hazard : new double[]{PI, 0.004}) {
                    assertEquals(byPaths(days, hazard, prior, own),
                            StopPosterior.probabilityDown(days, 0, NN, hazard, prior, own), 1e-12);
                }
            }
        }
        // An idle spell of two or three days with some use at a pump with spells on record stays unlikely down.
        double twoDays = StopPosterior.probabilityDown(new double[]{6, 0.2, 0.1}, 0, NN, PI, prior, idler);
        double threeDays = StopPosterior.probabilityDown(new double[]{6, 0.2, 0.1, 0.15}, 0, NN, PI, prior, idler);
        double threeOfNothing = StopPosterior.probabilityDown(new double[]{6, 0, 0, 0}, 0, NN, PI, prior, idler);
        assertTrue(twoDays < 0.2 && threeDays < 0.5, twoDays + " then " + threeDays);
        // Three days of nothing at all, as broken pumps on record mostly show, make it probably down.
        assertTrue(threeOfNothing > 0.9, "three days of nothing: " + threeOfNothing);
    }

    @Test
    void theDailyChanceIsThePoissonChanceOfAtLeastOneBreakdown() {
        // 2e-4 breakdowns an operating hour at 6 h a day: 1 − e^(−0.0012) = 0.00119928.
        assertEquals(0.001199280, StopPosterior.dailyChance(2e-4, 6), 1e-9);
        assertEquals(0, StopPosterior.dailyChance(0, 6));
        assertThrows(IllegalArgumentException.class, () -> StopPosterior.dailyChance(-1e-4, 6));
        assertThrows(IllegalArgumentException.class, () -> StopPosterior.probabilityDown(new double[]{6}, 0, NN, PI,
                IdleDayPrior.ALONE, NEVER_IDLE));
        assertThrows(IllegalArgumentException.class, () -> StopPosterior.probabilityDown(new double[]{6, 0}, 0, NN, 1,
                IdleDayPrior.ALONE, NEVER_IDLE));
    }

    /**
     * P(down on the last day | days) by summing the chance of every path of states from the day in use (index 0):
     * state 0 in use, j > 0 the j-th day of a spell, −1 down; a near-nothing day is impossible in use.
     */
    private static double byPaths(double[] days, double hazard, IdleDayPrior prior, IdleDays own) {
        double[] sums = new double[2];
        walk(days, 1, 0, 1.0, hazard, prior, own, sums);
        return sums[1] / (sums[0] + sums[1]);
    }

    private static void walk(double[] days, int t, int state, double chance, double hazard, IdleDayPrior prior,
                             IdleDays own, double[] sums) {
        if (chance == 0) {
            return;
        }
        if (t == days.length) {
            sums[state < 0 ? 1 : 0] += chance;
            return;
        }
        boolean read = !Double.isNaN(days[t]);
        int bin = read ? IdleDays.bin(days[t], NN) : -1;
        double ifDown = read ? prior.brokenHoursChance(bin) : 1;
        double ifIdle = read ? prior.idleHoursChance(bin) : 1;
        if (state < 0) {
            walk(days, t + 1, -1, chance * ifDown, hazard, prior, own, sums);
            return;
        }
        walk(days, t + 1, -1, chance * hazard * ifDown, hazard, prior, own, sums);
        double start = prior.spellStartChance(own);
        if (state == 0) {
            walk(days, t + 1, 1, chance * (1 - hazard) * start * ifIdle, hazard, prior, own, sums);
            walk(days, t + 1, 0, read ? 0 : chance * (1 - hazard) * (1 - start), hazard, prior, own, sums);
        } else {
            double goesOn = prior.continuing(own, state);
            walk(days, t + 1, state + 1, chance * (1 - hazard) * goesOn * ifIdle, hazard, prior, own, sums);
            walk(days, t + 1, 0, read ? 0 : chance * (1 - hazard) * (1 - goesOn), hazard, prior, own, sums);
        }
    }
}
