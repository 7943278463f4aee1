package org.depotcast.spend;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.path.json.config.JsonPathConfig;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.depotcast.access.SystemWork;
import org.depotcast.forecasting.ForecastRun;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.forecasting.PartForecast;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.depotcast.TestThreads.pause;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A spend run reads one forecast run, the newest finished one when it starts: its fleet models and the demand behind
 * the year-1 stock top-up both come from it, so a run finishing while the spend run goes mixes nothing in. Run A is
 * pinned while a newer finished run B with far more programme demand exists (as if B finished between the spend run's
 * two reads): the results are those of A alone and the notes name A for both. A run started after B pins B instead,
 * and its top-up grows, so the comparison could fail.
 */
@QuarkusTest
class SpendReadsOneForecastRunTest {
    @Inject
    ForecastRunService forecasts;
    @Inject
    SpendService spend;
    @Inject
    SystemWork system;
    @Inject
    EntityManager em;

    @Test
    void aForecastRunFinishingAfterTheSpendRunStartedChangesNeitherRead() {
        LocalDate month = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1);
        ForecastRun a = forecasts.latestFinished().filter(r -> month.equals(r.origin))
                .orElseGet(() -> forecasts.runNow("test", month));
        long scenario = as("lead").contentType("application/json").body(Map.of("name", TestData.unique("pinned"),
                        "horizonYears", 1, "draws", 1000, "seed", 7)).post("/api/spend/scenarios").then().statusCode(201)
                .extract().jsonPath().getLong("id");
        JsonPath alone = results(pinned(scenario, a.id));
        long b = newerRunWithMoreDemand(a);
        try {
            JsonPath pinnedToA = results(pinned(scenario, a.id));
            assertEquals(alone.getDouble("years[0].total.mean"), pinnedToA.getDouble("years[0].total.mean"));
            assertEquals(alone.getMap("years[0].depots"), pinnedToA.getMap("years[0].depots"));
            String notes = String.join(" ", pinnedToA.getList("notes", String.class));
            assertTrue(notes.contains("fleet models and depot ratios of forecast run " + a.id + " as of"), notes);
            assertTrue(notes.contains("from the demand of forecast run " + a.id + ")"), notes);

            long latest = as("lead").post("/api/spend/scenarios/" + scenario + "/runs").then().statusCode(202)
                    .extract().jsonPath().getLong("id");
            JsonPath pinnedToB = results(latest);
            assertTrue(pinnedToB.getDouble("years[0].total.mean") > alone.getDouble("years[0].total.mean") + 1,
                    "run B's demand raises the top-up");
            String laterNotes = String.join(" ", pinnedToB.getList("notes", String.class));
            assertTrue(laterNotes.contains("from the demand of forecast run " + b + ")"), laterNotes);
        } finally {
            QuarkusTransaction.requiringNew().run(() -> {
                em.createNativeQuery("delete from part_forecast where run_id = ?1").setParameter(1, b).executeUpdate();
                em.createNativeQuery("delete from forecast_run where id = ?1").setParameter(1, b).executeUpdate();
            });
        }
    }

    /** Started as the system (a lead's rights), reading forecast run {@code forecastRunId}. */
    private long pinned(long scenario, long forecastRunId) {
        return system.call("test", () -> spend.start(scenario, null, forecastRunId)).id;
    }

    /**
     * A finished run as of the same month, newer than {@code a}, whose programme forecast is 50 units a month of every
     * part A forecasts there (it keeps no fleet models: only the top-up would read it).
     */
    private long newerRunWithMoreDemand(ForecastRun a) {
        return QuarkusTransaction.requiringNew().call(() -> {
            ForecastRun b = new ForecastRun();
            b.triggerKind = "test";
            b.status = ForecastRun.Status.DONE;
            b.startedAt = OffsetDateTime.now(ZoneOffset.UTC);
            b.finishedAt = b.startedAt;
            b.origin = a.origin;
            b.horizonMonths = a.horizonMonths;
            em.persist(b);
            em.flush();
            List<PartForecast> programme = em.createQuery("from PartForecast f where f.runId = ?1 and "
                    + "f.locationCode = 'PROGRAMME'", PartForecast.class).setParameter(1, a.id).getResultList();
            assertTrue(programme.size() > 0, "run " + a.id + " has programme forecasts");
            for (PartForecast f : programme) {
                PartForecast more = new PartForecast();
                more.runId = b.id;
                more.partId = f.partId;
                more.locationCode = f.locationCode;
                more.method = f.method;
                more.demandClass = f.demandClass;
                more.breakdownPerMonth = 50;
                more.variancePerMonth = 50;
                more.monthlyForecast = new double[f.monthlyForecast.length];
                java.util.Arrays.fill(more.monthlyForecast, 50);
                more.preventiveMonthly = f.preventiveMonthly;
                more.monthlyHistory = f.monthlyHistory;
                em.persist(more);
            }
            return b.id;
        });
    }

    private static JsonPath results(long run) {
        for (int i = 0; i < 1200 && "RUNNING".equals(as("lead").get("/api/spend/runs/" + run).jsonPath()
                .getString("status")); i++) {
            pause(100);
        }
        as("lead").get("/api/spend/runs/" + run).then().statusCode(200)
                .body("status", org.hamcrest.Matchers.equalTo("DONE"));
        String json = as("lead").get("/api/spend/runs/" + run + "/results").then().statusCode(200).extract().asString();
        return new JsonPath(json).using(JsonPathConfig.jsonPathConfig()
                .numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE));
    }
}
