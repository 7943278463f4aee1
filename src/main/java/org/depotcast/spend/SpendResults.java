package org.depotcast.spend;

import org.depotcast.core.spend.SpendSimulation;

import java.util.List;
import java.util.Map;

/**
 * What a run found, per projection year: total, per component family, per part and per depot, each as a mean with
 * 80 % (p10–p90) and 95 % (p2.5–p97.5) intervals. {@code stability} compares the total's interval from the first
 * half of the draws with all of them, to show the draw count is enough.
 */
public record SpendResults(String scenario, String currency, int draws, long seed, int firstYear, List<Year> years,
                           List<String> notes) {
    public record Year(int year, SpendSimulation.Summary total, Map<String, SpendSimulation.Summary> families,
                       Map<String, SpendSimulation.Summary> parts, Map<String, SpendSimulation.Summary> depots,
                       Stability stability) {
    }

    public record Stability(int halfDraws, double p10Half, double p90Half, double p10All, double p90All) {
    }
}
