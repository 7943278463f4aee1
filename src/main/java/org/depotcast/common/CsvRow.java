package org.depotcast.common;

import org.apache.commons.csv.CSVRecord;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.HashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * One data row. Getters turn cells into typed values the way JSON deserialisation does for a request body, and record
 * a problem (returning null) instead of throwing, so every fault of a file is listed. Rules on the values themselves
 * (bounds, lengths, patterns) are the request record's Bean Validation constraints, checked by {@link CsvImporter}.
 */
public final class CsvRow {
    /** Beyond this a number is not one a person meant (and would cost time to compare): refused as unreadable. */
    private static final int LARGEST_EXPONENT = 100;

    private final CSVRecord record;
    private final int line;
    private final Map<String, Integer> header;
    private final CsvProblems problems;
    private final Set<String> rejectedColumns = new HashSet<>();

    CsvRow(CSVRecord record, int line, Map<String, Integer> header, CsvProblems problems) {
        this.record = record;
        this.line = line;
        this.header = header;
        this.problems = problems;
    }

    public int line() {
        return line;
    }

    public void reject(String column, String message) {
        rejectedColumns.add(column);
        problems.add(line, column, message);
    }

    boolean hasProblems() {
        return !rejectedColumns.isEmpty();
    }

    boolean rejected(String column) {
        return rejectedColumns.contains(column);
    }

    /** Whether the file has this column at all. */
    public boolean has(String column) {
        return header.containsKey(column);
    }

    /** The cell as written, spaces included; null when the row has no such column. */
    String raw(String column) {
        Integer index = header.get(column);
        return index == null || index >= record.size() ? null : record.get(index);
    }

    public String optionalText(String column) {
        String value = raw(column);
        return value == null || value.isBlank() ? null : value.strip();
    }

    public String text(String column) {
        String value = optionalText(column);
        if (value == null) {
            reject(column, "is required");
        }
        return value;
    }

    public Integer optionalInteger(String column) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            return Integer.parseInt(value);
        } catch (NumberFormatException e) {
            reject(column, "must be a whole number, was '" + shown(value) + "'");
            return null;
        }
    }

    public Integer integer(String column) {
        return required(column) ? optionalInteger(column) : null;
    }

    public BigDecimal optionalDecimal(String column) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            BigDecimal parsed = new BigDecimal(value);
            if (Math.abs(parsed.scale()) > LARGEST_EXPONENT || parsed.precision() > LARGEST_EXPONENT) {
                reject(column, "must be a number of ordinary size, was '" + shown(value) + "'");
                return null;
            }
            return parsed;
        } catch (NumberFormatException e) {
            reject(column, "must be a number, was '" + shown(value) + "'");
            return null;
        }
    }

    public BigDecimal decimal(String column) {
        return required(column) ? optionalDecimal(column) : null;
    }

    public LocalDate optionalDate(String column) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            return LocalDate.parse(value);
        } catch (DateTimeParseException e) {
            reject(column, "must be a date written yyyy-mm-dd, was '" + shown(value) + "'");
            return null;
        }
    }

    public LocalDate date(String column) {
        return required(column) ? optionalDate(column) : null;
    }

    public Boolean optionalBoolean(String column) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        return switch (value.toLowerCase(Locale.ROOT)) {
            case "true", "yes", "1" -> Boolean.TRUE;
            case "false", "no", "0" -> Boolean.FALSE;
            default -> {
                reject(column, "must be true or false, was '" + shown(value) + "'");
                yield null;
            }
        };
    }

    public <E extends Enum<E>> E optionalChoice(String column, Class<E> type) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        E parsed = EnumNames.parse(type, value).orElse(null);
        if (parsed == null) {
            reject(column, "must be one of " + EnumNames.allowed(type) + ", was '" + shown(value) + "'");
        }
        return parsed;
    }

    public <E extends Enum<E>> E choice(String column, Class<E> type) {
        return required(column) ? optionalChoice(column, type) : null;
    }

    private boolean required(String column) {
        if (optionalText(column) == null) {
            reject(column, "is required");
            return false;
        }
        return true;
    }

    /** A cell quoted back in a message, cut short so one huge cell cannot make a huge answer. */
    private static String shown(String value) {
        return value.length() > 40 ? value.substring(0, 40) + "…" : value;
    }
}
