package org.depotcast.forecasting;

import java.time.LocalDate;
import java.util.List;

/**
 * What an accuracy report found: demand (breakdowns and scheduled services) over the 12 months after the origin,
 * forecast as of the origin against the repair records, per part × location and summarised per level and method.
 *
 * @param actualFrom first day of the 12 months compared
 * @param actualTo   last day of them
 */
public record AccuracyResults(LocalDate origin, LocalDate actualFrom, LocalDate actualTo, long forecastRunId,
                              List<String> notes, List<LevelSummary> summaries, List<Row> rows) {
    public static final String SERVICE = "service";
    public static final String MEAN12 = "mean12";
    public static final String CROSTON = "croston";

    /** One method's forecast of a series' 12-month total: mean, ranges and error (forecast − actual), units. */
    public record MethodScore(double forecast, double low80, double high80, double low95, double high95,
                              double error, boolean inside80, boolean inside95) {
    }

    /** One part at one location: {@code level} is PROGRAMME, DEPOT or KIT. */
    public record Row(String partNumber, String location, String level, double actual, MethodScore service,
                      MethodScore mean12, MethodScore croston) {
    }

    /**
     * One method over the series of one level. {@code totalBiasPercent} = 100 (ΣF − ΣA)/ΣA, null when ΣA = 0;
     * {@code coverage80}/{@code coverage95}: share of series whose actual fell inside the range, in percent.
     */
    public record LevelSummary(String level, String method, int series, double forecastTotal, double actualTotal,
                               double mae, double meanError, Double totalBiasPercent, double coverage80,
                               double coverage95) {
    }
}
