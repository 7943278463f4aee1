package org.depotcast.forecasting;

import org.depotcast.common.CsvExport;
import org.depotcast.core.forecast.DemandClass;
import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.SeriesForecast;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * The batch forecast's answer, written as UTF-8 bytes to a temporary file: one row per series and horizon step
 * (series_id, step, forecast, method, alpha, beta, demand_class). The id cell is made spreadsheet-safe and quoted
 * by the export writer once a series, and the cells after the forecast are encoded once for as long as they stay
 * the same; the text is what the char writer wrote before (a profile put the char encoding and per-cell strings at
 * a tenth of the batch's processor time).
 */
final class BatchOutput {
    static final List<String> HEADER = List.of("series_id", "step", "forecast", "method", "alpha", "beta",
            "demand_class");
    private static final int BUFFER = 1 << 17;
    private static final byte[][] STEPS = steps(60);

    private final Path file;
    private final OutputStream out;
    private final byte[] buffer = new byte[BUFFER];
    private int used;
    private final FixedDecimals forecastText = new FixedDecimals(6);
    private final FixedDecimals alphaText = new FixedDecimals(2);
    private final FixedDecimals betaText = new FixedDecimals(2);
    private ForecastMethod lastMethod;
    private DemandClass lastClass;
    private String lastAlpha;
    private String lastBeta;
    private byte[] after;
    private double lastValue = Double.NaN;
    private byte[] valueBytes;

    BatchOutput() throws IOException {
        file = Files.createTempFile("depotcast-batch-", ".csv");
        out = Files.newOutputStream(file);
        StringBuilder header = new StringBuilder();
        CsvExport.writeRow(header, HEADER.toArray());
        write(header.toString().getBytes(StandardCharsets.UTF_8));
    }

    Path file() {
        return file;
    }

    /** The series' rows: one per horizon step. */
    void series(String id, SeriesForecast f) throws IOException {
        byte[] idCell = CsvExport.formatCell(id).getBytes(StandardCharsets.UTF_8);
        byte[] rest = after(f);
        double[] forecast = f.forecast();
        for (int h = 0; h < forecast.length; h++) {
            write(idCell);
            write(STEPS[h]);
            write(value(forecast[h]));
            write(rest);
        }
    }

    void close() throws IOException {
        out.write(buffer, 0, used);
        used = 0;
        out.close();
    }

    /** Closes and deletes the file (the answer is a problem instead). */
    void discard() {
        try {
            out.close();
        } catch (IOException ignored) {
            // the file is deleted next
        }
        try {
            Files.deleteIfExists(file);
        } catch (IOException ignored) {
            // a temporary file left behind is removed with the temporary directory
        }
    }

    private byte[] value(double v) {
        if (Double.compare(v, lastValue) != 0 || valueBytes == null) {
            lastValue = v;
            valueBytes = forecastText.format(v).getBytes(StandardCharsets.UTF_8);
        }
        return valueBytes;
    }

    /** ",method,alpha,beta,class\n", encoded again only when one of them changes. */
    private byte[] after(SeriesForecast f) {
        String alpha = blank(alphaText, f.alpha()), beta = blank(betaText, f.beta());
        DemandClass demandClass = f.profile().demandClass();
        if (after == null || f.method() != lastMethod || demandClass != lastClass || !alpha.equals(lastAlpha)
                || !beta.equals(lastBeta)) {
            lastMethod = f.method();
            lastClass = demandClass;
            lastAlpha = alpha;
            lastBeta = beta;
            after = ("," + f.method().name().toLowerCase(Locale.ROOT) + "," + alpha + "," + beta + ","
                    + demandClass.name().toLowerCase(Locale.ROOT) + "\n").getBytes(StandardCharsets.UTF_8);
        }
        return after;
    }

    private void write(byte[] bytes) throws IOException {
        if (used + bytes.length > buffer.length) {
            out.write(buffer, 0, used);
            used = 0;
            if (bytes.length > buffer.length) {
                out.write(bytes);
                return;
            }
        }
        System.arraycopy(bytes, 0, buffer, used, bytes.length);
        used += bytes.length;
    }

    private static String blank(FixedDecimals text, double value) {
        return Double.isFinite(value) ? text.format(value) : "";
    }

    /** ",1,", ",2,", …: the step cell with the commas either side. */
    private static byte[][] steps(int most) {
        byte[][] steps = new byte[most][];
        for (int h = 0; h < most; h++) {
            steps[h] = ("," + (h + 1) + ",").getBytes(StandardCharsets.US_ASCII);
        }
        return steps;
    }
}
