package org.depotcast.sensors;

import java.time.LocalDate;
import java.util.Arrays;

/**
 * One pump's daily readings in one calendar month, as stored in {@code sensor_month.day_hours}: 4 characters a day,
 * hundredths of an hour ({@code 0000}–{@code 2400}) or {@code ....} for a day with no reading.
 */
final class MonthDays {
    static final int MISSING = -1;
    private static final String NO_READING = "....";

    private final LocalDate monthStart;
    private final int[] hundredths;

    private MonthDays(LocalDate monthStart, int[] hundredths) {
        this.monthStart = monthStart;
        this.hundredths = hundredths;
    }

    static MonthDays empty(LocalDate monthStart) {
        int[] days = new int[monthStart.lengthOfMonth()];
        Arrays.fill(days, MISSING);
        return new MonthDays(monthStart, days);
    }

    static MonthDays decode(LocalDate monthStart, String text) {
        int[] days = new int[monthStart.lengthOfMonth()];
        for (int d = 0; d < days.length; d++) {
            days[d] = hundredthsOn(text, d);
        }
        return new MonthDays(monthStart, days);
    }

    /**
     * Hundredths of an hour on the day {@code index} (0 for the first) of a stored {@code day_hours} text, or
     * {@link #MISSING}: read by character, since a year of files re-reads hundreds of thousands of months and the stop
     * check reads five months of every pump judged.
     */
    static int hundredthsOn(String text, int index) {
        int at = 4 * index;
        return text.charAt(at) == '.' ? MISSING : (text.charAt(at) - '0') * 1000
                + (text.charAt(at + 1) - '0') * 100 + (text.charAt(at + 2) - '0') * 10 + (text.charAt(at + 3) - '0');
    }

    String encode() {
        StringBuilder text = new StringBuilder(4 * hundredths.length);
        for (int h : hundredths) {
            if (h == MISSING) {
                text.append(NO_READING);
            } else {
                text.append((char) ('0' + h / 1000)).append((char) ('0' + h / 100 % 10))
                        .append((char) ('0' + h / 10 % 10)).append((char) ('0' + h % 10));
            }
        }
        return text.toString();
    }

    LocalDate monthStart() {
        return monthStart;
    }

    int length() {
        return hundredths.length;
    }

    /** Hundredths of an hour on the day, or {@link #MISSING}. */
    int get(LocalDate day) {
        return hundredths[day.getDayOfMonth() - 1];
    }

    /** Sets the day's reading and returns what it held before ({@link #MISSING} for none). */
    int set(LocalDate day, int value) {
        int old = hundredths[day.getDayOfMonth() - 1];
        hundredths[day.getDayOfMonth() - 1] = value;
        return old;
    }

    long sumHundredths() {
        long sum = 0;
        for (int h : hundredths) {
            sum += h == MISSING ? 0 : h;
        }
        return sum;
    }

    int daysCovered() {
        int covered = 0;
        for (int h : hundredths) {
            covered += h == MISSING ? 0 : 1;
        }
        return covered;
    }
}
