package org.depotcast.forecasting;

import org.depotcast.common.Bounds;
import org.depotcast.common.CsvProblems;
import org.depotcast.common.FieldError;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.QueryParams;

import java.util.List;

/** The cells of a batch forecast's rows read into numbers, each problem recorded by row and column. */
final class BatchCells {
    static final List<String> COLUMNS = List.of("series_id", "period", "quantity");
    private static final double VALUE_MAX = Double.parseDouble(Bounds.SERIES_VALUE_MAX);

    private BatchCells() {
    }

    /** Where series_id, period and quantity are in the header; 400 naming each one missing. */
    static int[] columns(List<String> names) {
        int[] index = new int[COLUMNS.size()];
        List<FieldError> missing = new java.util.ArrayList<>();
        for (int i = 0; i < COLUMNS.size(); i++) {
            index[i] = names.indexOf(COLUMNS.get(i));
            if (index[i] < 0) {
                missing.add(new FieldError("header", "missing column '" + COLUMNS.get(i) + "'"));
            }
        }
        if (!missing.isEmpty()) {
            throw new InvalidInputException(missing);
        }
        return index;
    }

    /** A period read as plain digits by the row reader. */
    static int period(CsvProblems problems, int line, int period) {
        if (period <= StatelessForecastService.PERIOD_MAX) {
            return period;
        }
        problems.add(line, "period", "must be from 0 to " + StatelessForecastService.PERIOD_MAX
                + " (a period number such as 202401), was " + period);
        return -1;
    }

    /** A quantity read as plain digits by the row reader. */
    static double quantity(CsvProblems problems, int line, int quantity) {
        if (quantity <= VALUE_MAX) {
            return quantity;
        }
        problems.add(line, "quantity", "must be from 0 to " + Bounds.SERIES_VALUE_MAX + ", was '" + quantity + "'");
        return Double.NaN;
    }

    static int period(CsvProblems problems, int line, String text) {
        if (text.isEmpty()) {
            problems.add(line, "period", "is required");
            return -1;
        }
        try {
            int period = Integer.parseInt(text);
            if (period >= 0 && period <= StatelessForecastService.PERIOD_MAX) {
                return period;
            }
            problems.add(line, "period", "must be from 0 to " + StatelessForecastService.PERIOD_MAX
                    + " (a period number such as 202401), was " + period);
        } catch (NumberFormatException e) {
            problems.add(line, "period", "must be a whole number, was '" + QueryParams.shown(text) + "'");
        }
        return -1;
    }

    static double quantity(CsvProblems problems, int line, String text) {
        if (text.isEmpty()) {
            problems.add(line, "quantity", "is required");
            return Double.NaN;
        }
        try {
            double quantity = text.length() > 40 ? Double.NaN : Double.parseDouble(text);
            if (quantity >= 0 && quantity <= VALUE_MAX) {
                return quantity;
            }
            problems.add(line, "quantity", "must be from 0 to " + Bounds.SERIES_VALUE_MAX + ", was '" + QueryParams.shown(text) + "'");
        } catch (NumberFormatException e) {
            problems.add(line, "quantity", "must be a number, was '" + QueryParams.shown(text) + "'");
        }
        return Double.NaN;
    }
}
