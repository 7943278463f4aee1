package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The smoothing-constant search scores each grid point by {@link Smoothing#oneStepMse}, which must give exactly the
 * number that fitting the series and taking {@link Smoothing#meanSquaredError} of its fitted values gives (bit for
 * bit: stored forecasts may not change with the faster search).
 */
class OneStepErrorTest {
    private static final ForecastMethod[] SEARCHED = {ForecastMethod.CROSTON, ForecastMethod.SBA, ForecastMethod.SBJ,
            ForecastMethod.TSB, ForecastMethod.SES};

    @Test
    void theSearchScoresEveryGridPointExactlyAsTheFittedValuesDo() {
        int compared = 0;
        for (double[] y : series()) {
            for (ForecastMethod method : SEARCHED) {
                for (double alpha = 0.01; alpha <= 1.0; alpha += 0.07) {
                    for (double beta : method.usesBeta() ? new double[]{0.05, 0.2, 0.5} : new double[]{Double.NaN}) {
                        double[] fitted = new double[y.length];
                        SeriesFitter.run(y, method, alpha, beta, fitted);
                        double expected = Smoothing.meanSquaredError(y, fitted);
                        double actual = Smoothing.oneStepMse(y, method, alpha, beta);
                        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                                method + " α " + alpha + " β " + beta + ": " + expected + " vs " + actual);
                        compared++;
                    }
                }
            }
        }
        assertEquals(7 * (15 * 4 + 15 * 3), compared);
    }

    /** Intermittent, lumpy, smooth, all zero, a single period and a single demand at the end. */
    private static List<double[]> series() {
        SplittableRandom random = new SplittableRandom(12);
        List<double[]> all = new ArrayList<>();
        for (double share : new double[]{0.1, 0.4, 0.9}) {
            double[] y = new double[72];
            for (int t = 0; t < y.length; t++) {
                y[t] = random.nextDouble() < share ? 1 + random.nextInt(share < 0.5 ? 12 : 3) : 0;
            }
            all.add(y);
        }
        all.add(new double[36]);
        all.add(new double[]{3});
        double[] late = new double[24];
        late[23] = 2;
        all.add(late);
        all.add(new double[]{0, 0, 5, 0, 0.5, 0, 0, 0, 7});
        return all;
    }
}
