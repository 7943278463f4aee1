package org.depotcast.spend;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.path.json.config.JsonPathConfig;
import jakarta.inject.Inject;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.forecasting.FleetOutlook;
import org.depotcast.forecasting.FleetOutlooks;
import org.depotcast.forecasting.FleetSnapshot;
import org.depotcast.forecasting.ForecastRun;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Spend and the stored forecast read one fleet rate model: on the demo, the first twelve months of a baseline
 * projection as of this month, per depot and part (breakdowns and scheduled services), equal the stored forecast's
 * 12-month demand of a run as of the same month. The policy top-up is a separate line at the central store and is
 * left out here. Only series the forecast takes from the fleet model are compared; a part forecast from its own
 * history has no fleet rate for spend to project years ahead. Depot ratios enter both through the one
 * FleetRateModel, whose own test checks them.
 */
@QuarkusTest
class SpendMatchesForecastTest {
    /** Stored months keep six decimals: twelve of them round by at most 6e-6 together. */
    private static final double ROUNDING = 1e-5;

    @Inject
    ForecastRunService forecasts;
    @Inject
    SpendLineService lines;
    @Inject
    FleetOutlooks outlooks;
    @Inject
    jakarta.persistence.EntityManager em;

    @Test
    void firstYearOfSpendEqualsTheStoredForecastPerDepotAndPart() {
        LocalDate origin = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1);
        ForecastRun run = forecasts.runNow("test", origin);
        // A financial year starting in the origin's month makes the projection's first period its twelve months.
        List<FinancialYears.Period> year = new FinancialYears(origin.getMonthValue()).projection(origin, 1);
        assertEquals(12, year.get(0).monthCount());
        ScenarioDefinition baseline = new ScenarioDefinition("baseline", 1, null, null, null, null, null, null, null,
                null, null);
        SpendLineBuilder spend = QuarkusTransaction.requiringNew().call(() ->
                lines.build(baseline, year, lines.partsById()));
        FleetOutlook outlook = outlooks.asOf(origin, 12);
        Map<String, Long> partIds = new HashMap<>();
        outlook.snapshot().partNumbers().forEach((id, number) -> partIds.put(number, id));

        int compared = 0;
        Map<Long, List<Double>> perDepot = new HashMap<>();
        List<String> historySeries = new ArrayList<>();
        for (String depot : spend.locations()) {
            JsonPath stored = new JsonPath(as("lead").get("/api/forecast/locations/" + depot).then().statusCode(200)
                    .extract().asString()).using(JsonPathConfig.jsonPathConfig()
                    .numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE));
            Map<Long, Integer> index = new HashMap<>();
            for (int i = 0; i < stored.getList("$").size(); i++) {
                assertEquals(run.id.longValue(), stored.getLong("[" + i + "].runId"));
                index.put(partIds.get(stored.getString("[" + i + "].partNumber")), i);
            }
            for (Map.Entry<Long, Integer> series : index.entrySet()) {
                long partId = series.getKey();
                String at = "[" + series.getValue() + "].";
                if (!"FLEET".equals(stored.getString(at + "method"))) {
                    historySeries.add(depot + " " + stored.getString(at + "partNumber"));
                    continue;
                }
                double storedYear = stored.getDouble(at + "year.mean");
                double storedBreakdowns = 0;
                for (int m = 0; m < 12; m++) {
                    storedBreakdowns += stored.getDouble(at + "forecast[" + m + "].breakdown");
                }
                String what = depot + " part " + stored.getString(at + "partNumber");
                assertEquals(storedYear, spend.expectedUnits(0, partId, depot), ROUNDING + 1e-9 * storedYear, what);
                assertEquals(storedBreakdowns, spend.breakdownUnits(0, partId, depot), ROUNDING + 1e-9 * storedYear, what);
                perDepot.computeIfAbsent(partId, k -> new ArrayList<>()).add(storedBreakdowns);
                compared++;
            }
        }
        assertTrue(compared >= 30, "depot × part series compared: " + compared);
        assertTrue(historySeries.size() < compared / 10, "series forecast from their own history: " + historySeries);
        // Depots differ (depth, load, age and pump count): a spend that spread the programme evenly, or mixed the
        // depots up, would fail the comparison. Applying depot ratios themselves is FleetRateModelTest's; the demo
        // plants no depot effect, so its fitted models keep none (RateShrinkage.groupsDiffer).
        double spread = perDepot.values().stream().filter(v -> v.size() > 1)
                .mapToDouble(v -> v.stream().mapToDouble(Double::doubleValue).max().orElseThrow()
                        - v.stream().mapToDouble(Double::doubleValue).min().orElseThrow()).max().orElse(0);
        assertTrue(spread > 100 * ROUNDING, "depots of one part differ by " + spread + " units");
        assertTrue(fittedFamilies(outlook) > 0, "at least one family has a fitted model");
    }

    /**
     * Spend reads a finished run's stored models and depot credibility ratios instead of fitting them again: read back,
     * they give every pump the same expected breakdown units, month by month, as a fit made afresh on the same data.
     * The demo's depot series keep ratio 1 (Dean's test finds no spread beyond chance), so one stored ratio is then
     * changed to show the read path applies what the run stored to that depot's pumps and no others.
     */
    @Test
    void theStoredRunsRatesGiveEveryPumpTheUnitsAFreshFitGives() {
        LocalDate origin = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1);
        ForecastRun run = forecasts.runNow("test", origin);
        FleetOutlook fresh = outlooks.fittedAsOf(origin, 24);
        FleetOutlook stored = outlooks.asOf(origin, 24);
        assertTrue(stored.basis().contains("forecast run " + run.id), stored.basis());
        assertTrue(fresh.basis().startsWith("fitted"), fresh.basis());
        var pumps = fresh.snapshot().pumps().stream().filter(p -> p.bom().stream()
                .anyMatch(b -> fresh.model(b.family()) != null)).toList();
        int compared = 0;
        for (var pump : pumps) {
            for (var part : pump.bom()) {
                if (fresh.model(part.family()) != null) {
                    assertSameUnits(fresh, stored, pump, part, 1.0);
                    compared++;
                }
            }
        }
        assertTrue(compared > 1000, "pump × part rates compared: " + compared);

        var pump = pumps.get(0);
        var part = pump.bom().stream().filter(b -> fresh.model(b.family()) != null).findFirst().orElseThrow();
        String depot = fresh.snapshot().locationCodes().get(pump.depotId());
        int changed = QuarkusTransaction.requiringNew().call(() -> em.createNativeQuery("update part_forecast set "
                        + "credibility_ratio = 1.25 where run_id = ?1 and part_id = ?2 and location_code = ?3")
                .setParameter(1, run.id).setParameter(2, part.partId()).setParameter(3, depot)
                .executeUpdate());
        assertEquals(1, changed);
        FleetOutlook changedRun = outlooks.asOf(origin, 24);
        assertEquals(1.25, changedRun.credibilityRatio(part.partId(), pump.depotId()), 1e-12);
        assertSameUnits(fresh, changedRun, pump, part, 1.25);
        var elsewhere = pumps.stream().filter(p -> p.depotId() != pump.depotId()
                && p.bom().stream().anyMatch(b -> b.partId() == part.partId())).findFirst().orElseThrow();
        assertSameUnits(fresh, changedRun, elsewhere, part, 1.0);
    }

    private static void assertSameUnits(FleetOutlook fresh, FleetOutlook stored, FleetSnapshot.PumpRecord pump,
                                        FleetSnapshot.BomPart part, double ratio) {
        // As spend counts them: the pump's units times its depot series' credibility ratio.
        double[] expected = fresh.breakdownUnits(pump, part, fresh.months(pump, 1.0, 1.0));
        double[] read = stored.breakdownUnits(pump, part, stored.months(pump, 1.0, 1.0));
        double freshRatio = fresh.credibilityRatio(part.partId(), pump.depotId());
        double readRatio = stored.credibilityRatio(part.partId(), pump.depotId());
        for (int m = 0; m < expected.length; m++) {
            assertEquals(expected[m] * freshRatio * ratio, read[m] * readRatio, 1e-12 * Math.max(1, expected[m]), "pump " + pump.id() + " part "
                    + part.partId() + " month " + m);
        }
    }

    private static long fittedFamilies(FleetOutlook outlook) {
        long fitted = 0;
        for (ComponentFamily family : ComponentFamily.values()) {
            FleetRateModel model = outlook.model(family);
            if (model != null && model.fitted()) {
                fitted++;
            }
        }
        return fitted;
    }
}
