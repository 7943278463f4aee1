package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.time.Duration;
import java.util.List;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Runs as of a past date (made for accuracy checks) are never what planning reads: after five of them in a row the
 * forecast page still shows the planning run's forecast, not "no forecast yet".
 */
@QuarkusTest
class LeadForecastsAfterChecksBrowserTest extends BrowserSession {
    private static RequestSpecification lead() {
        return given().auth().preemptive().basic("lead", "lead-demo").accept("application/json");
    }

    private void runAsOf(String origin) throws InterruptedException {
        for (int tries = 0; tries < 240; tries++) {
            var started = lead().post(url("/api/forecast/runs?origin=" + origin));
            if (started.statusCode() == 202) {
                long id = started.jsonPath().getLong("id");
                while ("RUNNING".equals(lead().get(url("/api/forecast/runs/" + id)).jsonPath().getString("status"))) {
                    Thread.sleep(500);
                }
                assertEquals("DONE", lead().get(url("/api/forecast/runs/" + id)).jsonPath().getString("status"));
                return;
            }
            assertEquals(409, started.statusCode(), "only another run under way may hold it up");
            Thread.sleep(500);
        }
        throw new AssertionError("no run as of " + origin + " could start in two minutes");
    }

    @Test
    void thePlanningRunsForecastShowsAfterFiveChecksInARow() throws InterruptedException {
        OfficerJourneyBrowserTest.forecastRunThroughTheApi(url(""));
        for (int month = 1; month <= 5; month++) {
            runAsOf("2025-0" + month + "-01");
        }
        assertTrue(lead().get(url("/api/forecast/runs?limit=5")).jsonPath().getList("trigger").stream().allMatch("as-of"::equals),
                "the five newest runs are all checks");
        signIn("lead", "lead-demo");
        open("/app/lead/?part=OB-CS-50");
        waitReady();
        String heading = wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.cssSelector("#explorer h3"))).getText();
        assertTrue(heading.startsWith("OB-CS-50"), heading);
        // The fleet model's families as the trade writes them ("O-ring", "Cup seal"), never "o ring".
        String coefficients = wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.cssSelector("#fleet > .table-wrap caption"))).getText();
        List<String> families = driver.findElements(By.cssSelector("#family option")).stream().map(o -> o.getText()).toList();
        assertTrue(families.stream().anyMatch(f -> f.startsWith("O-ring")) && families.stream().anyMatch(f -> f.startsWith("Cup seal")),
                families.toString());
        assertTrue(families.stream().noneMatch(f -> f.contains("_") || f.matches("[a-z].*")), families.toString());
        String chosen = driver.findElement(By.cssSelector("#family option:checked")).getText().replace(" (prior)", "");
        assertTrue(coefficients.startsWith("Coefficients of the " + chosen + " model"), coefficients);
        assertNoPageErrors();
    }
}
