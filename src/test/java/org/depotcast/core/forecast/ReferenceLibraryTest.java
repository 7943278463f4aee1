package org.depotcast.core.forecast;

import org.apache.commons.csv.CSVRecord;
import org.depotcast.core.Fixtures;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The core against R 4.2.2 with forecast 8.20 (Debian bookworm packages): croston(), Croston × (1 − α/2) for SBA,
 * ses(initial = "simple"), glm(family = poisson) with offset(log(exposure)). Fixtures and the script that made them
 * are in src/test/resources/reference/. Agreement required: 1e-9.
 */
class ReferenceLibraryTest {
    private static final double TOLERANCE = 1e-9;
    private final Map<String, double[]> series = Fixtures.series();

    @Test
    void crostonSbaAndSesMatchRForecast() {
        List<CSVRecord> rows = Fixtures.read("croston-ses.csv");
        assertTrue(rows.size() >= 30);
        for (CSVRecord r : rows) {
            double[] y = series.get(r.get("series_id"));
            double alpha = Double.parseDouble(r.get("alpha"));
            ForecastMethod method = ForecastMethod.valueOf(r.get("method"));
            double ours = SeriesFitter.fit(y, method, alpha, Double.NaN).perPeriod();
            assertEquals(Double.parseDouble(r.get("forecast")), ours, TOLERANCE, r.toString());
        }
    }

    /** TSB against an independent R implementation in the same script (not in forecast 8.20; see the script). */
    @Test
    void tsbMatchesTheIndependentRImplementation() {
        for (CSVRecord r : Fixtures.read("tsb.csv")) {
            double[] y = series.get(r.get("series_id"));
            double ours = Smoothing.tsb(y, Double.parseDouble(r.get("alpha")), Double.parseDouble(r.get("beta")),
                    Smoothing.TsbStart.MEAN, null);
            assertEquals(Double.parseDouble(r.get("forecast")), ours, TOLERANCE, r.toString());
        }
    }

    @Test
    void poissonRegressionMatchesRGlm() {
        List<CSVRecord> data = Fixtures.read("glm-data.csv");
        int n = data.size();
        double[][] x = new double[n][3];
        double[] counts = new double[n], exposure = new double[n];
        for (int i = 0; i < n; i++) {
            CSVRecord r = data.get(i);
            x[i][0] = Double.parseDouble(r.get("log_depth"));
            x[i][1] = Double.parseDouble(r.get("age"));
            x[i][2] = Double.parseDouble(r.get("usage"));
            counts[i] = Double.parseDouble(r.get("count"));
            exposure[i] = Double.parseDouble(r.get("exposure"));
        }
        PoissonFit fit = PoissonRegression.fit(x, counts, exposure);
        List<CSVRecord> coefficients = Fixtures.read("glm-coefficients.csv");
        for (int j = 0; j < coefficients.size(); j++) {
            assertEquals(Double.parseDouble(coefficients.get(j).get("estimate")), fit.coefficients()[j], TOLERANCE);
            assertEquals(Double.parseDouble(coefficients.get(j).get("std_error")), fit.standardErrors()[j], TOLERANCE);
        }
        CSVRecord summary = Fixtures.read("glm-summary.csv").get(0);
        assertEquals(Double.parseDouble(summary.get("deviance")), fit.deviance(), 1e-7);
        assertEquals(Integer.parseInt(summary.get("df_residual")), fit.dfResidual());
        assertEquals(Double.parseDouble(summary.get("pearson_dispersion")), fit.dispersion(), 1e-9);
        assertTrue(fit.converged());
    }
}
