package org.depotcast.common;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.function.Function;

/** Writes rows as CSV text with a header, the same column names the matching import reads. */
public final class CsvOut {
    private CsvOut() {
    }

    public static <T> String write(List<String> header, List<T> items, Function<T, List<?>> toRow) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder()
                .setHeader(header.toArray(String[]::new)).setRecordSeparator('\n').get())) {
            for (T item : items) {
                printer.printRecord(toRow.apply(item));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }
}
