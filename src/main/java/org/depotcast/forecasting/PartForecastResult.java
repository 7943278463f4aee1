package org.depotcast.forecasting;

import org.depotcast.core.forecast.DemandProfile;
import org.depotcast.core.forecast.ErrorScores;

/**
 * The forecast of one part at one location (a depot, a kit, or the whole programme).
 *
 * @param method            FLEET (fleet model) or the series method used on the history
 * @param breakdownPerMonth expected breakdown demand in the first month, units (later months in {@code monthly}, as
 *                          pumps age)
 * @param variancePerMonth  variance of one month's breakdown demand, units²
 * @param preventive        scheduled-service demand for each horizon month
 * @param monthly           breakdown + preventive for each horizon month
 * @param history           breakdown consumption per history month, from the series' real start
 * @param historyFrom       first month of {@code history}
 * @param chosenScores      holdout scores (last 12 months) of the method used
 * @param fleetRmsse        holdout RMSSE of the fleet model (NaN where not available)
 * @param historyRmsse      holdout RMSSE of the best history method
 * @param methodDetail      how the breakdown rate was reached, in words
 * @param monthlyVariance   variance of each horizon month's total demand (breakdowns with the rate's uncertainty,
 *                          plus the scheduled services' timing), units²; see {@link DemandSpread}
 * @param yearVariance      variance of the first 12 months' total demand, with the months' correlation, units²
 * @param credibilityRatio  the multiplier the series' own history put on the fleet rate (1 where it added nothing);
 *                          NaN where the fleet model does not cover the series
 */
record PartForecastResult(long partId, String locationCode, String method, double alpha, double beta,
                          DemandProfile profile, double breakdownPerMonth, double variancePerMonth, double[] preventive,
                          double[] monthly, double[] history, java.time.LocalDate historyFrom, ErrorScores chosenScores, double fleetRmsse,
                          double historyRmsse, String methodDetail, double[] monthlyVariance, double yearVariance,
                          double credibilityRatio) {
}
