package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.path.json.config.JsonPathConfig;
import jakarta.inject.Inject;
import org.apache.commons.math3.distribution.PoissonDistribution;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.FleetRateModel;
import org.depotcast.forecasting.FleetRates;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.stock.LocationService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A demo pump probably down: the breakdowns per family its report expects are the probability shared out by the
 * forecast run's family rates for that pump, worked here from the stored coefficients as the API gives them; the
 * units to have ready are the Poisson quantile of each part's expected units at its class's service level in force.
 */
@QuarkusTest
class ProbablyDownMatchesForecastTest {
    /** Numbers as doubles: JsonPath reads them as floats by default, which loses the digits compared here. */
    private static final JsonPathConfig DOUBLES = new JsonPathConfig(JsonPathConfig.NumberReturnType.DOUBLE);

    @Inject
    ForecastRunService runs;
    @Inject
    ForecastQueryService forecasts;
    @Inject
    SystemWork system;
    @Inject
    LocationService locations;

    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
    }

    @Test
    void expectedBreakdownsPerFamilyFollowTheRunsRatesForThePump() {
        JsonPath report = as("lead").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down").then()
                .statusCode(200).extract().jsonPath().using(DOUBLES);
        Map<String, Object> flagged = report.getMap("pumps.find { it.assetId.startsWith('OB-') }");
        assertFalse(flagged == null || flagged.isEmpty(), "the demo has a pump probably down at DEP-TESHVALE");
        String asset = (String) flagged.get("assetId");
        JsonPath pump = as("lead").get("/api/pumps/" + asset).then().statusCode(200).extract().jsonPath();
        double depthM = pump.getDouble("depthM");
        double ageYears = ChronoUnit.DAYS.between(LocalDate.parse(pump.getString("installedOn")),
                LocalDate.parse((String) flagged.get("stoppedFrom"))) / 365.25;
        double hoursPerDay = ((Number) flagged.get("baselineHoursPerDay")).doubleValue();
        double probability = ((Number) flagged.get("probabilityDown")).doubleValue();
        FleetRates typed = system.call("test", forecasts::fleetRates).orElseThrow();
        assertEquals(report.getLong("forecastRunId"), typed.runId());
        long depotId = locations.require("depot", "DEP-TESHVALE").id;

        Map<String, Double> byHand = new HashMap<>();
        double total = 0;
        for (ComponentFamily family : typed.models().keySet()) {
            JsonPath stored = as("lead").get("/api/forecast/fleet-models/" + family).then().statusCode(200)
                    .extract().jsonPath().using(DOUBLES);
            Map<String, Double> coefficients = stored.getMap("coefficients");
            double eta = 0;
            for (Map.Entry<String, Double> term : coefficients.entrySet()) {
                double x = switch (term.getKey()) {
                    case "intercept" -> 1;
                    case "log_depth" -> Math.log(depthM / 30);
                    case "age_years" -> ageYears;
                    case "usage_hours" -> hoursPerDay;
                    default -> throw new AssertionError("unknown term " + term.getKey());
                };
                eta += term.getValue() * x;
            }
            FleetRateModel model = typed.models().get(family);
            double rate = Math.exp(eta) * model.depotRatio(depotId);
            assertEquals(model.ratePerHour(depthM, ageYears, hoursPerDay) * model.depotRatio(depotId), rate, rate * 1e-9,
                    family + ": the core model's rate for the pump is the stored coefficients'");
            byHand.put(family.name(), rate);
            total += rate;
        }
        Map<String, Double> expected = report.getMap("pumps.find { it.assetId == '" + asset + "' }.expectedRepairsByFamily");
        assertEquals(byHand.keySet(), expected.keySet());
        double sum = 0;
        for (String family : List.copyOf(expected.keySet())) {
            double repairs = expected.get(family);
            assertEquals(probability * byHand.get(family) / total, repairs, 1e-9, family);
            sum += repairs;
        }
        assertEquals(probability, sum, 1e-9, "one breakdown, shared out among the families");
    }

    @Test
    void unitsToHaveReadyCoverEachPartsNeedAtItsClassServiceLevel() {
        JsonPath levels = as("lead").get("/api/planning/service-levels").then().statusCode(200).extract().jsonPath()
                .using(DOUBLES);
        JsonPath report = as("lead").queryParam("depot", "DEP-TESHVALE").get("/api/sensors/probably-down").then()
                .statusCode(200).extract().jsonPath().using(DOUBLES);
        List<Map<String, Object>> parts = report.getList("parts");
        assertFalse(parts.isEmpty(), "the demo's pump probably down at DEP-TESHVALE is expected to need parts");
        for (Map<String, Object> part : parts) {
            String number = (String) part.get("partNumber");
            boolean critical = as("lead").get("/api/parts/" + number).then().statusCode(200).extract().jsonPath()
                    .getBoolean("critical");
            double cover = ((Number) part.get("coverLevel")).doubleValue();
            assertEquals(levels.getDouble(critical ? "critical" : "standard"), cover, 1e-12, number);
            double expected = ((Number) part.get("expectedUnits")).doubleValue();
            int k = ((Number) part.get("haveReady")).intValue();
            if (expected == 0) {
                assertEquals(0, k, number + ": nothing expected, nothing to have ready");
                continue;
            }
            PoissonDistribution need = new PoissonDistribution(expected);
            assertTrue(need.cumulativeProbability(k) >= cover, number + ": " + k + " cover " + expected);
            assertTrue(k == 0 || need.cumulativeProbability(k - 1) < cover, number + ": " + k + " is the fewest");
            double held = ((Number) part.get("onHandDepot")).doubleValue() + ((Number) part.get("onHandKits")).doubleValue();
            assertEquals(held >= k, part.get("enoughInStock"), number + ": enough in stock is against the units to have ready");
        }
    }
}
