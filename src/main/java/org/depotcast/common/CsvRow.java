package org.depotcast.common;

import org.apache.commons.csv.CSVRecord;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.Locale;

/** One data row; each getter records a problem (and returns null) instead of throwing, so all faults are listed. */
public final class CsvRow {
    private final CSVRecord record;
    private final int line;
    private final CsvProblems problems;

    CsvRow(CSVRecord record, int line, CsvProblems problems) {
        this.record = record;
        this.line = line;
        this.problems = problems;
    }

    public int line() {
        return line;
    }

    public void reject(String column, String message) {
        problems.add(line, column, message);
    }

    public String optionalText(String column) {
        if (!record.isMapped(column) || !record.isSet(column)) {
            return null;
        }
        String value = record.get(column);
        return value == null || value.isBlank() ? null : value.strip();
    }

    public String text(String column) {
        String value = optionalText(column);
        if (value == null) {
            reject(column, "is required");
        }
        return value;
    }

    public Integer optionalInt(String column, int min) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            int parsed = Integer.parseInt(value);
            if (parsed < min) {
                reject(column, "must be at least " + min + ", was " + parsed);
                return null;
            }
            return parsed;
        } catch (NumberFormatException e) {
            reject(column, "must be a whole number, was '" + value + "'");
            return null;
        }
    }

    public Integer integer(String column, int min) {
        if (optionalText(column) == null) {
            reject(column, "is required");
            return null;
        }
        return optionalInt(column, min);
    }

    public BigDecimal optionalDecimal(String column, BigDecimal min, boolean minExclusive) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            BigDecimal parsed = new BigDecimal(value);
            int cmp = parsed.compareTo(min);
            if (cmp < 0 || (minExclusive && cmp == 0)) {
                reject(column, "must be " + (minExclusive ? "greater than " : "at least ") + min.toPlainString()
                        + ", was " + value);
                return null;
            }
            return parsed;
        } catch (NumberFormatException e) {
            reject(column, "must be a number, was '" + value + "'");
            return null;
        }
    }

    public BigDecimal decimal(String column, BigDecimal min, boolean minExclusive) {
        if (optionalText(column) == null) {
            reject(column, "is required");
            return null;
        }
        return optionalDecimal(column, min, minExclusive);
    }

    public LocalDate optionalDate(String column) {
        String value = optionalText(column);
        if (value == null) {
            return null;
        }
        try {
            return LocalDate.parse(value);
        } catch (DateTimeParseException e) {
            reject(column, "must be a date written yyyy-mm-dd, was '" + value + "'");
            return null;
        }
    }

    public LocalDate date(String column) {
        if (optionalText(column) == null) {
            reject(column, "is required");
            return null;
        }
        return optionalDate(column);
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
                reject(column, "must be true or false, was '" + value + "'");
                yield null;
            }
        };
    }

    public <E extends Enum<E>> E choice(String column, Class<E> type) {
        String value = text(column);
        if (value == null) {
            return null;
        }
        E parsed = EnumNames.parse(type, value).orElse(null);
        if (parsed == null) {
            reject(column, "must be one of " + EnumNames.allowed(type) + ", was '" + value + "'");
        }
        return parsed;
    }
}
