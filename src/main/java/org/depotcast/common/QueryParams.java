package org.depotcast.common;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;

/**
 * Typed query parameters that fail with a 400 naming the parameter. JAX-RS would answer a failed conversion of a
 * typed @QueryParam with a bare 404, so resources take such parameters as strings and convert them here.
 */
public final class QueryParams {
    private QueryParams() {
    }

    public static <E extends Enum<E>> E optionalEnum(String name, String value, Class<E> type) {
        if (value == null || value.isBlank()) {
            return null;
        }
        return EnumNames.parse(type, value).orElseThrow(() -> new InvalidInputException(name,
                "must be one of " + EnumNames.allowed(type) + ", was '" + shown(value) + "'"));
    }

    public static LocalDate optionalDate(String name, String value) {
        if (value == null || value.isBlank()) {
            return null;
        }
        LocalDate date;
        try {
            date = LocalDate.parse(value.strip());
        } catch (DateTimeParseException e) {
            throw new InvalidInputException(name, "must be a date written yyyy-mm-dd, was '" + shown(value) + "'");
        }
        return DateBounds.requirePlausible(name, date);
    }

    public static OffsetDateTime optionalInstant(String name, String value) {
        if (value == null || value.isBlank()) {
            return null;
        }
        OffsetDateTime at;
        try {
            at = value.length() == 10 ? LocalDate.parse(value).atStartOfDay().atOffset(java.time.ZoneOffset.UTC)
                    : OffsetDateTime.parse(value.strip());
        } catch (DateTimeParseException e) {
            throw new InvalidInputException(name, "must be a date (yyyy-mm-dd) or an ISO-8601 date-time, was '"
                    + shown(value) + "'");
        }
        return DateBounds.requirePlausible(name, at);
    }

    public static Double optionalDouble(String name, String value) {
        if (value == null || value.isBlank()) {
            return null;
        }
        double parsed;
        try {
            parsed = Double.parseDouble(value.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(name, "must be a number, was '" + shown(value) + "'");
        }
        if (!Double.isFinite(parsed)) {
            throw new InvalidInputException(name, "must be a finite number, was '" + shown(value) + "'");
        }
        return parsed;
    }

    /** {@code true} or {@code false} (any case); absent or blank is false. */
    public static boolean optionalBoolean(String name, String value) {
        if (value == null || value.isBlank()) {
            return false;
        }
        return switch (value.strip().toLowerCase(java.util.Locale.ROOT)) {
            case "true" -> true;
            case "false" -> false;
            default -> throw new InvalidInputException(name, "must be true or false, was '" + shown(value) + "'");
        };
    }

    public static Integer optionalInt(String name, String value) {
        if (value == null || value.isBlank()) {
            return null;
        }
        try {
            return Integer.parseInt(value.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(name, "must be a whole number, was '" + shown(value) + "'");
        }
    }

    public static int intInRange(String name, String value, int defaultValue, int min, int max) {
        if (value == null || value.isBlank()) {
            return defaultValue;
        }
        try {
            int parsed = Integer.parseInt(value.strip());
            if (parsed < min || parsed > max) {
                throw new InvalidInputException(name, "must be between " + min + " and " + max + ", was " + parsed);
            }
            return parsed;
        } catch (NumberFormatException e) {
            throw new InvalidInputException(name, "must be a whole number, was '" + shown(value) + "'");
        }
    }

    /** A client's value as quoted back in a message: cut short, so a huge parameter does not make a huge answer. */
    public static String shown(String value) {
        return value.length() <= 40 ? value : value.substring(0, 40) + "…";
    }
}
