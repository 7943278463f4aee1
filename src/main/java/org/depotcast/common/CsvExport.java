package org.depotcast.common;

import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.StreamingOutput;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.function.Function;
import java.util.regex.Pattern;

/**
 * The one CSV writer: every export is a header and rows, streamed to the client as an attachment with a file name.
 * Cells are spreadsheet-safe (OWASP "CSV Injection"): a cell starting with =, +, -, @, tab or carriage return would
 * run as a formula in a spreadsheet, so it is written with a leading single quote, which the spreadsheet shows as
 * text; a plain negative number (e.g. -12.5) stays a number. Column names are those the matching import reads.
 *
 * @param fileName offered to the browser's "save as", e.g. {@code parts.csv}
 * @param rows     cells as plain values (strings, numbers, dates, enums; null is an empty cell), already read out of
 *                 any entity so writing needs no open transaction
 */
public record CsvExport(String fileName, List<String> header, List<? extends List<?>> rows) {
    public static final String MEDIA_TYPE = "text/csv; charset=UTF-8";
    private static final Pattern PLAIN_NEGATIVE_NUMBER = Pattern.compile("-[0-9]+(\\.[0-9]+)?([eE][-+]?[0-9]+)?");
    private static final Pattern SAFE_FILE_NAME = Pattern.compile("[A-Za-z0-9._-]+");
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get();

    public CsvExport {
        if (!SAFE_FILE_NAME.matcher(fileName).matches()) {
            throw new IllegalArgumentException("fileName may hold letters, digits and . _ - only: " + fileName);
        }
        header = List.copyOf(header);
    }

    /** Rows read out of items now (inside the caller's transaction), written later. */
    public static <T> CsvExport of(String fileName, List<String> header, Collection<T> items, Function<T, List<?>> toRow) {
        List<List<?>> rows = new ArrayList<>(items.size());
        for (T item : items) {
            rows.add(toRow.apply(item));
        }
        return new CsvExport(fileName, header, rows);
    }

    /** 200, text/csv, streamed, with {@code Content-Disposition: attachment; filename="…"}. */
    public Response response() {
        StreamingOutput body = this::writeTo;
        return Response.ok(body, MEDIA_TYPE)
                .header("Content-Disposition", "attachment; filename=\"" + fileName + "\"").build();
    }

    public void writeTo(OutputStream out) throws IOException {
        Writer writer = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), 16 * 1024);
        writeTo(writer);
        writer.flush();
    }

    public void writeTo(Appendable out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, FORMAT);
        printer.printRecord(header.stream().map(CsvExport::spreadsheetSafe).toList());
        List<Object> cells = new ArrayList<>(header.size());
        for (List<?> row : rows) {
            cells.clear();
            for (Object cell : row) {
                cells.add(spreadsheetSafe(cell));
            }
            printer.printRecord(cells);
        }
        printer.flush();
    }

    /**
     * One row of an export built as a stream (too large to hold as rows), in the same format and with the same
     * spreadsheet-safe cells as {@link #writeTo(Appendable)}; the file is then sent by {@link #fileResponse}.
     */
    public static void writeRow(Appendable out, Object... cells) throws IOException {
        Object[] safe = new Object[cells.length];
        for (int i = 0; i < cells.length; i++) {
            safe[i] = spreadsheetSafe(cells[i]);
        }
        FORMAT.printRecord(out, safe);
    }

    /** One cell as the export writer writes it (spreadsheet-safe, quoted where needed), for rows built by hand. */
    public static String formatCell(Object cell) {
        StringBuilder out = new StringBuilder();
        try {
            FORMAT.print(spreadsheetSafe(cell), out, true);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out.toString();
    }

    /** 200 with a finished temporary CSV file as an attachment; the file is deleted once sent (or not sendable). */
    public static Response fileResponse(String fileName, java.nio.file.Path file) {
        if (!SAFE_FILE_NAME.matcher(fileName).matches()) {
            throw new IllegalArgumentException("fileName may hold letters, digits and . _ - only: " + fileName);
        }
        StreamingOutput body = out -> {
            try {
                java.nio.file.Files.copy(file, out);
            } finally {
                java.nio.file.Files.deleteIfExists(file);
            }
        };
        return Response.ok(body, MEDIA_TYPE).header("Content-Disposition", "attachment; filename=\"" + fileName + "\"")
                .build();
    }

    /** The cell as text a spreadsheet will not evaluate; see the class comment. */
    public static String spreadsheetSafe(Object cell) {
        if (cell == null) {
            return "";
        }
        String text = cell.toString();
        if (text.isEmpty() || "=+-@\t\r".indexOf(text.charAt(0)) < 0 || PLAIN_NEGATIVE_NUMBER.matcher(text).matches()) {
            return text;
        }
        return "'" + text;
    }
}
