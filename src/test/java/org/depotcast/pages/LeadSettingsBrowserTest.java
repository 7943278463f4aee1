package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.StaleElementReferenceException;
import org.openqa.selenium.WebElement;

import java.time.Duration;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The programme lead changes a part class's service level and a lane's transport cost on the settings page, and the
 * API reads the change back; a level out of range is refused beside its input and changes nothing. The lane joins
 * two depots of this test's own, and the service level is put back afterwards, so no other test sees a change.
 */
@QuarkusTest
class LeadSettingsBrowserTest extends BrowserSession {
    @Inject
    TestData data;

    private double level(String partClass) {
        return as("lead").get("/api/planning/service-levels").then().statusCode(200).extract().jsonPath().getDouble(partClass);
    }

    private void enter(WebElement input, String value) {
        input.clear();
        input.sendKeys(value);
    }

    private void save(String formCss) {
        WebElement button = driver.findElement(By.cssSelector(formCss + " button[type=submit]"));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", button);
        button.click();
    }

    private void waitSaid(String words) {
        wait(Duration.ofSeconds(20)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(By.id("status")).getText().contains(words));
    }

    @Test
    void theLeadSetsAServiceLevelAndALaneCostThroughThePage() {
        String from = data.depot();
        String to = data.depot();
        double before = level("standard");
        try {
            signIn("lead", "lead-demo");
            open("/app/lead/settings.html");
            waitReady();
            assertTrue(driver.findElement(By.id("provenance")).getText().matches("(?s).*(forecast run \\d+|No forecast has been run).*"));

            enter(driver.findElement(By.id("level-standard")), "120");
            save("#level-standard-form");
            String refused = waitFor(By.cssSelector("#level-standard-form .field-error")).getText();
            assertTrue(refused.contains("per cent, from 50 to 99.9"), "the refusal says the page's own scale: " + refused);
            assertEquals(before, level("standard"), 1e-9, "a refused level changes nothing");

            // A fraction typed into the per-cent input (0.99 for 99 %) would be 0.99 %: refused, not saved.
            enter(driver.findElement(By.id("level-standard")), "0.99");
            save("#level-standard-form");
            wait(Duration.ofSeconds(20)).ignoring(StaleElementReferenceException.class).until(d -> d.findElement(
                    By.cssSelector("#level-standard-form .field-error")).getText().contains("from 50 to 99.9"));
            assertEquals(before, level("standard"), 1e-9, "a fraction typed as per cent changes nothing");

            enter(driver.findElement(By.id("level-standard")), "91.5");
            save("#level-standard-form");
            waitSaid("Standard parts: 91.5 % from now on.");
            assertEquals(0.915, level("standard"), 1e-9);
            assertEquals("91.5 %", waitFor(By.cssSelector("#level-standard-form .in-force")).getText());

            String lane = "#lane-" + from + "-" + to;
            WebElement cost = driver.findElement(By.cssSelector(lane));
            driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", cost);
            enter(cost, "3.25");
            save("form:has(" + lane + ")");
            waitSaid("Lane " + from + " to " + to);
            Map<String, Object> set = as("lead").get("/api/planning/transfer-costs").then().statusCode(200).extract().jsonPath()
                    .param("f", from).param("t", to).get("find { it.from == f && it.to == t }");
            assertEquals(3.25, ((Number) set.get("setCost")).doubleValue(), 1e-9);
            wait(Duration.ofSeconds(20)).ignoring(StaleElementReferenceException.class).until(d -> d.findElement(By.xpath(
                    "//input[@id='lane-" + from + "-" + to + "']/ancestor::tr/td[@data-label='In use']")).getText().startsWith("set:"));
            assertNoPageErrors("HTTP 400 PUT " + url("/api/planning/service-levels"),
                    "/api/planning/service-levels - Failed to load resource: the server responded with a status of 400");
        } finally {
            as("lead").contentType("application/json").body(Map.of("partClass", "STANDARD", "level", before))
                    .put("/api/planning/service-levels").then().statusCode(204);
        }
    }

    private double certainty() {
        return as("lead").get("/api/sensors/stop-certainty").then().statusCode(200).extract().jsonPath()
                .getDouble("leastProbability");
    }

    /**
     * The certainty a "probably down" flag needs reads as a sentence with the demo's measured trade beside it; a figure
     * outside 50 to 99 % (or a fraction typed for a per cent) is refused beside the input and changes nothing; a
     * figure saved is in force and the officer's sensors page says so. 50 % is put back afterwards.
     */
    @Test
    void theLeadSetsHowSureTheSensorsMustBeBeforeAPumpIsCalledProbablyDown() {
        assertEquals(0.5, certainty(), 1e-12);
        try {
            signIn("lead", "lead-demo");
            open("/app/lead/settings.html");
            waitReady();
            WebElement input = waitFor(By.id("least-probability"));
            assertEquals("50", input.getDomProperty("value"));
            String sentence = driver.findElement(By.cssSelector("#stop-certainty-form p")).getText();
            assertTrue(sentence.startsWith("Call a pump probably down when the sensor makes it at least")
                    && sentence.endsWith("% likely"), sentence);
            String measured = driver.findElement(By.id("stop-measured")).getText();
            assertTrue(measured.startsWith("As measured on the demo") && measured.contains("at 80 %, 79 %"), measured);
            assertTrue(driver.findElement(By.cssSelector("#stop-certainty .in-force")).getText()
                    .equals("at least 50 % likely"));

            for (String wrong : new String[]{"100", "0.8", "40", ""}) {
                enter(driver.findElement(By.id("least-probability")), wrong);
                save("#stop-certainty-form");
                wait(Duration.ofSeconds(20)).ignoring(StaleElementReferenceException.class).until(d -> d.findElement(
                        By.cssSelector("#stop-certainty-form .field-error")).getText().contains("from 50 to 99"));
                assertEquals(0.5, certainty(), 1e-12, "refused, not saved: '" + wrong + "'");
            }

            enter(driver.findElement(By.id("least-probability")), "80");
            save("#stop-certainty-form");
            waitSaid("Pumps are called probably down from 80 % likely");
            assertEquals(0.8, certainty(), 1e-12);
            assertEquals("at least 80 % likely", waitFor(By.cssSelector("#stop-certainty .in-force")).getText());
            assertNoPageErrors();

            signIn("officer", "officer-demo");
            open("/app/officer/sensors.html?location=DEP-TESHVALE");
            waitReady();
            assertTrue(waitFor(By.id("stop-certainty")).getText().startsWith(
                    "A pump is called probably down when its sensor makes it at least 80 % likely"));
            assertNoPageErrors();
        } finally {
            as("lead").contentType("application/json").body(Map.of("leastProbability", 0.5))
                    .put("/api/sensors/stop-certainty").then().statusCode(200);
        }
    }
}
