package org.depotcast.forecasting;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The batch body's plain records read straight from its bytes, the fast path before FastCSV. A record is plain when
 * it ends at a line feed (or the end of the body), fits in the buffer, and holds no quote, no carriage return and
 * no byte outside ASCII: FastCSV (RFC 4180) splits such a record at its commas and nothing else, and UTF-8 decodes
 * each of its bytes to the same char, so the cells read here are the cells FastCSV would give. At the first record
 * that is not plain, reading stops and {@link #rest()} hands the body from that record on to FastCSV, which reads
 * quoting, other line ends, byte-order marks and other encodings as before. Empty lines are skipped, as FastCSV's
 * {@code skipEmptyLines} does. A profile put FastCSV's char decoding and per-cell callbacks at half of the batch's
 * processor time.
 */
final class PlainCsvRows {
    private static final int BUFFER = 1 << 18;
    private final InputStream in;
    private final byte[] buffer = new byte[BUFFER];
    private final PlainCells cells = new PlainCells();
    /** Unread bytes are buffer[position, limit). */
    private int position;
    private int limit;
    private boolean ended;
    private boolean stopped;
    /** Line feeds before {@link #position}: the line of the next record is one more. */
    private long lines;
    private long consumed;

    PlainCsvRows(InputStream in) {
        this.in = in;
    }

    /** The header's cells, trimmed; null at the end of the body or where the header is not plain. */
    List<String> header() {
        int end = nextRecord();
        if (end < 0) {
            return null;
        }
        List<String> names = new ArrayList<>();
        for (int start = position, comma; start <= end; start = comma + 1) {
            comma = indexOfComma(start, end);
            names.add(cells.text(buffer, start, comma));
        }
        advance(end);
        return names;
    }

    /** Reads the next plain record into the row (cells by {@code columns}); false at the end or where it stops. */
    boolean next(BatchRowReader.Row row, int[] columns) {
        if (!stopped && columns[0] == 0 && columns[1] == 1 && columns[2] == 2) {
            int end = cells.commonRecord(row, buffer, position, limit);
            if (end >= 0) {
                row.line = lines + 1;
                advance(end);
                return true;
            }
        }
        int end = nextRecord();
        if (end < 0) {
            return false;
        }
        row.line = lines + 1;
        cells.begin(row);
        int index = 0;
        for (int start = position, comma; start <= end; start = comma + 1, index++) {
            comma = indexOfComma(start, end);
            if (index == columns[0]) {
                cells.id(row, buffer, start, comma);
            } else if (index == columns[1]) {
                cells.period(row, buffer, start, comma);
            } else if (index == columns[2]) {
                cells.quantity(row, buffer, start, comma);
            }
        }
        if (index <= columns[0]) {
            cells.noId(row);
        }
        advance(end);
        return true;
    }

    /** Whether reading stopped at a record that is not plain (then {@link #rest()} holds it and what follows). */
    boolean stopped() {
        return stopped;
    }

    /** The body from the record where reading stopped: the buffered bytes, then the stream. */
    InputStream rest() {
        return new SequenceInputStream(new ByteArrayInputStream(buffer, position, limit - position), in);
    }

    /** Lines of the body before {@link #rest()}, to number FastCSV's lines as lines of the whole body. */
    long linesBefore() {
        return lines;
    }

    /** Whether {@link #rest()} is the whole body (only there can a byte-order mark begin it). */
    boolean restIsWholeBody() {
        return consumed == 0;
    }

    private void advance(int end) {
        int next = Math.min(end + 1, limit);
        consumed += next - position;
        position = next;
        lines++;
    }

    private int indexOfComma(int start, int end) {
        int i = start;
        while (i < end && buffer[i] != ',') {
            i++;
        }
        return i;
    }

    /**
     * Skips empty lines and finds the end of the next record (its line feed, or the end of the body): -1 at the end
     * of the body or where the record is not plain (then {@link #stopped} is set).
     */
    private int nextRecord() {
        if (stopped) {
            return -1;
        }
        int i = position;
        while (true) {
            if (i == limit) {
                if (ended || limit - position == buffer.length) {
                    break;
                }
                i -= position;
                fill();
                continue;
            }
            byte b = buffer[i];
            if (b <= '"') {
                if (b == '\n') {
                    if (i == position) {
                        advance(i);
                        i = position;
                        continue;
                    }
                    return i;
                }
                if (b == '"' || b == '\r' || b < 0) {
                    stopped = true;
                    return -1;
                }
            }
            i++;
        }
        if (i > position) {
            // The last record without a line feed, or one longer than the buffer (FastCSV reads that one).
            stopped = !ended;
            return ended ? i : -1;
        }
        return -1;
    }

    /** Moves the unread bytes to the start of the buffer and reads more after them. */
    private void fill() {
        int unread = limit - position;
        System.arraycopy(buffer, position, buffer, 0, unread);
        position = 0;
        limit = unread;
        try {
            int n = in.read(buffer, limit, buffer.length - limit);
            if (n < 0) {
                ended = true;
            } else {
                limit += n;
            }
        } catch (IOException e) {
            // As FastCSV's iterator does, so the batch answers a broken body the same on either path.
            throw new UncheckedIOException(e);
        }
    }
}
