package org.depotcast.common;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;

/**
 * A CSV upload read one record at a time from the request stream (never held as one string). Accepts what
 * spreadsheets write: a UTF-8 byte-order mark, and ';' as the separator where the header row uses it. Identifier
 * columns refuse values a spreadsheet would run as a formula (OWASP "CSV Injection"). Every problem is recorded by
 * row and column in {@link #problems()}; a file that cannot be split into records (an unbalanced quote) is refused
 * at once, naming the row.
 */
public final class CsvUpload implements Iterable<CsvRow>, AutoCloseable {
    private static final int HEADER_SCAN_LIMIT = 64 * 1024;
    private static final String UNREADABLE = "this row could not be read as CSV: a quoted value is not closed or text "
            + "follows its closing quote (a quote inside a quoted value is written twice)";

    private final CSVParser parser;
    private final Map<String, Integer> header;
    private final Set<String> identifierColumns;
    private final CsvProblems problems = new CsvProblems();
    private final InputStream countedBody;
    private boolean iterated;

    private CsvUpload(CSVParser parser, Map<String, Integer> header, Set<String> identifierColumns,
                      InputStream countedBody) {
        this.countedBody = countedBody;
        this.parser = parser;
        this.header = header;
        this.identifierColumns = identifierColumns;
    }

    public static CsvUpload open(InputStream body, List<String> requiredColumns, Set<String> identifierColumns) {
        if (body == null) {
            throw new InvalidInputException("body", "CSV body is empty");
        }
        InputStream counted = BodySizeLimit.counted(body);
        return open(new InputStreamReader(counted, StandardCharsets.UTF_8), requiredColumns, identifierColumns, counted);
    }

    public static CsvUpload open(Reader body, List<String> requiredColumns, Set<String> identifierColumns) {
        return open(body, requiredColumns, identifierColumns, null);
    }

    private static CsvUpload open(Reader body, List<String> requiredColumns, Set<String> identifierColumns,
                                  InputStream countedBody) {
        try {
            BufferedReader in = body instanceof BufferedReader b ? b : new BufferedReader(body, 16 * 1024);
            skipByteOrderMark(in);
            char delimiter = delimiterOfHeader(in);
            CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setIgnoreEmptyLines(true).get();
            CSVParser parser = format.parse(in);
            Iterator<CSVRecord> records = parser.iterator();
            if (!records.hasNext()) {
                throw new InvalidInputException("body", "CSV body is empty");
            }
            Map<String, Integer> header = new HashMap<>();
            CSVRecord names = records.next();
            for (int i = 0; i < names.size(); i++) {
                header.putIfAbsent(names.get(i).strip(), i);
            }
            List<FieldError> missing = requiredColumns.stream().filter(c -> !header.containsKey(c))
                    .map(c -> new FieldError("header", "missing column '" + c + "'")).toList();
            if (!missing.isEmpty()) {
                throw new InvalidInputException(missing);
            }
            return new CsvUpload(parser, header, identifierColumns, countedBody);
        } catch (IOException | UncheckedIOException | IllegalStateException | IllegalArgumentException e) {
            rethrowIfTooLarge(e, countedBody);
            throw new InvalidInputException("row 1", UNREADABLE);
        }
    }

    public CsvProblems problems() {
        return problems;
    }

    /** The data rows, once, in file order. An unreadable record ends the file with a problem naming its row. */
    @Override
    public Iterator<CsvRow> iterator() {
        if (iterated) {
            throw new IllegalStateException("an upload is read once");
        }
        iterated = true;
        Iterator<CSVRecord> records = parser.iterator();
        return new Iterator<>() {
            private CsvRow next;
            private int lastLine = 1;
            private boolean ended;

            @Override
            public boolean hasNext() {
                if (next != null) {
                    return true;
                }
                if (ended) {
                    return false;
                }
                try {
                    if (!records.hasNext()) {
                        ended = true;
                        return false;
                    }
                    CSVRecord record = records.next();
                    // Rows numbered as a spreadsheet shows them: the header is row 1.
                    lastLine = (int) record.getRecordNumber();
                    next = new CsvRow(record, lastLine, header, problems);
                    checkIdentifiers(next);
                    return true;
                } catch (UncheckedIOException | IllegalStateException e) {
                    rethrowIfTooLarge(e, countedBody);
                    ended = true;
                    problems.add(lastLine + 1, null, UNREADABLE);
                    return false;
                }
            }

            @Override
            public CsvRow next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                CsvRow row = next;
                next = null;
                return row;
            }
        };
    }

    /** OWASP "CSV Injection": an identifier may not start with a character that makes a spreadsheet cell a formula. */
    private void checkIdentifiers(CsvRow row) {
        for (String column : identifierColumns) {
            String raw = row.raw(column);
            if (raw != null && startsAsFormula(raw)) {
                row.reject(column, "must not start with =, +, -, @, tab or carriage return: a spreadsheet would run it "
                        + "as a formula (OWASP CSV Injection)");
            }
        }
    }

    /**
     * A body over the size limit is a 413 even where it breaks the CSV first: the rest of the body is read through
     * the counter (at most up to the limit) before the file is refused as unreadable.
     */
    private static void rethrowIfTooLarge(Throwable e, InputStream countedBody) {
        for (Throwable cause = e; cause != null; cause = cause.getCause() == cause ? null : cause.getCause()) {
            if (cause instanceof BodyTooLargeException tooLarge) {
                throw tooLarge;
            }
        }
        if (countedBody != null) {
            try {
                byte[] rest = new byte[16 * 1024];
                while (countedBody.read(rest) >= 0) {
                    // counted; the counter throws once the limit is passed
                }
            } catch (IOException unreadable) {
                // the body ends here; it was not too large
            }
        }
    }

    static boolean startsAsFormula(String raw) {
        int i = 0;
        while (i < raw.length() && raw.charAt(i) == ' ') {
            i++;
        }
        if (i < raw.length() && "=+-@".indexOf(raw.charAt(i)) >= 0) {
            return true;
        }
        return !raw.isEmpty() && (raw.charAt(0) == '\t' || raw.charAt(0) == '\r');
    }

    @Override
    public void close() {
        try {
            parser.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void skipByteOrderMark(BufferedReader in) throws IOException {
        in.mark(1);
        if (in.read() != '\uFEFF') {
            in.reset();
        }
    }

    /** ';' when the header row has more semicolons than commas outside quotes (as spreadsheets in many locales write). */
    private static char delimiterOfHeader(BufferedReader in) throws IOException {
        in.mark(HEADER_SCAN_LIMIT);
        int commas = 0;
        int semicolons = 0;
        boolean quoted = false;
        for (int read = 0, c = in.read(); c >= 0 && read < HEADER_SCAN_LIMIT; read++, c = in.read()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted && (c == '\n' || c == '\r')) {
                break;
            } else if (!quoted && c == ',') {
                commas++;
            } else if (!quoted && c == ';') {
                semicolons++;
            }
        }
        in.reset();
        return semicolons > commas ? ';' : ',';
    }
}
