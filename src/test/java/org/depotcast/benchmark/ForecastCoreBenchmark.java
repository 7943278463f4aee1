package org.depotcast.benchmark;

import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.PoissonRegression;
import org.depotcast.core.forecast.Smoothing;
import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Issue 3 core figures, single thread, no framework: Croston, SBA and TSB over 100,000 series of 120 months
 * (target &lt; 2 s on one core), and a Poisson GLM on 100,000 pump-year rows with 4 covariates (target &lt; 1 s).
 */
class ForecastCoreBenchmark {
    private static final int SERIES = 100_000;
    private static final int MONTHS = 120;

    @Test
    void intermittentMethodsOverManySeries() {
        SplittableRandom random = new SplittableRandom(1);
        double[][] series = new double[SERIES][MONTHS];
        for (double[] y : series) {
            double p = 0.05 + 0.5 * random.nextDouble();
            for (int t = 0; t < MONTHS; t++) {
                y[t] = random.nextDouble() < p ? 1 + random.nextInt(5) : 0;
            }
        }
        for (String method : new String[]{"CROSTON", "SBA", "TSB"}) {
            double[] seconds = new double[5];
            double checksum = 0;
            for (int round = 0; round < seconds.length; round++) {
                long start = System.nanoTime();
                for (double[] y : series) {
                    checksum += method.equals("TSB") ? Smoothing.tsb(y, 0.1, 0.1, Smoothing.TsbStart.MEAN, null)
                            : Smoothing.croston(y, 0.1, ForecastMethod.valueOf(method), null);
                }
                seconds[round] = (System.nanoTime() - start) / 1e9;
            }
            assertTrue(checksum > 0);
            Figures.report(String.format("%s, 100,000 series × 120 months, fixed α, one thread: median %.3f s over 5 rounds",
                    method, Figures.median(seconds)));
        }
    }

    @Test
    void poissonRegressionOnManyRows() {
        SplittableRandom random = new SplittableRandom(2);
        int n = 100_000;
        double[][] x = new double[n][4];
        double[] counts = new double[n], exposure = new double[n];
        for (int i = 0; i < n; i++) {
            x[i][0] = Math.log((10 + 80 * random.nextDouble()) / 30);
            x[i][1] = 15 * random.nextDouble();
            x[i][2] = 1 + 9 * random.nextDouble();
            x[i][3] = random.nextDouble() < 0.3 ? 1 : 0;
            exposure[i] = 365 * x[i][2];
            double mean = exposure[i] * Math.exp(Math.log(2e-4) + 0.5 * x[i][0] + 0.03 * x[i][1] + 0.2 * x[i][3]);
            double limit = Math.exp(-mean), product = random.nextDouble();
            while (product > limit) {
                counts[i]++;
                product *= random.nextDouble();
            }
        }
        double[] seconds = new double[5];
        PoissonFit fit = null;
        for (int round = 0; round < seconds.length; round++) {
            long start = System.nanoTime();
            fit = PoissonRegression.fit(x, counts, exposure);
            seconds[round] = (System.nanoTime() - start) / 1e9;
        }
        assertTrue(fit.converged());
        Figures.report(String.format("Poisson GLM, 100,000 rows × 4 covariates: median %.3f s over 5 rounds (%d IRLS iterations)",
                Figures.median(seconds), fit.iterations()));
    }
}
