package org.depotcast.common;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A CSV upload read whole, with its header checked. Rows hand out typed values and collect every problem by row and
 * column into one {@link CsvProblems}, so an import can refuse the file with all of its faults at once.
 */
public final class CsvTable {
    private final List<CsvRow> rows;
    private final CsvProblems problems;

    private CsvTable(List<CsvRow> rows, CsvProblems problems) {
        this.rows = rows;
        this.problems = problems;
    }

    public static CsvTable parse(String text, List<String> requiredColumns) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException("body", "CSV body is empty");
        }
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                .setIgnoreSurroundingSpaces(true).setIgnoreEmptyLines(true).setTrim(true).get();
        try (CSVParser parser = CSVParser.parse(new StringReader(text.strip()), format)) {
            Map<String, Integer> header = parser.getHeaderMap();
            List<FieldError> missing = new ArrayList<>();
            for (String column : requiredColumns) {
                if (!header.containsKey(column)) {
                    missing.add(new FieldError("header", "missing column '" + column + "'"));
                }
            }
            if (!missing.isEmpty()) {
                throw new InvalidInputException(missing);
            }
            CsvProblems problems = new CsvProblems();
            List<CsvRow> rows = new ArrayList<>();
            for (CSVRecord record : parser) {
                // Line numbers as a spreadsheet shows them: the header is line 1.
                rows.add(new CsvRow(record, (int) record.getRecordNumber() + 1, problems));
            }
            if (rows.isEmpty()) {
                throw new InvalidInputException("body", "CSV has a header but no rows");
            }
            return new CsvTable(rows, problems);
        } catch (IOException | IllegalArgumentException | IllegalStateException e) {
            throw new InvalidInputException("body", "CSV could not be read: " + e.getMessage());
        }
    }

    public List<CsvRow> rows() {
        return rows;
    }

    public CsvProblems problems() {
        return problems;
    }
}
