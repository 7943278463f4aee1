package org.depotcast.forecasting;

import java.time.LocalDate;
import java.util.List;

/**
 * What the forecast explorer shows for one part at one location (or the whole programme): the stored forecast with
 * its history, the 80 % and 95 % range of each forecast month under the stated interval model, and how the method
 * was chosen: the fleet model against the part's own history over the held-out last 12 months, and each history
 * method's rolling-origin backtest scores on the same history.
 */
public record ForecastExplorerResponse(String partNumber, String description, String unitOfIssue, String location,
                                       StoredForecastResponse forecast, List<MonthRange> ranges, String intervalModel,
                                       Holdout holdout, List<MethodScore> historyMethods, String backtestBasis) {

    /** One forecast month: its expected demand and the ranges it falls in with 80 % and 95 % probability. */
    public record MonthRange(LocalDate month, double mean, String distribution, double low80, double high80,
                             double low95, double high95) {
    }

    /** Fleet model against the part's own history over the last 12 months, each fitted without them. */
    public record Holdout(String chosen, Double fleetRmsse, Double historyRmsse, String basis) {
    }

    /** A history method's rolling-origin scores; {@code chosen} marks the method the run used. */
    public record MethodScore(String method, Double mase, Double rmsse, Double scaledBias, boolean chosen) {
    }
}
