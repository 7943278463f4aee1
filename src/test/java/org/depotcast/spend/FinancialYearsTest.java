package org.depotcast.spend;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Financial-year periods, checked against hand-worked calendars. */
class FinancialYearsTest {
    private static final LocalDate DAY = LocalDate.of(2026, 12, 2);

    @Test
    void calendarYearsStartWithTheMonthsLeftInTheYearInProgress() {
        List<FinancialYears.Period> p = new FinancialYears(1).projection(DAY, 2);
        assertEquals(List.of("2026", "2027", "2028"), p.stream().map(FinancialYears.Period::label).toList());
        assertEquals(List.of("Dec 2026", "Jan 2027 – Dec 2027", "Jan 2028 – Dec 2028"),
                p.stream().map(FinancialYears.Period::months).toList());
        assertTrue(p.get(0).partial());
        assertEquals(1, p.get(0).monthCount());
        assertEquals(LocalDate.of(2027, 12, 31), p.get(1).endsOn());
    }

    @Test
    void aJulyYearIsLabelledByBothCalendarYearsAndItsMonths() {
        FinancialYears july = new FinancialYears(7);
        List<FinancialYears.Period> p = july.projection(DAY, 1);
        assertEquals("2026/27", p.get(0).label());
        assertEquals("Dec 2026 – Jun 2027", p.get(0).months());
        assertEquals(7, p.get(0).monthCount());
        assertEquals("2027/28", p.get(1).label());
        assertEquals("Jul 2027 – Jun 2028", p.get(1).months());
        assertEquals(LocalDate.of(2026, 7, 1), july.startOfYearContaining(DAY));
        assertEquals(List.of("2024/25", "2025/26"), july.completedBefore(DAY, 2).stream()
                .map(FinancialYears.Period::label).toList());
        assertEquals(LocalDate.of(2026, 6, 30), july.completedBefore(DAY, 1).get(0).endsOn());
    }

    @Test
    void aProjectionMadeInTheFirstMonthOfAYearHasNoPartPeriod() {
        List<FinancialYears.Period> p = new FinancialYears(4).projection(LocalDate.of(2027, 4, 15), 2);
        assertEquals(2, p.size());
        assertFalse(p.get(0).partial());
        assertEquals("Apr 2027 – Mar 2028", p.get(0).months());
        assertThrows(IllegalArgumentException.class, () -> new FinancialYears(13));
    }
}
