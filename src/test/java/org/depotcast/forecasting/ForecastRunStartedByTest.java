package org.depotcast.forecasting;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A forecast run records who started it: the signed-in account, or the nightly schedule. */
@QuarkusTest
class ForecastRunStartedByTest {
    @Inject
    ForecastRunService runs;

    @Test
    void aRunStartedByAPersonNamesTheirAccount() throws InterruptedException {
        awaitNoRunGoing();
        long id = TestData.as("officer").post("/api/forecast/runs").then().statusCode(202).extract().jsonPath().getLong("id");
        JsonPath run = awaitEnd(id);
        assertEquals("request", run.getString("trigger"));
        assertEquals("officer", run.getString("startedBy"), run.prettify());
        TestData.as("lead").get("/api/forecast/runs?limit=5").then().statusCode(200)
                .body("find { it.id == " + id + " }.startedBy", equalTo("officer"));
    }

    @Test
    void theNightlyRunIsStartedByTheSchedule() throws InterruptedException {
        awaitNoRunGoing();
        runs.nightly();
        List<Map<String, Object>> scheduled = TestData.as("lead").get("/api/forecast/runs?limit=20").jsonPath()
                .getList("findAll { it.trigger == 'schedule' }");
        assertEquals(1, scheduled.size(), scheduled::toString);
        assertEquals("system:forecast-schedule", scheduled.get(0).get("startedBy"));
        awaitEnd(((Number) scheduled.get(0).get("id")).longValue());
    }

    private static JsonPath awaitEnd(long id) throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(120).toNanos();
        JsonPath run = TestData.as("lead").get("/api/forecast/runs/" + id).jsonPath();
        while ("RUNNING".equals(run.getString("status"))) {
            assertTrue(System.nanoTime() < deadline, "the run never ended");
            Thread.sleep(200);
            run = TestData.as("lead").get("/api/forecast/runs/" + id).jsonPath();
        }
        return run;
    }

    private static void awaitNoRunGoing() throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(120).toNanos();
        while (!TestData.as("lead").get("/api/jobs?kind=forecast_run&state=running&limit=1").jsonPath().getList("$").isEmpty()) {
            assertTrue(System.nanoTime() < deadline, "a forecast run of another test kept running");
            Thread.sleep(200);
        }
    }
}
