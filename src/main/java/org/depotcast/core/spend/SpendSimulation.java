package org.depotcast.core.spend;

import org.depotcast.core.stats.SampleQuantile;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Monte Carlo projection of parts spend. Each draw first samples every group's rate multiplier from a mean-one
 * lognormal, exp(σ_g Z − σ_g²/2), σ_g the standard error of the group's log rate (parameter uncertainty: a small
 * fleet gets a wider range); then each line's breakdowns from a Poisson with mean (expected × multiplier), or, when
 * the group is overdispersed (variance factor φ &gt; 1), from a gamma–Poisson (negative binomial) with variance
 * φ × mean. Spend = (breakdowns × units per breakdown + certain units) × unit price, summed into totals per year,
 * per group, per part and per depot. Draws are split into fixed blocks, each with its own generator split from the
 * seed, so results are identical on every run and on any number of threads.
 *
 * <p>Poisson sampling: sequential inversion for means below 50; above, the normal approximation N(λ, λ) rounded and
 * truncated at zero (skewness 1/√λ &lt; 0.15 there), stated because it trades a little tail accuracy for speed.
 */
public final class SpendSimulation {
    private static final int BLOCK = 250;
    private static final double NORMAL_FROM = 50;

    private SpendSimulation() {
    }

    /**
     * @param groupLogSd       σ per group (0 for no parameter uncertainty)
     * @param groupDispersion  φ per group (1 for Poisson)
     * @return the draws of every aggregate, see {@link SpendDraws}
     */
    public static SpendDraws run(SpendLine[] lines, int years, int groups, int parts, int depots, double[] groupLogSd,
                                 double[] groupDispersion, int draws, long seed) {
        if (draws < 2 || years < 1) {
            throw new IllegalArgumentException("need at least 2 draws and 1 year");
        }
        SpendDraws out = new SpendDraws(years, groups, parts, depots, draws);
        int blocks = (draws + BLOCK - 1) / BLOCK;
        SplittableRandom root = new SplittableRandom(seed);
        long[] blockSeeds = new long[blocks];
        for (int b = 0; b < blocks; b++) {
            blockSeeds[b] = root.nextLong();
        }
        java.util.stream.IntStream.range(0, blocks).parallel().forEach(b -> {
            SplittableRandom random = new SplittableRandom(blockSeeds[b]);
            double[] multiplier = new double[groups];
            // One draw's sums gather here and are written to the draw's column once: adding every line straight
            // into the draw columns touched four far-apart arrays per line and the cache misses were most of the time.
            SpendDraws.Column column = out.column();
            for (int d = b * BLOCK; d < Math.min(draws, (b + 1) * BLOCK); d++) {
                for (int g = 0; g < groups; g++) {
                    double s = groupLogSd[g];
                    multiplier[g] = s > 0 ? Math.exp(s * gaussian(random) - s * s / 2) : 1.0;
                }
                for (SpendLine line : lines) {
                    double mean = line.expectedEvents() * multiplier[line.group()];
                    double phi = groupDispersion[line.group()];
                    double events = phi > 1 ? negativeBinomial(random, mean, phi) : poisson(random, mean);
                    double spend = (events * line.unitsPerEvent() + line.deterministicUnits()) * line.unitPrice();
                    column.add(line, spend);
                }
                column.writeTo(d);
            }
        });
        return out;
    }

    static double poisson(SplittableRandom random, double mean) {
        if (mean <= 0) {
            return 0;
        }
        if (mean >= NORMAL_FROM) {
            return Math.max(0, Math.rint(mean + Math.sqrt(mean) * gaussian(random)));
        }
        double u = random.nextDouble(), p = Math.exp(-mean), cumulative = p;
        int k = 0;
        while (u > cumulative && k < 10_000) {
            k++;
            p *= mean / k;
            cumulative += p;
        }
        return k;
    }

    /** Gamma–Poisson mixture with mean m and variance φm: rate ~ Gamma(shape m/(φ−1), scale φ−1). */
    static double negativeBinomial(SplittableRandom random, double mean, double phi) {
        if (mean <= 0) {
            return 0;
        }
        double shape = mean / (phi - 1);
        return poisson(random, gamma(random, shape) * (phi - 1));
    }

    /** Marsaglia &amp; Tsang (2000), ACM TOMS 26(3):363–372, with the boost for shape &lt; 1. */
    static double gamma(SplittableRandom random, double shape) {
        if (shape < 1) {
            return gamma(random, shape + 1) * Math.pow(random.nextDouble(), 1 / shape);
        }
        double d = shape - 1.0 / 3, c = 1 / Math.sqrt(9 * d);
        while (true) {
            double x = gaussian(random), v = 1 + c * x;
            if (v <= 0) {
                continue;
            }
            v = v * v * v;
            double u = random.nextDouble();
            if (u < 1 - 0.0331 * x * x * x * x || Math.log(u) < 0.5 * x * x + d * (1 - v + Math.log(v))) {
                return d * v;
            }
        }
    }

    static double gaussian(SplittableRandom random) {
        double u1 = 1 - random.nextDouble(), u2 = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }

    /** Summary of a set of draws. */
    public record Summary(double mean, double p2_5, double p10, double p50, double p90, double p97_5,
                          double meanStandardError) {
        public static Summary of(double[] draws) {
            double[] sorted = draws.clone();
            Arrays.sort(sorted);
            double sum = 0, sumSq = 0;
            for (double v : sorted) {
                sum += v;
                sumSq += v * v;
            }
            int n = sorted.length;
            double mean = sum / n;
            double sd = Math.sqrt(Math.max(0, (sumSq - n * mean * mean) / (n - 1)));
            return new Summary(mean, SampleQuantile.of(sorted, 0.025), SampleQuantile.of(sorted, 0.10),
                    SampleQuantile.median(sorted), SampleQuantile.of(sorted, 0.90), SampleQuantile.of(sorted, 0.975),
                    sd / Math.sqrt(n));
        }
    }
}
