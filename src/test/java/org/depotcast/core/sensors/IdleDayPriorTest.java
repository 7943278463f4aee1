package org.depotcast.core.sensors;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** The programme's idle spells (beta-binomial moments, Kleinman 1973; spell lengths by Laplace's rule), hand-worked. */
class IdleDayPriorTest {
    private static List<IdleDays> pumps(int n, int read, int... spells) {
        int idle = 0;
        for (int s : spells) {
            idle += s;
        }
        return new ArrayList<>(Collections.nCopies(n, new IdleDays(read, idle, spells)));
    }

    /** 100 pumps read 112 days, 90 with no spell and 10 with five one-day spells. */
    static IdleDayPrior rarelyIdle() {
        List<IdleDays> all = pumps(90, 112);
        all.addAll(pumps(10, 112, 1, 1, 1, 1, 1));
        return IdleDayPrior.pooled(all);
    }

    @Test
    void aProgrammeWhosePumpsDifferIsFittedByMoments() {
        IdleDayPrior prior = rarelyIdle();
        // μ̂ = 50/11200; S = 90·112·μ̂² + 10·112·(5/112 − μ̂)² = 2.008929; with equal days read the estimate is the
        // textbook one, ρ̂ = (S/(μ̂(1 − μ̂)) − 99)/(99·111) = 0.0321247, so a + b = 1/ρ̂ − 1 = 30.128730; the mean by
        // Laplace's rule over all days, 51/11202: a = 0.137169, b = 29.991561.
        assertEquals(0.137169, prior.a(), 1e-6);
        assertEquals(29.991561, prior.b(), 1e-6);
        assertEquals(0.000965103, prior.spellChance(new IdleDays(112, 0, new int[0])), 1e-9);
        // 50 spells, none of two days: L(2) = (0 + 1)/(50 + 2), L(3) = L(2)·(0 + 1)/(0 + 2).
        assertEquals(1.0 / 52, prior.lasting(2), 1e-12);
        assertEquals(1.0 / 104, prior.lasting(3), 1e-12);
        assertEquals(0.000965103 / 52, prior.chanceOfRun(new IdleDays(112, 0, new int[0]), 2), 1e-9);
    }

    @Test
    void spellLengthsAreTheProgrammesOwn() {
        List<IdleDays> all = pumps(30, 100);
        all.addAll(pumps(10, 100, 1, 2, 3));
        IdleDayPrior prior = IdleDayPrior.pooled(all);
        // 30 spells: 30 of 1+ days, 20 of 2+, 10 of 3+, none of 4.
        assertEquals(21.0 / 32, prior.lasting(2), 1e-12);
        assertEquals(21.0 / 32 * 11 / 22, prior.lasting(3), 1e-12);
        assertEquals(21.0 / 32 * 11 / 22 / 12, prior.lasting(4), 1e-12);
    }

    @Test
    void aProgrammeWithNoIdleDayWeighsAsMuchAsOnePumpsRecordAndNoMore() {
        IdleDayPrior prior = IdleDayPrior.pooled(pumps(40, 100));
        // No pump differs: the weight is the median days read, 100; the mean (0 + 1)/(4000 + 2).
        assertEquals(100, prior.a() + prior.b(), 1e-9);
        assertEquals(100.0 / 4002, prior.a(), 1e-12);
        // A pump with no spell in 100 days: s = 0.024988/200, far below a breakdown's 1/365 a day.
        assertEquals(100.0 / 4002 / 200, prior.spellChance(new IdleDays(100, 0, new int[0])), 1e-12);
        // Pumps that differ widely (half with a spell every other day): μ̂ = 0.25, S = 250, ρ̂ = (250/0.1875 − 39)/(39·99)
        // = 0.335232, a + b = 1.983003 days.
        int[] everyOther = new int[50];
        java.util.Arrays.fill(everyOther, 1);
        List<IdleDays> wild = pumps(20, 100);
        wild.addAll(pumps(20, 100, everyOther));
        assertEquals(1.983003, IdleDayPrior.pooled(wild).a() + IdleDayPrior.pooled(wild).b(), 1e-6);
    }

    @Test
    void tooFewPumpsToPoolAreJudgedAloneByLaplacesRule() {
        assertSame(IdleDayPrior.ALONE, IdleDayPrior.pooled(pumps(29, 100)));
        List<IdleDays> withUnread = pumps(29, 100);
        withUnread.addAll(pumps(11, 0));
        assertSame(IdleDayPrior.ALONE, IdleDayPrior.pooled(withUnread), "pumps with no day read do not count");
        // Independent days: ((z + 1)/(m + 2))ⁿ.
        assertEquals(1.0 / 900, IdleDayPrior.ALONE.chanceOfRun(new IdleDays(28, 0, new int[0]), 2),
                1e-12);
    }

    @Test
    void brokenContractsNameTheArgument() {
        assertThrows(IllegalArgumentException.class,
                () -> rarelyIdle().chanceOfRun(new IdleDays(28, 0, new int[0]), 0));
    }
}
