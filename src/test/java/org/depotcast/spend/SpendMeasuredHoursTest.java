package org.depotcast.spend;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.core.forecast.PumpMonths;
import org.depotcast.fleet.PumpService;
import org.depotcast.forecasting.FleetOutlook;
import org.depotcast.forecasting.FleetOutlooks;
import org.depotcast.forecasting.FleetSnapshot;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Spend reads the one usage history: a pump whose sensor measured 10 h a day last month, against the 4 h a day typed
 * in for it, is projected at 10 h, and its depot's breakdown demand rises by what the rate model gives for the
 * difference.
 */
@QuarkusTest
class SpendMeasuredHoursTest {
    private static final String DEPOT = "DEP-TESHVALE";

    @Inject
    SpendLineService lines;
    @Inject
    FleetOutlooks outlooks;
    @Inject
    PumpService pumps;

    @Test
    void measuredHoursTakeThePlaceOfTheTypedEstimateInSpend() {
        LocalDate origin = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1);
        String asset = TestData.unique("SPENDHRS");
        as("admin").contentType("application/json").body(Map.of("assetId", asset, "modelCode", "RB-2", "depthM", 30,
                "installedOn", "2024-05-01", "depotCode", DEPOT)).post("/api/pumps").then().statusCode(201);
        as("officer").contentType("application/json").body(Map.of("readOn", origin.minusMonths(3).toString(),
                "hoursPerDay", 4, "source", "SURVEYED")).post("/api/pumps/" + asset + "/usage").then().statusCode(201);
        List<FinancialYears.Period> year = new FinancialYears(origin.getMonthValue()).projection(origin, 1);
        SpendLineBuilder typed = build(year);

        StringBuilder file = new StringBuilder("asset_id,day,hours\n");
        for (int d = 1; d <= 20; d++) {
            file.append(asset).append(',').append(origin.minusMonths(1).withDayOfMonth(d)).append(",10\n");
        }
        as("officer").contentType("text/csv").body(file.toString()).post("/api/sensors/readings").then().statusCode(200);
        SpendLineBuilder measured = build(year);

        long pumpId = QuarkusTransaction.requiringNew().call(() -> pumps.find(asset).orElseThrow().id);
        FleetOutlook outlook = outlooks.asOf(origin, 12);
        FleetSnapshot.PumpRecord pump = outlook.snapshot().pumps().stream().filter(p -> p.id() == pumpId)
                .findFirst().orElseThrow();
        PumpMonths ahead = outlook.months(pump, 1, 1);
        assertEquals(10, ahead.hoursPerDay(), 1e-9, "the measured load, not the typed 4 h");
        double[] typedHours = new double[ahead.months()];
        for (int m = 0; m < typedHours.length; m++) {
            typedHours[m] = ahead.hours()[m] * 4 / 10;
        }
        PumpMonths atTyped = new PumpMonths(4, typedHours, ahead.ageYears());

        Map<Long, Double> expectedRise = new HashMap<>();
        for (FleetSnapshot.BomPart part : pump.bom()) {
            FleetRateModel model = outlook.model(part.family());
            if (model != null) {
                double rise = sum(model.expectedUnits(pump.depotId(), pump.depthM(), ahead))
                        - sum(model.expectedUnits(pump.depotId(), pump.depthM(), atTyped));
                expectedRise.merge(part.partId(), rise * outlook.credibilityRatio(part.partId(), pump.depotId()), Double::sum);
            }
        }
        double total = 0;
        for (Map.Entry<Long, Double> part : expectedRise.entrySet()) {
            double observed = measured.breakdownUnits(0, part.getKey(), DEPOT) - typed.breakdownUnits(0, part.getKey(), DEPOT);
            // The refit on one more measured month moves the fleet's rates a little: 5 % of the rise is allowed.
            assertEquals(part.getValue(), observed, 0.05 * Math.abs(part.getValue()) + 1e-6, "part " + part.getKey());
            total += observed;
        }
        assertTrue(total > 0.1, "10 h a day instead of 4 adds breakdown demand at the depot: " + total);
    }

    private SpendLineBuilder build(List<FinancialYears.Period> year) {
        ScenarioDefinition baseline = new ScenarioDefinition("baseline", 1, null, null, null, null, null, null, null,
                null, null);
        return QuarkusTransaction.requiringNew().call(() -> lines.build(baseline, year, lines.partsById()));
    }

    private static double sum(double[] values) {
        double total = 0;
        for (double v : values) {
            total += v;
        }
        return total;
    }
}
