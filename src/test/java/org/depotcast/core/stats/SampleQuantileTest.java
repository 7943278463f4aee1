package org.depotcast.core.stats;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class SampleQuantileTest {
    @Test
    void medianIsTheMiddleValueOrTheMeanOfTheTwoMiddleOnes() {
        assertEquals(3, SampleQuantile.median(new double[]{1, 3, 8}));
        assertEquals(5.5, SampleQuantile.median(new double[]{1, 3, 8, 20}));
        assertEquals(4, SampleQuantile.median(new double[]{4}));
    }

    /** R 4.2.2: quantile(c(1, 2, 4, 7, 11), c(0.1, 0.9)) gives 1.4 and 9.4 (type 7; by hand, h = 0.4 and 3.6). */
    @Test
    void interpolatesBetweenOrderStatisticsAsRsDefault() {
        double[] x = {1, 2, 4, 7, 11};
        assertEquals(1.4, SampleQuantile.of(x, 0.1), 1e-12);
        assertEquals(9.4, SampleQuantile.of(x, 0.9), 1e-12);
        assertEquals(1, SampleQuantile.of(x, 0));
        assertEquals(11, SampleQuantile.of(x, 1));
    }

    /** Commons Math 3.6.1's Percentile with estimation type R_7 is the same estimator. */
    @Test
    void agreesWithCommonsMathsTypeSeven() {
        SplittableRandom random = new SplittableRandom(3);
        Percentile reference = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        for (int n : new int[]{1, 2, 7, 100, 1001}) {
            double[] x = random.doubles(n, -5, 50).sorted().toArray();
            for (double p : new double[]{0.025, 0.1, 0.5, 0.9, 0.975}) {
                assertEquals(reference.evaluate(Arrays.copyOf(x, n), 100 * p), SampleQuantile.of(x, p), 1e-9,
                        "n = " + n + ", p = " + p);
            }
        }
    }

    @Test
    void refusesNoValuesOrAProbabilityOutsideZeroToOne() {
        assertThrows(IllegalArgumentException.class, () -> SampleQuantile.median(new double[0]));
        assertThrows(IllegalArgumentException.class, () -> SampleQuantile.of(new double[]{1}, 1.5));
    }
}
