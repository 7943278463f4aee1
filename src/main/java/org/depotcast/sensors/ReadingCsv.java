package org.depotcast.sensors;

import org.depotcast.common.BodySizeLimit;
import org.depotcast.common.FieldError;
import org.depotcast.common.InvalidInputException;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * Reads a readings CSV as the shared upload reader does (a UTF-8 byte-order mark skipped, ';' as the separator where
 * the header row has more of them than commas, RFC 4180 quotes, empty lines skipped, rows numbered with the header
 * as row 1), but cell by cell from a character buffer into the few columns intake uses. A year file is millions of
 * rows: the general reader's record objects and column maps were three quarters of intake's processor time.
 * A quoted value left open, or text after a closing quote, ends the file there: the rows before it stand and the
 * rest is refused as one unreadable row, as with the general reader.
 */
final class ReadingCsv {
    static final String UNREADABLE = "this row could not be read as CSV: a quoted value is not closed or text "
            + "follows its closing quote (a quote inside a quoted value is written twice)";
    private static final List<String> COLUMNS = List.of("asset_id", "day", "hours", "strokes", "litres");
    private static final int END = -1;

    private final Reader in;
    private final char[] buffer = new char[1 << 16];
    private int position, limit;
    private char delimiter = ',';
    private final StringBuilder cell = new StringBuilder(32);
    private final List<String> cells = new ArrayList<>(8);

    private ReadingCsv(Reader in) {
        this.in = in;
    }

    /** Hands each data row to {@code rows} as a {@link RawReading}. */
    static void read(InputStream body, Consumer<RawReading> rows) {
        if (body == null) {
            throw new InvalidInputException("body", "CSV body is empty");
        }
        new ReadingCsv(new InputStreamReader(BodySizeLimit.countedBulk(body), StandardCharsets.UTF_8)).readAll(rows);
    }

    private void readAll(Consumer<RawReading> rows) {
        try {
            int[] columnAt = header();
            long record = 1;
            while (true) {
                int ended = record();
                if (ended == Ending.UNREADABLE) {
                    rows.accept(RawReading.unreadable(record + 1, UNREADABLE));
                    drain();
                    return;
                }
                if (!(cells.size() == 1 && cells.get(0).isEmpty())) {
                    record++;
                    rows.accept(new RawReading(record, cellAt(columnAt[0]), cellAt(columnAt[1]),
                            cellAt(columnAt[2]), cellAt(columnAt[3]), cellAt(columnAt[4]), null));
                }
                if (ended == Ending.FILE) {
                    return;
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads the rest of the body through the size counter: a body over the limit is refused as too large. */
    private void drain() throws IOException {
        while (in.read(buffer, 0, buffer.length) >= 0) {
            // counted; the counter throws once the limit is passed
        }
    }

    /** Where each of {@link #COLUMNS} stands in the header row (-1 where absent); refuses a header without them. */
    private int[] header() throws IOException {
        if (peek() == '\uFEFF') {
            position++;
        }
        delimiter = delimiterOfHeaderRow();
        int ended;
        do {
            ended = record();
            if (ended == Ending.UNREADABLE) {
                throw new InvalidInputException("row 1", UNREADABLE);
            }
        } while (ended == Ending.LINE && cells.size() == 1 && cells.get(0).isEmpty());
        if (cells.size() == 1 && cells.get(0).isEmpty()) {
            throw new InvalidInputException("body", "CSV body is empty");
        }
        int[] at = new int[COLUMNS.size()];
        for (int c = 0; c < at.length; c++) {
            at[c] = -1;
            for (int i = cells.size() - 1; i >= 0; i--) {
                at[c] = cells.get(i).strip().equals(COLUMNS.get(c)) ? i : at[c];
            }
        }
        List<FieldError> missing = new ArrayList<>();
        for (int c = 0; c < 2; c++) {
            if (at[c] < 0) {
                missing.add(new FieldError("header", "missing column '" + COLUMNS.get(c) + "'"));
            }
        }
        if (!missing.isEmpty()) {
            throw new InvalidInputException(missing);
        }
        if (at[2] < 0 && at[3] < 0 && at[4] < 0) {
            throw new InvalidInputException("header", "needs a column 'hours', 'strokes' or 'litres'");
        }
        return at;
    }

    /** Null for a blank cell or one the row does not have, else the cell without surrounding spaces. */
    private String cellAt(int index) {
        if (index < 0 || index >= cells.size()) {
            return null;
        }
        String value = cells.get(index);
        return value.isBlank() ? null : value.strip();
    }

    /** How a record ended. */
    private static final class Ending {
        static final int LINE = 0, FILE = 1, UNREADABLE = 2;
    }

    /** Reads one record's cells into {@link #cells}. */
    private int record() throws IOException {
        cells.clear();
        while (true) {
            cell.setLength(0);
            int c = next();
            if (c == '"') {
                if (!quoted()) {
                    return Ending.UNREADABLE;
                }
                c = next();
                if (c != delimiter && c != '\n' && c != '\r' && c != END) {
                    return Ending.UNREADABLE;
                }
            } else {
                while (c != delimiter && c != '\n' && c != '\r' && c != END) {
                    cell.append((char) c);
                    c = next();
                }
            }
            cells.add(cell.toString());
            if (c == delimiter) {
                continue;
            }
            if (c == '\r' && peek() == '\n') {
                position++;
            }
            return c == END ? Ending.FILE : Ending.LINE;
        }
    }

    /** A quoted value up to its closing quote ({@code ""} inside is one quote); false when the file ends first. */
    private boolean quoted() throws IOException {
        while (true) {
            int c = next();
            if (c == END) {
                return false;
            }
            if (c == '"') {
                if (peek() != '"') {
                    return true;
                }
                position++;
            }
            cell.append((char) c);
        }
    }

    /** ';' when the header row has more semicolons than commas outside quotes, as the general reader decides. */
    private char delimiterOfHeaderRow() throws IOException {
        fill(position);
        int commas = 0, semicolons = 0;
        boolean inQuotes = false;
        for (int i = position; i < limit; i++) {
            char c = buffer[i];
            if (c == '"') {
                inQuotes = !inQuotes;
            } else if (!inQuotes && (c == '\n' || c == '\r')) {
                break;
            } else if (!inQuotes) {
                commas += c == ',' ? 1 : 0;
                semicolons += c == ';' ? 1 : 0;
            }
        }
        return semicolons > commas ? ';' : ',';
    }

    private int next() throws IOException {
        if (position == limit && !refill()) {
            return END;
        }
        return buffer[position++];
    }

    private int peek() throws IOException {
        if (position == limit && !refill()) {
            return END;
        }
        return buffer[position];
    }

    private boolean refill() throws IOException {
        position = 0;
        limit = 0;
        fill(0);
        return limit > 0;
    }

    /** Reads until the buffer is full or the body ends, keeping what stands from {@code from}. */
    private void fill(int from) throws IOException {
        if (from > 0) {
            System.arraycopy(buffer, from, buffer, 0, limit - from);
            limit -= from;
            position = 0;
        }
        for (int n; limit < buffer.length && (n = in.read(buffer, limit, buffer.length - limit)) > 0; ) {
            limit += n;
        }
    }
}
