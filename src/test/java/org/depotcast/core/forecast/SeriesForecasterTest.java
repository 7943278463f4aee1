package org.depotcast.core.forecast;

import org.depotcast.core.policy.DemandDistribution;
import org.junit.jupiter.api.Test;

import java.util.Arrays;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SeriesForecasterTest {
    private static double[] poissonSeries(double mean, int n, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] y = new double[n];
        for (int t = 0; t < n; t++) {
            double limit = Math.exp(-mean), product = random.nextDouble();
            while (product > limit) {
                y[t]++;
                product *= random.nextDouble();
            }
        }
        return y;
    }

    @Test
    void autoBacktestsEveryCandidateAndReportsScores() {
        SeriesForecast f = SeriesForecaster.forecastScored(poissonSeries(0.4, 72, 3), null, Double.NaN, Double.NaN, 6);
        double[] y = poissonSeries(0.4, 72, 3);
        assertEquals(7, f.backtest().size());
        // Unscored: the same forecast, method and spread, and no scores.
        SeriesForecast unscored = SeriesForecaster.forecast(y, null, Double.NaN, Double.NaN, 6);
        assertTrue(unscored.backtest().isEmpty());
        assertEquals(f.method(), unscored.method());
        assertEquals(f.forecast()[0], unscored.forecast()[0], 0.0);
        assertEquals(f.perPeriodVariance(), unscored.perPeriodVariance(), 0.0);
        assertEquals(6, f.forecast().length);
        assertEquals(ForecastMethod.COMBINED, f.method());
        // The combination is the median of its five parts' forecasts: the third of them in order.
        double[] parts = ForecastMethod.COMBINED_PARTS.stream()
                .mapToDouble(part -> SeriesFitter.fitOptimised(y, part, Double.NaN, Double.NaN).perPeriod()).sorted()
                .toArray();
        assertEquals(5, parts.length);
        assertEquals(parts[2], f.forecast()[0], 1e-12);
        assertTrue(parts[0] < parts[2] && parts[2] < parts[4], "the parts differ on this series: " + Arrays.toString(parts));
        // The 12-period mean: the last 12 values' mean.
        double last12 = 0;
        for (int t = 60; t < 72; t++) {
            last12 += y[t];
        }
        assertEquals(last12 / 12, Smoothing.movingMean(y, 12, null), 1e-12);
        assertEquals(2.0, Smoothing.movingMean(new double[]{1, 3}, 12, null), 1e-12);
        // Forecast of a stationary Poisson(0.4) series stays near its rate.
        assertEquals(0.4, f.forecast()[0], 0.2);
    }

    @Test
    void optimisedAlphaFitsNoWorseThanAFixedOne() {
        double[] y = poissonSeries(0.8, 60, 11);
        FittedSeries free = SeriesFitter.fitOptimised(y, ForecastMethod.SBA, Double.NaN, Double.NaN);
        FittedSeries fixed = SeriesFitter.fit(y, ForecastMethod.SBA, 0.3, Double.NaN);
        assertTrue(free.alpha() >= 0.05 && free.alpha() <= 0.5);
        assertTrue(free.inSampleMse() <= fixed.inSampleMse() + 1e-12);
        FittedSeries tsb = SeriesFitter.fitOptimised(y, ForecastMethod.TSB, Double.NaN, Double.NaN);
        assertFalse(Double.isNaN(tsb.beta()));
    }

    @Test
    void tsbFallsDuringAPhaseOutWhileCrostonStaysPut() {
        double[] y = new double[48];
        for (int t = 0; t < 24; t += 2) {
            y[t] = 2;
        }
        double croston = Smoothing.croston(y, 0.2, ForecastMethod.CROSTON, null);
        double tsb = Smoothing.tsb(y, 0.2, 0.2, Smoothing.TsbStart.MEAN, null);
        assertTrue(tsb < 0.05, "TSB decays over 24 empty periods: " + tsb);
        assertTrue(croston > 0.5, "Croston only updates at demand: " + croston);
    }

    @Test
    void horizonDemandIsPoissonOrOverdispersed() {
        SeriesForecast steady = SeriesForecaster.forecast(new double[]{1, 1, 1, 1, 1, 1, 1, 1}, ForecastMethod.POISSON,
                Double.NaN, Double.NaN, 3);
        DemandDistribution d = steady.demandOver(3);
        assertEquals("poisson", d.name());
        assertEquals(3.0, d.mean(), 1e-12);
        SeriesForecast lumpy = SeriesForecaster.forecast(new double[]{0, 12, 0, 0, 0, 9, 0, 0, 15, 0, 0, 0}, ForecastMethod.SBA,
                0.1, Double.NaN, 3);
        assertEquals("negative-binomial", lumpy.demandOver(3).name());
        assertTrue(lumpy.demandOver(3).variance() > lumpy.demandOver(3).mean());
    }
}
