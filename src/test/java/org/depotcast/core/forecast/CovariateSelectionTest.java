package org.depotcast.core.forecast;

import org.apache.commons.csv.CSVRecord;
import org.depotcast.core.Fixtures;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The BIC choice of covariates (Schwarz 1978, n the number of events: Volinsky &amp; Raftery 2000) on R's
 * Poisson-regression fixture (make-fixtures.R: 400 pump-years with 157 events, drawn with log-depth 0.5 and age 0.03
 * per year, no usage effect).
 */
class CovariateSelectionTest {
    private static final double[][] X;
    private static final double[] COUNTS, EXPOSURE;
    private static final double LN_EVENTS = Math.log(157);

    static {
        List<CSVRecord> data = Fixtures.read("glm-data.csv");
        int n = data.size();
        X = new double[n][3];
        COUNTS = new double[n];
        EXPOSURE = new double[n];
        for (int i = 0; i < n; i++) {
            CSVRecord r = data.get(i);
            X[i][0] = Double.parseDouble(r.get("log_depth"));
            X[i][1] = Double.parseDouble(r.get("age"));
            X[i][2] = Double.parseDouble(r.get("usage"));
            COUNTS[i] = Double.parseDouble(r.get("count"));
            EXPOSURE[i] = Double.parseDouble(r.get("exposure"));
        }
    }

    @Test
    void keepsTheTermsTheDataCarry() {
        assertEquals(157, java.util.Arrays.stream(COUNTS).sum());
        CovariateSelection.Choice choice = CovariateSelection.byBic(X, COUNTS, EXPOSURE);
        // R's summary.glm of the full model: |z| = 3.08 for log depth, 1.92 for age, 0.79 for usage. BIC keeps a term
        // when its likelihood-ratio statistic (about z²) exceeds ln 157 = 5.06, i.e. |z| over 2.25: log depth only.
        assertArrayEquals(new int[]{0}, choice.columns());
        PoissonFit alone = PoissonRegression.fit(CovariateSelection.select(X, new int[]{0}), COUNTS, EXPOSURE);
        assertArrayEquals(alone.coefficients(), choice.fit().coefficients(), 0);
        assertEquals(alone.deviance() + 2 * LN_EVENTS, choice.bic(), 1e-9);
    }

    @Test
    void rowsWithoutEventsOrExposureDoNotChangeTheChoice() {
        // 100,000 more pump-years with no event and a millionth of an hour each carry no information on the rates;
        // a penalty of ln(rows) = ln 100,400 = 11.5 would now drop log depth (likelihood ratio about 3.08² = 9.5).
        int extra = 100_000, n = X.length + extra;
        double[][] x = new double[n][];
        double[] counts = new double[n], exposure = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = X[i % X.length];
            counts[i] = i < X.length ? COUNTS[i] : 0;
            exposure[i] = i < X.length ? EXPOSURE[i] : 1e-6;
        }
        CovariateSelection.Choice padded = CovariateSelection.byBic(x, counts, exposure);
        CovariateSelection.Choice original = CovariateSelection.byBic(X, COUNTS, EXPOSURE);
        assertArrayEquals(original.columns(), padded.columns());
        assertArrayEquals(original.fit().coefficients(), padded.fit().coefficients(), 1e-6);
        assertEquals(original.bic(), padded.bic(), 1e-4);
    }

    @Test
    void fewerThanTwoEventsCannotChoose() {
        double[] one = new double[X.length];
        one[0] = 1;
        assertThrows(IllegalArgumentException.class, () -> CovariateSelection.byBic(X, one, EXPOSURE));
    }

    @Test
    void everyOtherSubsetScoresWorseAndTheFullModelMatchesR() {
        CovariateSelection.Choice choice = CovariateSelection.byBic(X, COUNTS, EXPOSURE);
        int[][] subsets = {{}, {1}, {2}, {0, 1}, {0, 2}, {1, 2}, {0, 1, 2}};
        for (int[] subset : subsets) {
            PoissonFit fit = PoissonRegression.fit(CovariateSelection.select(X, subset), COUNTS, EXPOSURE);
            double bic = fit.deviance() + (subset.length + 1) * LN_EVENTS;
            assertTrue(bic > choice.bic(), java.util.Arrays.toString(subset) + " BIC " + bic + " vs " + choice.bic());
        }
        // The full model's deviance is R's glm (glm-summary.csv), so its BIC is R's deviance + 4 ln 157.
        PoissonFit full = PoissonRegression.fit(X, COUNTS, EXPOSURE);
        double rDeviance = Double.parseDouble(Fixtures.read("glm-summary.csv").get(0).get("deviance"));
        assertEquals(rDeviance, full.deviance(), 1e-7);
    }

    @Test
    void aConstantColumnIsLeftOutNotFatal() {
        double[][] withConstant = new double[X.length][2];
        for (int i = 0; i < X.length; i++) {
            withConstant[i][0] = X[i][0];
            withConstant[i][1] = 1.0; // collinear with the intercept: every subset holding it is singular
        }
        CovariateSelection.Choice choice = CovariateSelection.byBic(withConstant, COUNTS, EXPOSURE);
        assertArrayEquals(new int[]{0}, choice.columns());
    }
}
