package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.util.Locale;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Auto against the plain mean of the last 12 months on simulated spare-part series: intermittent Poisson and
 * lumpy (compound) demand, half of the series with a level shift somewhere in their history. Scored as the issue's
 * benchmark: squared error per month scaled by the square of the series' history mean, and the absolute error of the
 * 12-month total scaled by the same mean, averaged over series. Seeded, so the figures are reproducible.
 */
class AutoVersusMeanTest {
    @Test
    void autoDoesNotLoseToTheTwelveMonthMean() {
        SplittableRandom random = new SplittableRandom(42);
        int series = 600, history = 48, horizon = 12;
        double autoSq = 0, meanSq = 0, autoTotal = 0, meanTotal = 0;
        int counted = 0;
        for (int s = 0; s < series; s++) {
            double rate = Math.exp(Math.log(0.05) + random.nextDouble() * Math.log(100));
            boolean lumpy = random.nextDouble() < 0.4;
            int shiftAt = random.nextDouble() < 0.5 ? 6 + random.nextInt(history + horizon - 6) : Integer.MAX_VALUE;
            double factor = Math.exp(0.8 * gaussian(random));
            double[] y = new double[history + horizon];
            for (int t = 0; t < y.length; t++) {
                double r = t >= shiftAt ? rate * factor : rate;
                int events = poisson(random, r);
                for (int e = 0; e < events; e++) {
                    y[t] += lumpy ? 1 + poisson(random, 2) : 1;
                }
            }
            double[] train = java.util.Arrays.copyOf(y, history);
            double scale = java.util.Arrays.stream(train).average().orElse(0);
            if (scale == 0) {
                continue;
            }
            double auto = SeriesForecaster.forecast(train, null, Double.NaN, Double.NaN, horizon).forecast()[0];
            double mean = SeriesForecaster.forecast(train, ForecastMethod.MEAN12, Double.NaN, Double.NaN, horizon).forecast()[0];
            double sa = 0, sm = 0, total = 0;
            for (int h = 0; h < horizon; h++) {
                double actual = y[history + h];
                sa += (auto - actual) * (auto - actual);
                sm += (mean - actual) * (mean - actual);
                total += actual;
            }
            autoSq += sa / horizon / (scale * scale);
            meanSq += sm / horizon / (scale * scale);
            autoTotal += Math.abs(auto * horizon - total) / scale;
            meanTotal += Math.abs(mean * horizon - total) / scale;
            counted++;
        }
        System.out.printf(Locale.ROOT, "auto vs 12-month mean on %d simulated series: scaled squared error %.4f vs %.4f; "
                + "scaled 12-month total error %.3f vs %.3f%n", counted, autoSq / counted, meanSq / counted,
                autoTotal / counted, meanTotal / counted);
        assertTrue(autoSq <= meanSq, "scaled squared error: auto " + autoSq / counted + " vs mean " + meanSq / counted);
        assertTrue(autoTotal <= meanTotal, "12-month totals: auto " + autoTotal / counted + " vs mean " + meanTotal / counted);
    }

    private static double gaussian(SplittableRandom random) {
        double u1 = 1 - random.nextDouble(), u2 = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }

    private static int poisson(SplittableRandom random, double mean) {
        double limit = Math.exp(-mean), product = random.nextDouble();
        int count = 0;
        while (product > limit) {
            count++;
            product *= random.nextDouble();
        }
        return count;
    }
}
