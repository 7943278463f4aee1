package org.depotcast.spend;

import java.time.LocalDate;
import java.time.YearMonth;
import java.time.format.TextStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The programme's financial years, which start on the first day of {@code startMonth} (1 = January: calendar
 * years). A projection made on a day runs from the start of that month: first the months left in the financial year
 * in progress (none when the month starts a financial year), then whole financial years. Each period is labelled by
 * the months it covers, so a label never hides where a year starts.
 */
public record FinancialYears(int startMonth) {
    public FinancialYears {
        if (startMonth < 1 || startMonth > 12) {
            throw new IllegalArgumentException("startMonth must be 1–12, was " + startMonth);
        }
    }

    /**
     * One projection period.
     *
     * @param label  the financial year, "2027" when years are calendar years, else "2026/27" (start and end year)
     * @param months the months covered, e.g. "Jul 2026 – Jun 2027" or "Dec 2026"
     * @param partial true for the months left in the financial year in progress
     */
    public record Period(String label, String months, LocalDate startsOn, LocalDate endsOn, int monthCount,
                         boolean partial) {
    }

    /** The first day of the financial year that contains {@code day}. */
    public LocalDate startOfYearContaining(LocalDate day) {
        int year = day.getMonthValue() >= startMonth ? day.getYear() : day.getYear() - 1;
        return LocalDate.of(year, startMonth, 1);
    }

    /** Months from the start of {@code day}'s month to the end of its financial year; 0 when that month starts one. */
    public int monthsLeftInYear(LocalDate day) {
        int elapsed = Math.floorMod(day.getMonthValue() - startMonth, 12);
        return elapsed == 0 ? 0 : 12 - elapsed;
    }

    /** The periods of a projection made on {@code day}: the rest of the year in progress, then {@code years} whole years. */
    public List<Period> projection(LocalDate day, int years) {
        List<Period> periods = new ArrayList<>();
        YearMonth first = YearMonth.from(day);
        int stub = monthsLeftInYear(day);
        if (stub > 0) {
            periods.add(period(first, stub, true));
        }
        YearMonth next = first.plusMonths(stub);
        for (int y = 0; y < years; y++) {
            periods.add(period(next.plusMonths(12L * y), 12, false));
        }
        return periods;
    }

    /** The last {@code years} financial years completed before {@code day}, oldest first. */
    public List<Period> completedBefore(LocalDate day, int years) {
        YearMonth current = YearMonth.from(startOfYearContaining(day));
        List<Period> periods = new ArrayList<>();
        for (int y = years; y >= 1; y--) {
            periods.add(period(current.minusMonths(12L * y), 12, false));
        }
        return periods;
    }

    private Period period(YearMonth from, int months, boolean partial) {
        YearMonth to = from.plusMonths(months - 1L);
        LocalDate yearStart = startOfYearContaining(from.atDay(1));
        String label = startMonth == 1 ? Integer.toString(yearStart.getYear())
                : yearStart.getYear() + "/" + String.format(Locale.ROOT, "%02d", (yearStart.getYear() + 1) % 100);
        String span = months == 1 ? name(from) : name(from) + " – " + name(to);
        return new Period(label, span, from.atDay(1), to.atEndOfMonth(), months, partial);
    }

    private static String name(YearMonth month) {
        return month.getMonth().getDisplayName(TextStyle.SHORT, Locale.ENGLISH) + " " + month.getYear();
    }
}
