package org.depotcast.forecasting;

import de.siegmar.fastcsv.reader.AbstractBaseCsvCallbackHandler;

import java.util.ArrayList;
import java.util.List;

/**
 * FastCSV's callback for the batch forecast: reads each row's three cells straight from the parser's buffer into one
 * reused {@link Row}, so a plain row (an id like the row before, whole-number period and quantity) makes no
 * objects at all; the first record (the header) is kept as text. Cells that are not plain digits are kept as text
 * and read by {@link BatchCells}, which names the problem.
 */
final class BatchRowReader extends AbstractBaseCsvCallbackHandler<BatchRowReader.Row> {
    /** One data row; the same instance is filled again for the next row. */
    static final class Row {
        long line;
        String id = "";
        /** The cell as written (spaces stripped) when it is not plain digits, else null and the value below. */
        String periodText;
        int period;
        String quantityText;
        int quantity;
        List<String> header;
    }

    private final Row row = new Row();
    /** Lines of the body before the part this reader reads (read by {@link PlainCsvRows}). */
    private final long linesBefore;
    /** The id cell of the row before, as chars, to tell a new series without making a string for every row. */
    private char[] idChars = new char[0];
    private int[] columns;
    private List<String> header;

    BatchRowReader(long linesBefore) {
        this.linesBefore = linesBefore;
    }

    void useColumns(int[] columns) {
        this.columns = columns;
    }

    @Override
    protected void handleBegin(long startingLineNumber) {
        row.line = linesBefore + startingLineNumber;
        row.periodText = "";
        row.quantityText = "";
        if (columns == null) {
            header = new ArrayList<>();
        }
    }

    @Override
    protected void handleField(int index, char[] buffer, int offset, int length, boolean quoted) {
        int start = offset, end = offset + length;
        while (start < end && Character.isWhitespace(buffer[start])) {
            start++;
        }
        while (end > start && Character.isWhitespace(buffer[end - 1])) {
            end--;
        }
        if (columns == null) {
            header.add(new String(buffer, start, end - start));
        } else if (index == columns[0]) {
            if (!sameId(buffer, start, end)) {
                idChars = java.util.Arrays.copyOfRange(buffer, start, end);
                row.id = new String(idChars);
            }
        } else if (index == columns[1]) {
            row.period = digits(buffer, start, end);
            row.periodText = row.period < 0 ? new String(buffer, start, end - start) : null;
        } else if (index == columns[2]) {
            row.quantity = digits(buffer, start, end);
            row.quantityText = row.quantity < 0 ? new String(buffer, start, end - start) : null;
        }
    }

    @Override
    protected Row buildRecord() {
        if (columns == null) {
            row.header = header;
        } else {
            row.header = null;
            if (getFieldCount() <= Math.max(columns[0], Math.max(columns[1], columns[2]))) {
                // A short row: the cells it lacks are empty.
                if (getFieldCount() <= columns[0]) {
                    row.id = "";
                    idChars = new char[0];
                }
            }
        }
        return row;
    }

    /**
     * Whether the cell holds the id of the row before. A plain loop: ids are a few characters, and
     * {@code Arrays.equals} over ranges (bounds checks, then the vectorised mismatch) took a quarter of the batch's
     * processor time in a profile.
     */
    private boolean sameId(char[] buffer, int start, int end) {
        if (end - start != idChars.length) {
            return false;
        }
        for (int i = 0; i < idChars.length; i++) {
            if (idChars[i] != buffer[start + i]) {
                return false;
            }
        }
        return true;
    }

    /** Plain digits (at most 9, so no overflow) as a number; -1 for anything else, the empty cell included. */
    private static int digits(char[] buffer, int start, int end) {
        if (end == start || end - start > 9) {
            return -1;
        }
        int value = 0;
        for (int i = start; i < end; i++) {
            char c = buffer[i];
            if (c < '0' || c > '9') {
                return -1;
            }
            value = value * 10 + (c - '0');
        }
        return value;
    }
}
