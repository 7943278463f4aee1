package org.depotcast.core.forecast;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The fleet rate model: rate per hour of a pump profile, depot ratios, expected units over calendar months, and the
 * log rate's standard error by the delta method.
 */
class FleetRateModelTest {
    /**
     * Two groups, closed form (METHODS sheet, Poisson regression): a pump at the reference 30 m has 10 breakdowns in
     * 10,000 h, one at 60 m (log_depth = log 2) 16 in 8,000 h. The saturated fit gives the group rates 0.001 and
     * 0.002 per hour exactly, and the standard error of each group's log rate is 1/√(its count) (Agresti 2013,
     * Categorical Data Analysis, 3rd ed., §3.3: Var(log μ̂) ≈ 1/μ̂ for a Poisson count).
     */
    private static FleetRateModel twoDepths(Map<Long, Double> depotRatios) {
        double[][] x = {{0}, {Math.log(2)}};
        PoissonFit fit = PoissonRegression.fit(x, new double[]{10, 16}, new double[]{10_000, 8_000});
        return new FleetRateModel(List.of(RateCovariate.LOG_DEPTH), fit, 1e-4, 2.0, 26, 18_000, depotRatios);
    }

    @Test
    void rateOfAPumpProfileFollowsTheFit() {
        FleetRateModel model = twoDepths(Map.of());
        assertEquals(0.001, model.ratePerHour(30, 4, 5), 1e-12);
        assertEquals(0.002, model.ratePerHour(60, 9, 2), 1e-12);
        // log_depth is linear in log depth: 120 m is two doublings, four times the reference rate.
        assertEquals(0.004, model.ratePerHour(120, 0, 5), 1e-12);
        assertEquals("fit", model.source());
    }

    @Test
    void aPumpsRateAtItsDepotCarriesTheDepotsRatio() {
        // Depot 7 breaks down 1.5 times as often as the fleet; depot 8 has no ratio kept, so the fleet's rate stands.
        FleetRateModel model = twoDepths(Map.of(7L, 1.5));
        assertEquals(0.0015, model.ratePerHourAtDepot(7, 30, 4, 5), 1e-12);
        assertEquals(0.003, model.ratePerHourAtDepot(7, 60, 4, 5), 1e-12);
        assertEquals(0.002, model.ratePerHourAtDepot(8, 60, 4, 5), 1e-12);
    }

    @Test
    void logRateStandardErrorByTheDeltaMethod() {
        FleetRateModel model = twoDepths(Map.of());
        assertEquals(1 / Math.sqrt(10), model.logRateStandardError(model.covariateValues(30, 0, 5)), 1e-6);
        assertEquals(1 / Math.sqrt(16), model.logRateStandardError(model.covariateValues(60, 0, 5)), 1e-6);
        // A sum of units over both groups, a shallow and b deep: the groups' log rates are independent estimates, so
        // Var(log(a + b)) = (a²/10 + b²/16)/(a + b)², against the gradient g = (a + b, b·log 2) in β.
        double a = 2, b = 3;
        assertEquals(Math.sqrt(a * a / 10 + b * b / 16) / (a + b),
                model.logTotalStandardError(new double[]{a + b, b * Math.log(2)}, a + b), 1e-6);
        // A prior has no fit to be uncertain about: the stated wide σ.
        FleetRateModel prior = new FleetRateModel(List.of(RateCovariate.LOG_DEPTH), null, 1e-4, 2, 3, 500, Map.of());
        assertEquals(FleetRateModel.PRIOR_LOG_SD, prior.logRateStandardError(new double[]{0.3}));
        assertEquals(1e-4, prior.ratePerHour(80, 3, 9));
    }

    @Test
    void logRateStandardErrorEqualsTheInterceptErrorOfTheRecentredFit() {
        // McCullagh & Nelder 1989: a GLM is invariant to recentring a covariate; the intercept of the fit on
        // (depth − 45) is the log rate at 45 m of the fit on depth, so its standard error must be the delta method's.
        double[] hours = {2000, 3000, 5000, 1000, 3000, 4000, 2500, 3500};
        double[] depth = {20, 25, 30, 45, 50, 60, 35, 40};
        double[] counts = {2, 3, 5, 3, 4, 9, 3, 4};
        double[][] raw = new double[8][], centred = new double[8][];
        for (int i = 0; i < 8; i++) {
            raw[i] = new double[]{depth[i]};
            centred[i] = new double[]{depth[i] - 45};
        }
        PoissonFit onDepth = PoissonRegression.fit(raw, counts, hours);
        PoissonFit at45 = PoissonRegression.fit(centred, counts, hours);
        // The same data as the METHODS sheet's R glm check: intercept −7.528141 (SE 0.589128).
        assertEquals(-7.528141, onDepth.coefficients()[0], 1e-5);
        assertEquals(0.589128, onDepth.standardErrors()[0], 1e-5);
        FleetRateModel model = new FleetRateModel(List.of(RateCovariate.USAGE_HOURS), onDepth, 1e-3, 1, 33, 24_000, Map.of());
        // USAGE_HOURS passes its value through unchanged, so the design row is the depth itself.
        assertEquals(at45.standardErrors()[0], model.logRateStandardError(new double[]{45}), 1e-9);
        assertEquals(Math.exp(at45.coefficients()[0]), model.ratePerHour(0, 0, 45), 1e-12);
    }

    @Test
    void expectedUnitsOverCalendarMonthsWithTheDepotRatio() {
        FleetRateModel model = twoDepths(Map.of(7L, 1.5));
        long[] months = monthStarts(LocalDate.of(2025, 1, 1), 3);
        // Installed on 10 February at 4 h a day: no hours in January, 19 days of February, all 31 of March.
        PumpMonths pump = PumpMonths.of(months, LocalDate.of(2025, 2, 10).toEpochDay(), Long.MAX_VALUE / 4, 4, 1);
        assertArrayEquals(new double[]{0, 76, 124}, pump.hours(), 1e-12);
        assertEquals(0, pump.ageYears()[0]);
        assertEquals(-40 / 365.25 + 1.5 / 12, pump.ageYears()[1], 1e-12);
        // 0.002 per hour at 60 m × hours × ratio 1.5 × 2 units per breakdown.
        assertArrayEquals(new double[]{0, 0.002 * 76 * 1.5 * 2, 0.002 * 124 * 1.5 * 2},
                model.expectedUnits(7, 60, pump), 1e-12);
        // A depot without a ratio of its own has ratio 1: dropping ratios changes depot 7's units by half.
        assertArrayEquals(new double[]{0, 0.002 * 76 * 2, 0.002 * 124 * 2}, model.expectedUnits(8, 60, pump), 1e-12);
    }

    @Test
    void expectedUnitsOfAPastPeriodFromItsHoursWithTheDepotRatio() {
        FleetRateModel model = twoDepths(Map.of(7L, 1.5));
        // 0.002 per hour at 60 m × 180 hours × 2 units per breakdown × ratio 1.5 = 1.08; another depot: 0.72.
        assertEquals(1.08, model.expectedUnits(7, 60, 3, 180, 30), 1e-12);
        assertEquals(0.72, model.expectedUnits(8, 60, 3, 180, 30), 1e-12);
        assertEquals(0, model.expectedUnits(7, 60, 3, 0, 30), 0.0);
        assertThrows(IllegalArgumentException.class, () -> model.expectedUnits(7, 60, 3, 180, 0));
    }

    @Test
    void survivalThinsTheHoursFromInstallation() {
        long[] months = monthStarts(LocalDate.of(2025, 1, 1), 3);
        PumpMonths pump = PumpMonths.of(months, LocalDate.of(2025, 2, 10).toEpochDay(), Long.MAX_VALUE / 4, 4, 0.9);
        long mid = LocalDate.of(2025, 3, 1).toEpochDay() + LocalDate.of(2025, 4, 1).toEpochDay();
        double daysSinceInstalled = mid / 2.0 - LocalDate.of(2025, 2, 10).toEpochDay();
        assertEquals(124 * Math.pow(0.9, daysSinceInstalled / 365.25), pump.hours()[2], 1e-9);
    }

    @Test
    void brokenContractsAreNamed() {
        PoissonFit fit = twoDepths(Map.of()).fit();
        assertThrows(IllegalArgumentException.class, () -> new FleetRateModel(List.of(), fit, 1e-4, 2, 1, 1, Map.of()));
        assertThrows(IllegalArgumentException.class,
                () -> new FleetRateModel(List.of(RateCovariate.LOG_DEPTH), fit, 1e-4, 2, 1, 1, Map.of(3L, Double.NaN)));
        assertThrows(IllegalArgumentException.class,
                () -> PumpMonths.of(new long[]{0, 31}, 0, 100, 5, 1.2));
    }

    private static long[] monthStarts(LocalDate origin, int months) {
        long[] starts = new long[months + 1];
        for (int m = 0; m <= months; m++) {
            starts[m] = origin.plusMonths(m).toEpochDay();
        }
        return starts;
    }
}
