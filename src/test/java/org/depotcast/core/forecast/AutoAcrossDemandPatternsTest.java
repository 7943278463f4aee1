package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Auto (the median of its five methods' forecasts) against the 12-month mean and against the equal-weight average of
 * the same five, on simulated series of eight demand patterns, 300 of each, 48 months of history and 12 ahead: steady
 * Poisson; sparse and lumpy; going obsolete (demand dying away from a month in the history, the pattern Teunter,
 * Syntetos and Babai 2011 made TSB for); declining; growing; seasonal; a part first used part-way through; and a rate
 * that varies month to month. The patterns are invented to cover the shapes the spare-parts literature describes, not
 * fitted to any data; scored as {@link AutoVersusMeanTest}. Seeded.
 */
class AutoAcrossDemandPatternsTest {
    private interface Pattern {
        double[] draw(SplittableRandom random, int months);
    }

    private static final int HISTORY = 48, HORIZON = 12, SERIES = 300;

    @Test
    void theMedianHoldsUpWhereTheAverageLosesToTheTwelveMonthMean() {
        double[] pooled = new double[6];
        for (Map.Entry<String, Pattern> pattern : patterns().entrySet()) {
            SplittableRandom random = new SplittableRandom(11);
            double[] sums = new double[6];
            int counted = 0;
            for (int s = 0; s < SERIES; s++) {
                double[] y = pattern.getValue().draw(random, HISTORY + HORIZON);
                double[] train = Arrays.copyOf(y, HISTORY);
                double scale = Arrays.stream(train).average().orElse(0);
                if (scale == 0) {
                    continue;
                }
                double auto = perMonth(train, null), mean12 = perMonth(train, ForecastMethod.MEAN12), average = 0;
                for (ForecastMethod part : ForecastMethod.COMBINED_PARTS) {
                    average += perMonth(train, part) / ForecastMethod.COMBINED_PARTS.size();
                }
                double[] forecasts = {auto, mean12, average};
                for (int i = 0; i < 3; i++) {
                    double squared = 0, total = 0;
                    for (int h = 0; h < HORIZON; h++) {
                        double e = forecasts[i] - y[HISTORY + h];
                        squared += e * e;
                        total += y[HISTORY + h];
                    }
                    sums[2 * i] += squared / HORIZON / (scale * scale);
                    sums[2 * i + 1] += Math.abs(forecasts[i] * HORIZON - total) / scale;
                }
                counted++;
            }
            System.out.printf(Locale.ROOT, "AUTO %-22s %d series: scaled squared error auto %.4f, 12-month mean %.4f, "
                            + "average of five %.4f; scaled 12-month total error %.3f, %.3f, %.3f%n", pattern.getKey(),
                    counted, sums[0] / counted, sums[2] / counted, sums[4] / counted, sums[1] / counted,
                    sums[3] / counted, sums[5] / counted);
            for (int i = 0; i < 6; i++) {
                pooled[i] += sums[i] / counted / 8;
            }
            if (pattern.getKey().equals("going obsolete")) {
                // Measured 4 Dec 2026: the average of the five missed the totals of parts going obsolete by 1.37 × the
                // 12-month mean's error (Croston's and the whole-history mean's forecasts do not fall when demand
                // stops); the median by 1.15 ×.
                assertTrue(sums[1] <= 1.2 * sums[3], "obsolete parts' totals: auto " + sums[1] / counted
                        + " against the 12-month mean's " + sums[3] / counted);
            }
        }
        System.out.printf(Locale.ROOT, "AUTO all patterns, equal weight: scaled squared error %.4f / %.4f / %.4f; "
                + "total error %.3f / %.3f / %.3f%n", pooled[0], pooled[2], pooled[4], pooled[1], pooled[3], pooled[5]);
        assertTrue(pooled[0] <= pooled[2] && pooled[1] <= pooled[3], "auto against the 12-month mean");
        assertTrue(pooled[1] <= pooled[5] && pooled[0] <= pooled[4], "median against the average");
    }

    private static double perMonth(double[] history, ForecastMethod method) {
        return SeriesForecaster.forecast(history, method, Double.NaN, Double.NaN, HORIZON).forecast()[0];
    }

    private static Map<String, Pattern> patterns() {
        Map<String, Pattern> p = new LinkedHashMap<>();
        p.put("steady", (r, n) -> rates(r, n, logUniform(r, 0.05, 5), t -> 1));
        p.put("sparse and lumpy", (r, n) -> {
            double rate = 0.03 + 0.3 * r.nextDouble(), stop = 0.25 + 0.5 * r.nextDouble();
            double[] y = new double[n];
            for (int t = 0; t < n; t++) {
                for (int e = poisson(r, rate); e > 0; e--) {
                    y[t] += 1 + geometric(r, stop);
                }
            }
            return y;
        });
        p.put("going obsolete", (r, n) -> {
            int from = 20 + r.nextInt(n - 20);
            return rates(r, n, logUniform(r, 0.2, 5), t -> t < from ? 1 : Math.exp(-(t - from) / 4.0));
        });
        p.put("declining", (r, n) -> {
            double g = -0.03 * r.nextDouble();
            return rates(r, n, logUniform(r, 0.3, 9), t -> Math.exp(g * t));
        });
        p.put("growing", (r, n) -> {
            double g = 0.03 * r.nextDouble();
            return rates(r, n, logUniform(r, 0.1, 3), t -> Math.exp(g * t));
        });
        p.put("seasonal", (r, n) -> {
            double phase = 12 * r.nextDouble();
            return rates(r, n, logUniform(r, 0.3, 9), t -> 1 + 0.6 * Math.cos(2 * Math.PI * (t - phase) / 12));
        });
        p.put("first used part-way", (r, n) -> {
            int from = r.nextInt(30);
            return rates(r, n, logUniform(r, 0.2, 5), t -> t < from ? 0 : 1);
        });
        p.put("rate varying monthly", (r, n) -> rates(r, n, logUniform(r, 0.1, 5),
                t -> (-Math.log(1 - r.nextDouble()) - Math.log(1 - r.nextDouble())) / 2));
        return p;
    }

    private static double[] rates(SplittableRandom random, int months, double rate,
                                  java.util.function.IntToDoubleFunction factor) {
        double[] y = new double[months];
        for (int t = 0; t < months; t++) {
            y[t] = poisson(random, rate * factor.applyAsDouble(t));
        }
        return y;
    }

    private static double logUniform(SplittableRandom random, double low, double high) {
        return Math.exp(Math.log(low) + random.nextDouble() * Math.log(high / low));
    }

    /** Knuth's product-of-uniforms draw (The Art of Computer Programming, vol. 2, 3.4.1); means here stay under 30. */
    private static int poisson(SplittableRandom random, double mean) {
        double limit = Math.exp(-mean), product = random.nextDouble();
        int count = 0;
        while (product > limit) {
            count++;
            product *= random.nextDouble();
        }
        return count;
    }

    private static int geometric(SplittableRandom random, double stop) {
        int count = 0;
        while (random.nextDouble() > stop) {
            count++;
        }
        return count;
    }
}
