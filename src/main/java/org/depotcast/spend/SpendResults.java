package org.depotcast.spend;

import org.depotcast.core.spend.SpendSimulation;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;

/**
 * What a run found, per projection period: total, per component family, per part and per depot, each as a mean with
 * 80 % (p10–p90) and 95 % (p2.5–p97.5) intervals. Periods are the programme's financial years (starting in
 * {@code financialYearStartMonth}): first the months left in the year in progress ({@code partial}), then whole
 * years. {@code stability} compares the total's interval from the first half of the draws with all of them, to show
 * the draw count is enough.
 */
public record SpendResults(String scenario, String currency, int draws, long seed, int financialYearStartMonth,
                           List<Year> years, List<String> notes) {
    /**
     * @param year   the calendar year the financial year starts in
     * @param label  the financial year ("2027", or "2026/27" when it does not start in January)
     * @param months the months this period covers, e.g. "Jan 2027 – Dec 2027"
     */
    public record Year(int year, String label, String months, LocalDate startsOn, LocalDate endsOn, boolean partial,
                       SpendSimulation.Summary total, Map<String, SpendSimulation.Summary> families,
                       Map<String, SpendSimulation.Summary> parts, Map<String, SpendSimulation.Summary> depots,
                       Stability stability) {
        public Year {
            // Runs stored before financial years were labelled carry only the year.
            label = label == null ? Integer.toString(year) : label;
            months = months == null ? "" : months;
        }
    }

    public record Stability(int halfDraws, double p10Half, double p90Half, double p10All, double p90All) {
    }
}
