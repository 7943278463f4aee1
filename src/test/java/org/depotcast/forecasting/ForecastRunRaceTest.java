package org.depotcast.forecasting;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.TimeUnit;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Two leads starting a forecast run at the same moment: one run starts (202), the other is told one is going (409). */
@QuarkusTest
class ForecastRunRaceTest {
    @Test
    void twoStartsAtOnceMakeOneRun() throws Exception {
        awaitNoRunGoing();
        CyclicBarrier together = new CyclicBarrier(2);
        List<CompletableFuture<Response>> starts = List.of(start(together), start(together));
        List<Response> answers = List.of(starts.get(0).get(60, TimeUnit.SECONDS), starts.get(1).get(60, TimeUnit.SECONDS));
        List<Integer> codes = answers.stream().map(Response::statusCode).sorted().toList();
        assertEquals(List.of(202, 409), codes, answers.get(0).asString() + " / " + answers.get(1).asString());
        Response refused = answers.stream().filter(a -> a.statusCode() == 409).findFirst().orElseThrow();
        assertEquals("application/problem+json", refused.contentType());
        assertTrue(refused.jsonPath().getString("detail").contains("forecast run"), refused.asString());
        Response accepted = answers.stream().filter(a -> a.statusCode() == 202).findFirst().orElseThrow();
        long jobId = accepted.jsonPath().getLong("jobId");
        awaitJobEnd(jobId);
        as("lead").get("/api/jobs/" + jobId).then().statusCode(200).body("state", equalTo("DONE"));
    }

    private static CompletableFuture<Response> start(CyclicBarrier together) {
        return CompletableFuture.supplyAsync(() -> {
            try {
                together.await(30, TimeUnit.SECONDS);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
            return as("lead").post("/api/forecast/runs");
        });
    }

    private static void awaitNoRunGoing() throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(120).toNanos();
        while (!as("lead").get("/api/jobs?kind=forecast_run&state=running&limit=1").jsonPath().getList("$").isEmpty()) {
            assertTrue(System.nanoTime() < deadline, "a forecast run of another test kept running");
            Thread.sleep(200);
        }
    }

    private static void awaitJobEnd(long jobId) throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(120).toNanos();
        while ("RUNNING".equals(as("lead").get("/api/jobs/" + jobId).jsonPath().getString("state"))) {
            assertTrue(System.nanoTime() < deadline, "the started run never ended");
            Thread.sleep(200);
        }
    }
}
