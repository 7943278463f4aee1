package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The choice between fleet and history demand on two-month horizons worked by hand: a fleet of one pump expecting 2
 * then 3 units (φ = 1, intercept-only fit with Var(β₀) = 0.01), services of 0.5 units in the first month (variance
 * 0.25, the same for the year).
 */
class DemandChoiceTest {
    private static final PoissonFit FIT = new PoissonFit(new double[]{-6}, new double[]{0.1}, 12, 10, 1.0, 4, true,
            new double[][]{{0.01}});
    private static final DemandChoice.Fleet FLEET = new DemandChoice.Fleet(new double[]{2, 3}, new double[]{2, 3},
            new double[]{2, 3}, FIT);
    private static final double[] SERVICES = {0.5, 0};
    private static final double[] SERVICE_VARIANCE = {0.25, 0, 0.25};
    private static final double[] SHORT_HISTORY = {0, 1, 0, 2, 0, 0};

    private static DemandChoice.Result choose(double[] history, String rule, double[] holdout, CredibilityWeight weight) {
        return DemandChoice.choose(new DemandChoice.Input(history, DemandChoice.Rule.parse(rule), FLEET, holdout, weight,
                SERVICES, SERVICE_VARIANCE));
    }

    @Test
    void underFleetTheFleetsUnitsAsTheyAreWithTheirSpread() {
        CredibilityWeight ignored = new CredibilityWeight(1.5, 0.4, 0.1, 9, 6);
        DemandChoice.Result r = choose(SHORT_HISTORY, "fleet", null, ignored);
        assertTrue(r.fromFleet());
        assertSame(CredibilityWeight.FLEET_ONLY, r.weight(), "only auto applies a credibility ratio");
        assertArrayEquals(new double[]{2.5, 3}, r.monthly(), 1e-12);
        assertEquals(2, r.breakdownPerMonth(), 1e-12);
        // Month m: process + g² Var(β₀) = 2 + 4 × 0.01 and 3 + 9 × 0.01; the two months: 5 + 25 × 0.01.
        assertEquals(2.04, r.variancePerMonth(), 1e-12);
        assertArrayEquals(new double[]{2.29, 3.09}, r.monthlyVariance(), 1e-12);
        assertEquals(5.5, r.yearVariance(), 1e-12);
        assertTrue(Double.isNaN(r.alpha()) && Double.isNaN(r.fleetRmsse()), "no history parameters, no holdout");
    }

    @Test
    void underAutoTheFleetTimesTheCredibilityRatioWithTheRatiosSpread() {
        CredibilityWeight weight = new CredibilityWeight(1.5, 0.4, 0.1, 9, 6);
        DemandChoice.Result r = choose(SHORT_HISTORY, "auto", null, weight);
        assertSame(weight, r.weight());
        assertArrayEquals(new double[]{3.5, 4.5}, r.monthly(), 1e-12);
        // θ process + Var(θ) mean² + (θ² + Var(θ)) g'Σg: 1.5 × 2 + 0.1 × 4 + 2.35 × 0.04 = 3.494;
        // the two months: 1.5 × 5 + 0.1 × 25 + 2.35 × 0.25 = 10.5875, plus the services' 0.25.
        assertEquals(3.494, r.variancePerMonth(), 1e-12);
        assertEquals(3.494 + 0.25, r.monthlyVariance()[0], 1e-12);
        assertEquals(10.8375, r.yearVariance(), 1e-12);
        assertEquals("its rate × 1.50, because 9 units were used here from January 2024 where it expected 6; this "
                + "place's own history carries 40 % of the weight",
                r.weight().describe(LocalDate.of(2024, 1, 1)));
    }

    @Test
    void aNamedMethodTakesTheHistoryEvenWhereTheFleetCovers() {
        double[] history = new double[26];
        for (int m = 0; m < history.length; m++) {
            history[m] = m % 3 == 0 ? 2 : 0;
        }
        double[] holdout = new double[12];
        Arrays.fill(holdout, 0.5);
        DemandChoice.Result r = choose(history, "croston", holdout, CredibilityWeight.FLEET_ONLY);
        SeriesForecast croston = SeriesForecaster.forecast(history, ForecastMethod.CROSTON, Double.NaN, Double.NaN, 2);
        assertFalse(r.fromFleet());
        assertEquals(ForecastMethod.CROSTON, r.historyMethod());
        assertEquals(croston.forecast()[0], r.breakdownPerMonth(), 1e-12);
        assertArrayEquals(new double[]{croston.forecast()[0] + 0.5, croston.forecast()[0]}, r.monthly(), 1e-12);
        // History variances add up over the months: 2 × per month, plus the services'.
        assertEquals(2 * croston.perPeriodVariance() + 0.25, r.yearVariance(), 1e-12);
        // Both sources scored on the last 12 months; the one used (history) is the one chosen.
        double[] training = Arrays.copyOf(history, 14), actual = Arrays.copyOfRange(history, 14, 26);
        assertEquals(ErrorScores.of(training, holdout, actual).rmsse(), r.fleetRmsse(), 1e-12);
        assertEquals(r.historyRmsse(), r.chosenScores().rmsse(), 0.0);
        assertTrue(r.historyRmsse() > 0);
    }

    @Test
    void underFleetWithAHoldoutTheFleetsScoresAreTheChosen() {
        double[] history = {1, 0, 0, 2, 0, 1, 0, 0, 1, 0, 3, 0, 0, 1};
        double[] holdout = new double[12];
        Arrays.fill(holdout, 0.25);
        DemandChoice.Result r = choose(history, "fleet", holdout, CredibilityWeight.FLEET_ONLY);
        assertEquals(r.fleetRmsse(), r.chosenScores().rmsse(), 0.0);
        assertFalse(Double.isNaN(r.fleetRmsse()));
    }

    @Test
    void withoutAFleetExpectationAutoFallsBackToTheHistory() {
        DemandChoice.Result r = DemandChoice.choose(new DemandChoice.Input(SHORT_HISTORY, DemandChoice.Rule.parse("auto"),
                null, null, CredibilityWeight.FLEET_ONLY, SERVICES, SERVICE_VARIANCE));
        assertFalse(r.fromFleet());
        assertEquals(r.monthly()[1], r.breakdownPerMonth(), 1e-12, "a flat history forecast, no services in month 2");
    }

    @Test
    void rulesAreParsedAndUnknownOnesRefused() {
        assertEquals(new DemandChoice.Rule(false, false, ForecastMethod.SBA), DemandChoice.Rule.parse("sba"));
        assertEquals(new DemandChoice.Rule(true, true, null), DemandChoice.Rule.parse("AUTO"));
        assertThrows(IllegalArgumentException.class, () -> DemandChoice.Rule.parse("guess"));
        assertThrows(IllegalArgumentException.class, () -> new DemandChoice.Input(SHORT_HISTORY,
                DemandChoice.Rule.parse("auto"), FLEET, null, CredibilityWeight.FLEET_ONLY, SERVICES, new double[2]));
    }
}
