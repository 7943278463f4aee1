package org.depotcast.forecasting;

import de.siegmar.fastcsv.reader.CsvParseException;
import de.siegmar.fastcsv.reader.CsvReader;
import org.depotcast.common.BodySizeLimit;
import org.depotcast.common.BodyTooLargeException;
import org.depotcast.common.Bounds;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvProblems;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.QueryParams;
import org.depotcast.core.forecast.SeriesForecaster;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;

/**
 * The CSV batch forecast in bounded memory: long-format rows (series_id, period, quantity) are read as they arrive,
 * each series is forecast as soon as its last row has been read, and its forecast rows are written to a temporary
 * file ({@link BatchOutput}). Only when the whole body has been read without a problem is that file sent (and then
 * deleted); any problem is a 400 listing rows and columns, and nothing is sent. Memory holds one series (at most
 * {@link Bounds#SERIES_PERIODS_MAX} periods) and 16 bytes per series read, to refuse a series whose rows are not
 * together; the body is bounded by {@code depotcast.http.bulk-max-body-size}. Plain records are read from the bytes
 * ({@link PlainCsvRows}); from the first record that is not plain, FastCSV reads the rest ({@link BatchRowReader}).
 */
final class BatchForecast {
    private static final int SERIES_ID_MAX = 200;

    private final StatelessForecastService.Settings settings;
    private final CsvProblems problems = new CsvProblems();
    private final SeriesIdSet seen = new SeriesIdSet();
    private final BatchOutput out;
    private int[] columns;
    private String currentId;
    private int[] lines = new int[64];
    private int[] periods = new int[64];
    private double[] quantities = new double[64];
    private int size;
    private int minPeriod;
    private int maxPeriod;
    private long rows;

    private BatchForecast(StatelessForecastService.Settings settings) throws IOException {
        this.settings = settings;
        this.out = new BatchOutput();
    }

    /** Reads the whole body and answers with the forecasts, or throws a 400 naming every problem found. */
    static jakarta.ws.rs.core.Response run(InputStream body, StatelessForecastService.Settings settings) {
        if (body == null) {
            throw new InvalidInputException("body", "CSV body is empty");
        }
        BatchForecast batch;
        try {
            batch = new BatchForecast(settings);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try {
            batch.read(BodySizeLimit.countedBulk(body));
            return CsvExport.fileResponse("forecasts.csv", batch.out.file());
        } catch (RuntimeException | IOException e) {
            batch.out.discard();
            if (e instanceof RuntimeException runtime) {
                throw runtime;
            }
            throw new UncheckedIOException((IOException) e);
        }
    }

    private void read(InputStream body) throws IOException {
        PlainCsvRows plain = new PlainCsvRows(body);
        try {
            List<String> header = plain.header();
            if (header != null) {
                columns = BatchCells.columns(header);
                BatchRowReader.Row row = new BatchRowReader.Row();
                while (plain.next(row, columns)) {
                    rows++;
                    readRow(row);
                }
            }
            if (plain.stopped()) {
                readRest(plain);
            } else if (header == null && plain.linesBefore() > 0) {
                // Only empty lines: FastCSV reads them as a header without cells.
                BatchCells.columns(List.of());
            } else if (header == null) {
                throw new InvalidInputException("body", "CSV body is empty");
            }
        } catch (CsvParseException | UncheckedIOException e) {
            rethrowIfTooLarge(e);
            problems.add((int) Math.min(Integer.MAX_VALUE, rows + 2), null, "this row could not be read as CSV: a "
                    + "quoted value is not closed or text follows its closing quote");
        }
        if (rows == 0 && problems.isEmpty()) {
            throw new InvalidInputException("body", "CSV has a header but no rows");
        }
        finishSeries();
        problems.throwIfAny();
        out.close();
    }

    /** FastCSV reads the body from the first record that is not plain (the header too, if that was not plain). */
    private void readRest(PlainCsvRows plain) throws IOException {
        BatchRowReader handler = new BatchRowReader(plain.linesBefore());
        CsvReader.CsvReaderBuilder builder = CsvReader.builder().skipEmptyLines(true).allowMissingFields(true)
                .allowExtraFields(true).detectBomHeader(plain.restIsWholeBody());
        try (CsvReader<BatchRowReader.Row> reader = builder.build(handler, plain.rest())) {
            Iterator<BatchRowReader.Row> records = reader.iterator();
            if (columns == null) {
                if (!records.hasNext()) {
                    throw new InvalidInputException("body", "CSV body is empty");
                }
                columns = BatchCells.columns(records.next().header);
            }
            handler.useColumns(columns);
            while (records.hasNext()) {
                BatchRowReader.Row row = records.next();
                rows++;
                readRow(row);
            }
        }
    }

    private void readRow(BatchRowReader.Row row) throws IOException {
        int line = (int) Math.min(Integer.MAX_VALUE, row.line);
        String id = row.id;
        int period = row.periodText == null ? BatchCells.period(problems, line, row.period)
                : BatchCells.period(problems, line, row.periodText);
        double quantity = row.quantityText == null ? BatchCells.quantity(problems, line, row.quantity)
                : BatchCells.quantity(problems, line, row.quantityText);
        if (id == currentId) {
            // The same id as the row before (the readers keep its string): checked already.
            if (period >= 0 && !Double.isNaN(quantity)) {
                add(line, period, quantity);
            }
            return;
        }
        if (id.isEmpty()) {
            problems.add(line, "series_id", "is required");
            return;
        }
        if (id.length() > SERIES_ID_MAX || id.indexOf('\n') >= 0 || id.indexOf('\r') >= 0) {
            problems.add(line, "series_id", "must be one line of at most " + SERIES_ID_MAX + " characters");
            return;
        }
        if (!id.equals(currentId)) {
            finishSeries();
            if (!seen.add(id)) {
                problems.add(line, "series_id", "the rows of series '" + QueryParams.shown(id) + "' must be together: it "
                        + "appeared earlier in the file, before another series");
                return;
            }
            currentId = id;
            size = 0;
        }
        if (period >= 0 && !Double.isNaN(quantity)) {
            add(line, period, quantity);
        }
    }

    private void add(int line, int period, double quantity) {
        int low = size == 0 ? period : Math.min(minPeriod, period);
        int high = size == 0 ? period : Math.max(maxPeriod, period);
        if (high - low >= Bounds.SERIES_PERIODS_MAX) {
            problems.add(line, "period", "series '" + QueryParams.shown(currentId) + "' spans more than "
                    + Bounds.SERIES_PERIODS_MAX + " periods");
            return;
        }
        if (size == periods.length) {
            lines = Arrays.copyOf(lines, size * 2);
            periods = Arrays.copyOf(periods, size * 2);
            quantities = Arrays.copyOf(quantities, size * 2);
        }
        lines[size] = line;
        periods[size] = period;
        quantities[size++] = quantity;
        minPeriod = low;
        maxPeriod = high;
    }

    /** Forecasts the series just read (unless the file already has problems: then only checking goes on). */
    private void finishSeries() throws IOException {
        if (currentId == null || size == 0) {
            return;
        }
        double[] history = new double[maxPeriod - minPeriod + 1];
        boolean[] filled = new boolean[history.length];
        for (int i = 0; i < size; i++) {
            int at = periods[i] - minPeriod;
            if (filled[at]) {
                problems.add(lines[i], "period", "period " + periods[i] + " appears twice for series '" + QueryParams.shown(currentId) + "'");
            }
            filled[at] = true;
            history[at] = quantities[i];
        }
        String id = currentId;
        size = 0;
        if (!problems.isEmpty()) {
            return;
        }
        out.series(id, SeriesForecaster.forecast(history, settings.method(), settings.alpha(), settings.beta(),
                settings.horizon()));
    }

    private static void rethrowIfTooLarge(Throwable e) {
        for (Throwable cause = e; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            if (cause instanceof BodyTooLargeException tooLarge) {
                throw tooLarge;
            }
        }
    }

}
