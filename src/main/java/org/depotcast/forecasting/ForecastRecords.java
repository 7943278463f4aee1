package org.depotcast.forecasting;

/**
 * Converts results to stored rows: a forecast's monthly series go to JSON columns ({@link MonthlySeriesJson}); a
 * fleet model is stored by {@link FleetModelFitRecord#of}.
 */
final class ForecastRecords {
    private ForecastRecords() {
    }

    static Double finite(double value) {
        return Double.isFinite(value) ? value : null;
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
        f.credibilityRatio = finite(r.credibilityRatio());
        return f;
    }
}
