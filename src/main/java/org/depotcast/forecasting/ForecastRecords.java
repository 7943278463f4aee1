package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PoissonFit;

import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * Converts results to stored rows. A forecast's monthly series go to JSON columns ({@link MonthlySeriesJson}); the
 * fleet model fit's coefficient lists are still semicolon-separated.
 */
final class ForecastRecords {
    private ForecastRecords() {
    }

    /** Six decimals are plenty for units per month; plain concatenation because runs write millions of numbers. */
    static String join(double[] values) {
        StringBuilder out = new StringBuilder(values.length * 8);
        for (int i = 0; i < values.length; i++) {
            if (i > 0) {
                out.append(';');
            }
            double v = values[i];
            out.append(Double.isFinite(v) ? Double.toString(Math.round(v * 1e6) / 1e6) : "NaN");
        }
        return out.toString();
    }

    static double[] split(String values) {
        if (values == null || values.isEmpty()) {
            return new double[0];
        }
        return Arrays.stream(values.split(";")).mapToDouble(Double::parseDouble).toArray();
    }

    static Double finite(double value) {
        return Double.isFinite(value) ? value : null;
    }

    static FleetModelFitRecord fit(long runId, ComponentFamily family, FleetRateModel model) {
        FleetModelFitRecord record = new FleetModelFitRecord();
        record.runId = runId;
        record.family = family.name();
        record.source = model.source();
        PoissonFit fit = model.fit();
        record.covariates = fit == null ? "" : model.covariates().stream().map(org.depotcast.core.forecast.RateCovariate::term)
                .collect(Collectors.joining(";"));
        record.coefficients = fit == null ? join(new double[]{Math.log(model.priorPerHour())}) : join(fit.coefficients());
        record.standardErrors = fit == null ? "" : join(fit.standardErrors());
        record.deviance = fit == null ? null : fit.deviance();
        record.dfResidual = fit == null ? null : fit.dfResidual();
        record.dispersion = fit == null ? null : finite(fit.dispersion());
        record.overdispersed = fit != null && fit.overdispersed();
        record.events = model.events();
        record.exposureHours = model.exposureHours();
        record.unitsPerEvent = model.unitsPerEvent();
        return record;
    }

    static PartForecast forecast(long runId, PartForecastResult r) {
        PartForecast f = new PartForecast();
        f.runId = runId;
        f.partId = r.partId();
        f.locationCode = r.locationCode();
        f.method = r.method();
        f.alpha = finite(r.alpha());
        f.beta = finite(r.beta());
        f.adi = finite(r.profile().adi());
        f.cv2 = finite(r.profile().cv2());
        f.demandClass = r.profile().demandClass().name();
        f.mase = finite(r.chosenScores().mase());
        f.rmsse = finite(r.chosenScores().rmsse());
        f.scaledBias = finite(r.chosenScores().scaledBias());
        f.fleetRmsse = finite(r.fleetRmsse());
        f.historyRmsse = finite(r.historyRmsse());
        f.breakdownPerMonth = r.breakdownPerMonth();
        f.variancePerMonth = r.variancePerMonth();
        f.monthlyForecast = r.monthly();
        f.preventiveMonthly = r.preventive();
        f.monthlyHistory = r.history();
        f.historyFrom = r.historyFrom();
        f.methodDetail = r.methodDetail();
        f.monthlyVariance = r.monthlyVariance();
        f.yearVariance = finite(r.yearVariance());
        return f;
    }
}
