package org.depotcast.forecasting;

import java.nio.charset.StandardCharsets;

/**
 * The cells of a plain (ASCII) batch record read from bytes into the row, as {@link BatchRowReader} reads FastCSV's
 * chars: trimmed of what {@link Character#isWhitespace} calls white space, the id made a string only when it differs
 * from the row before, a period or quantity of plain digits read as a number and anything else kept as text for
 * {@link BatchCells} to read and name the problem.
 */
final class PlainCells {
    private byte[] id = new byte[64];
    private int idLength;

    /** A record begins: a period or quantity it lacks is an empty cell. */
    void begin(BatchRowReader.Row row) {
        row.periodText = "";
        row.quantityText = "";
    }

    void id(BatchRowReader.Row row, byte[] buffer, int start, int end) {
        start = trimStart(buffer, start, end);
        end = trimEnd(buffer, start, end);
        int length = end - start;
        if (length == idLength && same(buffer, start)) {
            return;
        }
        if (length > id.length) {
            id = new byte[Math.max(length, id.length * 2)];
        }
        System.arraycopy(buffer, start, id, 0, length);
        idLength = length;
        row.id = new String(buffer, start, length, StandardCharsets.ISO_8859_1);
    }

    /** A plain loop: ids are a few bytes, and {@code Arrays.equals} over ranges costs more (see BatchRowReader). */
    private boolean same(byte[] buffer, int start) {
        for (int i = 0; i < idLength; i++) {
            if (id[i] != buffer[start + i]) {
                return false;
            }
        }
        return true;
    }

    /**
     * The common record read at once: the id of the row before, then plain digits for the period and the quantity,
     * as the first three cells and nothing else, ending at a line feed in the buffer. Returns where that line feed
     * is, or -1 (the record is read cell by cell instead, which gives the same row for such a record: the id kept is
     * trimmed and not empty, so the cell is that id untrimmed).
     */
    int commonRecord(BatchRowReader.Row row, byte[] buffer, int start, int limit) {
        int p = start + idLength;
        if (idLength == 0 || p >= limit || buffer[p] != ',' || !same(buffer, start)) {
            return -1;
        }
        int period = 0;
        int from = ++p;
        for (int digit; p < limit && (digit = buffer[p] - '0') >= 0 && digit <= 9; p++) {
            period = period * 10 + digit;
        }
        if (p == from || p - from > 9 || p >= limit || buffer[p] != ',') {
            return -1;
        }
        int quantity = 0;
        from = ++p;
        for (int digit; p < limit && (digit = buffer[p] - '0') >= 0 && digit <= 9; p++) {
            quantity = quantity * 10 + digit;
        }
        if (p == from || p - from > 9 || p >= limit || buffer[p] != '\n') {
            return -1;
        }
        row.period = period;
        row.periodText = null;
        row.quantity = quantity;
        row.quantityText = null;
        return p;
    }

    /** The record has no id cell: the id is empty. */
    void noId(BatchRowReader.Row row) {
        row.id = "";
        idLength = 0;
    }

    void period(BatchRowReader.Row row, byte[] buffer, int start, int end) {
        start = trimStart(buffer, start, end);
        end = trimEnd(buffer, start, end);
        row.period = digits(buffer, start, end);
        row.periodText = row.period < 0 ? new String(buffer, start, end - start, StandardCharsets.ISO_8859_1) : null;
    }

    void quantity(BatchRowReader.Row row, byte[] buffer, int start, int end) {
        start = trimStart(buffer, start, end);
        end = trimEnd(buffer, start, end);
        row.quantity = digits(buffer, start, end);
        row.quantityText = row.quantity < 0 ? new String(buffer, start, end - start, StandardCharsets.ISO_8859_1) : null;
    }

    /** A header cell, trimmed. */
    String text(byte[] buffer, int start, int end) {
        start = trimStart(buffer, start, end);
        end = trimEnd(buffer, start, end);
        return new String(buffer, start, end - start, StandardCharsets.ISO_8859_1);
    }

    private static int trimStart(byte[] buffer, int start, int end) {
        while (start < end && blank(buffer[start])) {
            start++;
        }
        return start;
    }

    private static int trimEnd(byte[] buffer, int start, int end) {
        while (end > start && blank(buffer[end - 1])) {
            end--;
        }
        return end;
    }

    /** {@link Character#isWhitespace} of an ASCII byte: tab to carriage return, the four separators, space. */
    private static boolean blank(byte b) {
        return b <= ' ' && (b >= 28 || (b >= 9 && b <= 13));
    }

    /** Plain digits (at most 9, so no overflow) as a number; -1 for anything else, the empty cell included. */
    private static int digits(byte[] buffer, int start, int end) {
        if (end == start || end - start > 9) {
            return -1;
        }
        int value = 0;
        for (int i = start; i < end; i++) {
            int digit = buffer[i] - '0';
            if (digit < 0 || digit > 9) {
                return -1;
            }
            value = value * 10 + digit;
        }
        return value;
    }
}
