package org.depotcast.spend;

import org.depotcast.core.spend.SpendDraws;
import org.depotcast.core.spend.SpendSimulation;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
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

    /** Summaries of the draws per period, with the notes a reader needs to take the figures right. */
    static SpendResults summarise(String name, String currency, ScenarioDefinition definition,
                                  FinancialYears financialYears, List<FinancialYears.Period> periods,
                                  SpendLineBuilder builder, SpendDraws draws, long forecastRunId) {
        List<SpendResults.Year> years = new ArrayList<>();
        for (int y = 0; y < draws.years(); y++) {
            Map<String, SpendSimulation.Summary> families = new LinkedHashMap<>();
            for (int g = 0; g < draws.groups(); g++) {
                SpendSimulation.Summary s = SpendSimulation.Summary.of(draws.group(y, g));
                if (s.mean() > 0) {
                    families.put(builder.familyNames.get(g), s);
                }
            }
            Map<String, SpendSimulation.Summary> partSummaries = new LinkedHashMap<>();
            for (int p = 0; p < draws.parts(); p++) {
                partSummaries.put(builder.partNumbers.get(p), SpendSimulation.Summary.of(draws.part(y, p)));
            }
            Map<String, SpendSimulation.Summary> depots = new LinkedHashMap<>();
            for (int d = 0; d < draws.depots(); d++) {
                depots.put(builder.depotCodes.get(d), SpendSimulation.Summary.of(draws.depot(y, d)));
            }
            double[] total = draws.total(y);
            double[] half = java.util.Arrays.copyOf(total, total.length / 2);
            SpendSimulation.Summary all = SpendSimulation.Summary.of(total);
            SpendSimulation.Summary first = SpendSimulation.Summary.of(half);
            FinancialYears.Period period = periods.get(y);
            years.add(new SpendResults.Year(financialYears.startOfYearContaining(period.startsOn()).getYear(),
                    period.label(), period.months(), period.startsOn(), period.endsOn(), period.partial(), all, families,
                    partSummaries, depots, new SpendResults.Stability(half.length, first.p10(), first.p90(), all.p10(), all.p90())));
        }
        List<String> notes = new ArrayList<>();
        notes.add("Years are the programme's financial years, starting in "
                + java.time.Month.of(financialYears.startMonth()).getDisplayName(java.time.format.TextStyle.FULL, java.util.Locale.ENGLISH)
                + (periods.get(0).partial() ? "; the first period is the months left in the year in progress (" + periods.get(0).months()
                + "), then " + definition.horizonYears() + " whole years." : "."));
        notes.add("The first period includes the stock needed now to bring the programme to its policy levels (from "
                + "the demand of forecast run " + forecastRunId + "), bought once by the central store (its only spend); after that each year's parts are counted at the depot whose "
                + "pumps use them, so the central store shows no spend in later years.");
        notes.add("Demand as of " + periods.get(0).startsOn() + ": the pumps and usage history (measured hours where "
                + "pumps have sensors) as of that day, with " + builder.ratesBasis() + ".");
        notes.add("Intervals include the sampling uncertainty of each family's fitted rate (lognormal, σ = the standard "
                + "error of the family's projected log demand by the delta method) and overdispersion where the fit found it.");
        return new SpendResults(name, currency, definition.drawsOrDefault(), definition.seedOrDefault(),
                financialYears.startMonth(), years, notes);
    }
}
