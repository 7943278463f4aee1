package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The programme lead's day through the pages: run the forecasts and follow the progress bar, read a part's chart,
 * make a budget plan and accept it, run a spend scenario and read its chart. State is checked through the API.
 */
@QuarkusTest
class LeadJourneyBrowserTest extends BrowserSession {

    private String text(By by) {
        return waitFor(by).getText();
    }

    private void runTheForecasts() {
        driver.findElement(By.id("start-run")).click();
        String finished = wait(Duration.ofSeconds(180)).until(d -> {
            String words = d.findElement(By.id("run-progress")).getText();
            return words.contains("finished.") ? words : null;
        });
        JsonPath latest = as("lead").get("/api/forecast/runs?status=DONE&limit=1").then().statusCode(200).extract().jsonPath();
        int runId = latest.getInt("[0].id");
        assertTrue(finished.contains("Forecast run " + runId), finished);
        assertEquals("request", latest.getString("[0].trigger"));
        wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("provenance")).getText()
                .contains("forecast run " + runId + ", which finished"));
        assertEquals("finished", driver.findElement(By.cssSelector("#runs tbody tr:first-child td[data-label=State]")).getText());
    }

    private void readAPartsChart() {
        new Select(driver.findElement(By.id("part"))).selectByValue("OB-CS-50");
        new Select(driver.findElement(By.id("location"))).selectByValue("DEP-PELLOWDENE");
        driver.findElement(By.cssSelector("#explore-form button[type=submit]")).click();
        wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.cssSelector("#explorer h3")).getText().contains("at DEP-PELLOWDENE"));
        JsonPath api = as("lead").queryParam("location", "DEP-PELLOWDENE").get("/api/forecast/explorer/parts/OB-CS-50")
                .then().statusCode(200).extract().jsonPath();
        WebElement figure = driver.findElement(By.cssSelector("#explorer figure.chart"));
        assertTrue(figure.findElement(By.tagName("svg")).getText().contains("Units a month"), "the y axis says its unit");
        List<WebElement> rows = figure.findElements(By.cssSelector("tbody tr"));
        assertEquals(36 + 24, rows.size(), "three years of history and 24 forecast months");
        List<Map<String, Object>> ranges = api.getList("ranges");
        WebElement firstForecast = rows.get(36);
        assertEquals(text(firstForecast, "95 % range: high"), String.valueOf(Math.round(((Number) ranges.get(0).get("high95")).doubleValue())));
        double mean = ((Number) ranges.get(0).get("mean")).doubleValue();
        assertEquals(String.format(java.util.Locale.US, "%.1f", mean).replaceAll("\\.0$", ""), text(firstForecast, "Forecast, expected"));
        String method = api.getString("forecast.method");
        String chosenBox = driver.findElement(By.cssSelector("#explorer .method-box")).getText();
        assertTrue(chosenBox.contains("How the method was chosen") && chosenBox.contains("RMSSE"), chosenBox);
        if (!"FLEET".equals(method)) {
            assertTrue(driver.findElements(By.xpath("//div[@class='method-box']//td[@data-label='In use'][normalize-space()='used']")).size() == 1);
        }
        assertTrue(driver.getCurrentUrl().contains("part=OB-CS-50") && driver.getCurrentUrl().contains("location=DEP-PELLOWDENE"));
    }

    private static String text(WebElement row, String column) {
        return row.findElement(By.cssSelector("td[data-label='" + column + "']")).getText();
    }

    /** Full-page pictures at the desk and phone widths, to look at (target/browser-screens/). */
    private void screens(String name) {
        try {
            screenshot(name + "-1280");
            phone();
            screenshot(name + "-360");
            desk();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void theLeadRunsTheForecastsReadsAChartPlansABudgetAndProjectsSpend() {
        signIn("lead", "lead-demo");
        assertTrue(driver.getCurrentUrl().endsWith("/app/lead/"), driver.getCurrentUrl());
        waitReady();
        runTheForecasts();
        readAPartsChart();
        screens("lead-forecasts");
        assertNoPageErrors();
    }
}
