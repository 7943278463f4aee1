package org.depotcast.sensors;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.time.LocalDate;
import java.time.DateTimeException;
import java.util.Map;

/**
 * The rules a daily reading must pass, one row at a time: a pump we know and the caller may see, a day from the
 * pump's installation to today (one day of grace for time zones, as for every event in the service), and 0 to 24
 * hours of use, given as hours or as strokes or litres turned into hours by the pump model's factor. Hours are kept
 * to the hundredth (half up), as the database column holds them.
 */
final class ReadingCheck {
    /** Hundredths of an hour in a day: the most a day can hold. */
    static final int DAY_HUNDREDTHS = 2400;
    private static final int LONGEST_NUMBER = 30;

    /** A reading that passed: the pump, the day and the hours in hundredths. */
    record Checked(long row, PumpIndex.PumpFacts pump, LocalDate day, int hundredths) {
    }

    /** Strokes and litres per hour of use for a pump model; either may be null where not set. */
    record Factors(BigDecimal strokesPerHour, BigDecimal litresPerHour) {
    }

    /** Either a checked reading or the reason the row is refused. */
    record Outcome(Checked reading, RefusedRow refusal) {
    }

    private final PumpIndex pumps;
    private final Map<Long, Factors> factorsByModel;
    private final LocalDate latestDay;

    ReadingCheck(PumpIndex pumps, Map<Long, Factors> factorsByModel, LocalDate latestDay) {
        this.pumps = pumps;
        this.factorsByModel = factorsByModel;
        this.latestDay = latestDay;
    }

    Outcome check(RawReading raw) {
        if (raw.unreadable() != null) {
            return refuse(raw, "row", raw.unreadable());
        }
        if (raw.assetId() == null || raw.assetId().isBlank()) {
            return refuse(raw, "assetId", "missing");
        }
        PumpIndex.PumpFacts pump = pumps.find(raw.assetId().strip());
        if (pump == null || !pump.visible()) {
            // A pump outside the caller's depots reads as unknown, so the answer does not tell which exist.
            return refuse(raw, "assetId", "no pump '" + shorten(raw.assetId()) + "' among the pumps you may see");
        }
        LocalDate day;
        try {
            day = raw.day() == null ? null : isoDay(raw.day().strip());
        } catch (DateTimeException e) {
            return refuse(raw, "day", "not a date (yyyy-mm-dd)");
        }
        if (day == null) {
            return refuse(raw, "day", "missing");
        }
        if (day.isBefore(pump.installedOn())) {
            return refuse(raw, "day", "before the pump was installed on " + pump.installedOn());
        }
        if (day.isAfter(latestDay)) {
            return refuse(raw, "day", "after today");
        }
        return hours(raw, pump, day);
    }

    private Outcome hours(RawReading raw, PumpIndex.PumpFacts pump, LocalDate day) {
        int given = (raw.hours() != null ? 1 : 0) + (raw.strokes() != null ? 1 : 0) + (raw.litres() != null ? 1 : 0);
        if (given != 1) {
            return refuse(raw, "hours", given == 0 ? "missing: give hours, strokes or litres"
                    : "give only one of hours, strokes or litres");
        }
        String field = raw.hours() != null ? "hours" : raw.strokes() != null ? "strokes" : "litres";
        String text = raw.hours() != null ? raw.hours() : raw.strokes() != null ? raw.strokes() : raw.litres();
        if ("hours".equals(field)) {
            int plain = plainHundredths(text);
            if (plain >= 0 && plain <= DAY_HUNDREDTHS) {
                return new Outcome(new Checked(raw.row(), pump, day, plain), null);
            }
        }
        BigDecimal value = number(text);
        if (value == null) {
            return refuse(raw, field, "not a number");
        }
        if (value.signum() < 0) {
            return refuse(raw, field, "negative");
        }
        BigDecimal hours = value;
        if (!"hours".equals(field)) {
            Factors factors = factorsByModel.get(pump.modelId());
            BigDecimal perHour = factors == null ? null
                    : "strokes".equals(field) ? factors.strokesPerHour() : factors.litresPerHour();
            if (perHour == null) {
                return refuse(raw, field, "no " + field + "-per-hour factor is set for this pump's model");
            }
            hours = value.divide(perHour, 4, RoundingMode.HALF_UP);
        }
        BigDecimal hundredths = hours.setScale(2, RoundingMode.HALF_UP).movePointRight(2);
        if (hundredths.compareTo(BigDecimal.valueOf(DAY_HUNDREDTHS)) > 0) {
            return refuse(raw, field, "more than 24 hours of use in one day");
        }
        return new Outcome(new Checked(raw.row(), pump, day, hundredths.intValueExact()), null);
    }

    /**
     * A day written {@code yyyy-mm-dd} read digit by digit: {@code LocalDate.parse}'s formatter was a quarter of a
     * year file's intake time. Any other shape goes through the formatter, so what is refused stays the same; an
     * impossible date (2026-02-30) throws {@link DateTimeException} either way.
     */
    static LocalDate isoDay(String text) {
        if (text.length() == 10 && text.charAt(4) == '-' && text.charAt(7) == '-') {
            int year = digits(text, 0, 4), month = digits(text, 5, 7), dayOfMonth = digits(text, 8, 10);
            if (year >= 0 && month >= 0 && dayOfMonth >= 0) {
                return LocalDate.of(year, month, dayOfMonth);
            }
        }
        return LocalDate.parse(text);
    }

    private static int digits(String text, int from, int to) {
        int value = 0;
        for (int i = from; i < to; i++) {
            char c = text.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            value = value * 10 + (c - '0');
        }
        return value;
    }

    /**
     * Hours written as plain digits with at most two decimals ({@code 5}, {@code 5.5}, {@code 12.25}) in hundredths,
     * without a BigDecimal; -1 for any other shape, which then takes the general path (rounding, signs, exponents).
     */
    static int plainHundredths(String text) {
        String t = text.strip();
        int point = t.indexOf('.');
        int whole = digitsOrFail(t, 0, point < 0 ? t.length() : point);
        if (whole < 0 || whole > 24 || (point >= 0 && (t.length() - point - 1 > 2 || t.length() - point - 1 < 1))) {
            return -1;
        }
        if (point < 0) {
            return whole * 100;
        }
        int decimals = digitsOrFail(t, point + 1, t.length());
        return decimals < 0 ? -1 : whole * 100 + (t.length() - point - 1 == 1 ? decimals * 10 : decimals);
    }

    private static int digitsOrFail(String text, int from, int to) {
        return to <= from || to - from > 3 ? -1 : digits(text, from, to);
    }

    private static BigDecimal number(String text) {
        String t = text.strip();
        if (t.isEmpty() || t.length() > LONGEST_NUMBER) {
            return null;
        }
        try {
            BigDecimal value = new BigDecimal(t);
            return Math.abs(value.scale()) > 100 ? null : value;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    private static Outcome refuse(RawReading raw, String field, String reason) {
        return new Outcome(null, new RefusedRow(raw.row(), field, reason));
    }

    private static String shorten(String text) {
        return text.length() > 40 ? text.substring(0, 40) + "…" : text;
    }
}
