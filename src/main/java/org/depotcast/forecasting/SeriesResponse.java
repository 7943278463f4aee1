package org.depotcast.forecasting;

import java.util.List;
import java.util.Map;

/**
 * A stateless forecast. Numbers that are undefined for the series (CV² with one demand, scores without a scale) are
 * null. {@code horizonDemand} is the distribution of total demand over the horizon (see DEVELOPERS.md for the model).
 */
public record SeriesResponse(double[] forecast, String method, Double alpha, Double beta, Double adi, Double cv2,
                             String demandClass, int periods, int demands, Map<String, Scores> backtest,
                             HorizonDemand horizonDemand) {
    public record Scores(Double mase, Double rmsse, Double scaledBias) {
    }

    public record HorizonDemand(String distribution, double mean, double variance, List<Quantile> quantiles) {
    }

    public record Quantile(double probability, double units) {
    }
}
