package org.depotcast.forecasting;

import org.apache.commons.math3.distribution.PoissonDistribution;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** One series scored by hand: the service's stored 12-month total and the 12-month-mean benchmark against an actual. */
class AccuracyScoringTest {

    @Test
    void aSeriesIsScoredAgainstItsActualTotal() {
        double[] history = new double[24];
        // The last 12 months hold 18 units: the 12-month mean is 1.5 a month, 18 over the year.
        for (int m = 12; m < 24; m += 2) {
            history[m] = 3;
        }
        history[3] = 5; // earlier months do not count for the 12-month mean
        AccuracyScoring.Forecast f = new AccuracyScoring.Forecast("P-1", "DEP-A", 12, 12, history);

        AccuracyResults.Row row = AccuracyScoring.row(f, "DEPOT", 15);

        // Service: a 12-month total of 12 with variance 12 → Poisson(12); error 12 − 15 = −3.
        assertEquals(12.0, row.service().forecast(), 1e-12);
        assertEquals(-3.0, row.service().error(), 1e-12);
        PoissonDistribution poisson12 = new PoissonDistribution(12); // Commons Math as the outside reference
        assertEquals(poisson12.inverseCumulativeProbability(0.10), row.service().low80(), 1e-12);
        assertEquals(poisson12.inverseCumulativeProbability(0.90), row.service().high80(), 1e-12);
        assertEquals(poisson12.inverseCumulativeProbability(0.975), row.service().high95(), 1e-12);
        assertTrue(row.service().inside80(), "15 lies in [8, 17]");
        // 12-month mean: 18 − 15 = 3.
        assertEquals(18.0, row.mean12().forecast(), 1e-9);
        assertEquals(3.0, row.mean12().error(), 1e-9);
        assertTrue(row.croston().forecast() > 0);
    }

    @Test
    void summariesPerLevelAndMethodByHand() {
        double[] none = new double[12];
        // Service forecasts 6 at both depots; actuals 4 and 10 → errors 2 and −4: MAE 3, mean error −1,
        // total bias (12 − 14)/14 = −14.29 %.
        List<AccuracyResults.Row> rows = List.of(
                AccuracyScoring.row(new AccuracyScoring.Forecast("P", "DEP-A", 6, 6, none), "DEPOT", 4),
                AccuracyScoring.row(new AccuracyScoring.Forecast("P", "DEP-B", 6, 6, none), "DEPOT", 10));
        AccuracyResults.LevelSummary service = AccuracyScoring.summaries(rows).stream()
                .filter(s -> s.method().equals(AccuracyResults.SERVICE)).findFirst().orElseThrow();
        assertEquals("DEPOT", service.level());
        assertEquals(2, service.series());
        assertEquals(3.0, service.mae(), 1e-12);
        assertEquals(-1.0, service.meanError(), 1e-12);
        assertEquals(100 * (12.0 - 14.0) / 14.0, service.totalBiasPercent(), 1e-9);
        // No history: the benchmarks forecast 0, so their MAE is the mean actual, 7.
        AccuracyResults.LevelSummary mean12 = AccuracyScoring.summaries(rows).stream()
                .filter(s -> s.method().equals(AccuracyResults.MEAN12)).findFirst().orElseThrow();
        assertEquals(7.0, mean12.mae(), 1e-12);
        assertEquals(-100.0, mean12.totalBiasPercent(), 1e-12);
    }
}
