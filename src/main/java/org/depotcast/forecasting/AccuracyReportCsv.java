package org.depotcast.forecasting;

import org.depotcast.common.CsvExport;

import java.util.ArrayList;
import java.util.List;

/** The rows of an accuracy report as a spreadsheet-safe CSV file, one line per part and location. */
final class AccuracyReportCsv {
    private static final List<String> METHODS = List.of(AccuracyResults.SERVICE, AccuracyResults.MEAN12, AccuracyResults.CROSTON);

    private AccuracyReportCsv() {
    }

    static CsvExport of(long id, AccuracyResults results) {
        List<String> header = new ArrayList<>(List.of("part_number", "location", "level", "origin", "actual"));
        for (String method : METHODS) {
            for (String column : List.of("forecast", "error", "low80", "high80", "low95", "high95")) {
                header.add(method + "_" + column);
            }
        }
        return CsvExport.of("accuracy-report-" + id + ".csv", header, results.rows(), row -> {
            List<Object> cells = new ArrayList<>(List.of(row.partNumber(), row.location(), row.level(),
                    results.origin(), row.actual()));
            for (AccuracyResults.MethodScore m : List.of(row.service(), row.mean12(), row.croston())) {
                cells.addAll(List.of(round(m.forecast()), round(m.error()), m.low80(), m.high80(), m.low95(), m.high95()));
            }
            return cells;
        });
    }

    private static double round(double value) {
        return Math.round(value * 1000) / 1000.0;
    }
}
