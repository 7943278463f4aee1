package org.depotcast.forecasting;

import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.HoldoutAccuracy;
import org.depotcast.core.forecast.SeriesForecaster;
import org.depotcast.core.policy.DemandDistribution;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Scores the stored forecasts of an as-of run, and two plain benchmarks made from the same series' history, against
 * the demand (breakdowns and scheduled services) of the 12 months after the origin. The service's 12-month total is
 * the stored forecast's: the sum of its first 12 months with the stored variance of that total, drawn as
 * {@link ForecastRange} draws the ranges the pages show; the benchmarks use the core's interval model
 * ({@link SeriesForecaster}: variance = max(mean, in-sample MSE), months independent).
 */
final class AccuracyScoring {
    static final int MONTHS = 12;
    private static final List<String> METHODS = List.of(AccuracyResults.SERVICE, AccuracyResults.MEAN12, AccuracyResults.CROSTON);

    private AccuracyScoring() {
    }

    /**
     * A stored forecast reduced to what scoring needs: the mean and variance of its first 12 months' total demand,
     * units and units², and the series' monthly demand from its start to the origin.
     */
    record Forecast(String partNumber, String location, double yearMean, double yearVariance, double[] history) {
    }

    static AccuracyResults.Row row(Forecast f, String level, double actual) {
        DemandDistribution service = ForecastRange.of(f.yearMean(), f.yearVariance()).demand();
        return new AccuracyResults.Row(f.partNumber(), f.location(), level, actual, score(service, actual),
                score(benchmark(f.history(), ForecastMethod.MEAN12), actual),
                score(benchmark(f.history(), ForecastMethod.CROSTON), actual));
    }

    /** A series with no demand on record forecasts none (Croston needs a demand to start from). */
    private static DemandDistribution benchmark(double[] history, ForecastMethod method) {
        boolean anyDemand = false;
        for (double y : history) {
            anyDemand |= y > 0;
        }
        if (!anyDemand) {
            return DemandDistribution.fromMoments(0, 0);
        }
        return SeriesForecaster.forecast(history, method, Double.NaN, Double.NaN, MONTHS).demandOver(MONTHS);
    }

    private static AccuracyResults.MethodScore score(DemandDistribution forecast, double actual) {
        HoldoutAccuracy.Scored s = HoldoutAccuracy.score(forecast, actual);
        return new AccuracyResults.MethodScore(s.forecast(), s.range80().lower(), s.range80().upper(),
                s.range95().lower(), s.range95().upper(), s.error(), s.range80().holds(actual), s.range95().holds(actual));
    }

    /** Per level (in the order first seen) and method. */
    static List<AccuracyResults.LevelSummary> summaries(List<AccuracyResults.Row> rows) {
        Map<String, List<AccuracyResults.Row>> byLevel = new LinkedHashMap<>();
        for (String level : List.of("PROGRAMME", "DEPOT", "KIT")) {
            byLevel.put(level, new ArrayList<>());
        }
        rows.forEach(r -> byLevel.computeIfAbsent(r.level(), k -> new ArrayList<>()).add(r));
        List<AccuracyResults.LevelSummary> out = new ArrayList<>();
        byLevel.forEach((level, levelRows) -> {
            if (levelRows.isEmpty()) {
                return;
            }
            for (String method : METHODS) {
                List<HoldoutAccuracy.Scored> scored = levelRows.stream().map(r -> scored(r, method)).toList();
                HoldoutAccuracy.Summary s = HoldoutAccuracy.summarise(scored);
                out.add(new AccuracyResults.LevelSummary(level, method, s.series(), s.forecastTotal(), s.actualTotal(),
                        s.mae(), s.meanError(), Double.isNaN(s.totalBias()) ? null : 100 * s.totalBias(),
                        100 * s.coverage80(), 100 * s.coverage95()));
            }
        });
        return out;
    }

    private static HoldoutAccuracy.Scored scored(AccuracyResults.Row r, String method) {
        AccuracyResults.MethodScore m = switch (method) {
            case AccuracyResults.SERVICE -> r.service();
            case AccuracyResults.MEAN12 -> r.mean12();
            default -> r.croston();
        };
        return new HoldoutAccuracy.Scored(m.forecast(), r.actual(), new HoldoutAccuracy.Range(m.low80(), m.high80()),
                new HoldoutAccuracy.Range(m.low95(), m.high95()));
    }

    static String level(String location, Set<String> kits) {
        if (DemandAssembler.PROGRAMME.equals(location)) {
            return "PROGRAMME";
        }
        return kits.contains(location) ? "KIT" : "DEPOT";
    }
}
