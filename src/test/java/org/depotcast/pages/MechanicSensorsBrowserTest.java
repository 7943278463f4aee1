package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;

import java.time.Duration;
import java.time.LocalDate;
import java.util.List;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A demo mechanic's page shows their pumps due for service in the order of their projected due date and their pumps
 * probably down, at 360 and 1280 px, and still shows them from the phone's cache with no connection.
 */
@QuarkusTest
class MechanicSensorsBrowserTest extends BrowserSession {
    private static final String DEPOT = "DEP-TESHVALE";

    /** Read in one script, as the page redraws itself when fresh data arrives after drawing the kept copy. */
    @SuppressWarnings("unchecked")
    private List<String> read(String css, String attribute) {
        return (List<String>) driver.executeScript("return [...document.querySelectorAll(arguments[0])]"
                + ".map(e => arguments[1] ? e.getAttribute(arguments[1]) : e.textContent)", css, attribute);
    }

    private void tap(String css) {
        WebElement control = driver.findElement(By.cssSelector(css));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", control);
        control.click();
    }

    private void openSensors() {
        if (driver.findElement(By.id("sensors")).getDomAttribute("open") == null) {
            WebElement summary = driver.findElement(By.cssSelector("#sensors > summary"));
            driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", summary);
            summary.click();
        }
    }

    /**
     * The due list in the API's order, its dates rising, the stopped pump listed, nothing wider than the screen.
     * Online, the page first draws what the phone kept, then the server's answer: the check waits for the latter.
     */
    private void assertShows(List<String> expectedDue, String stopped, int width, boolean online) {
        if (online) {
            wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.tagName("body")).getDomAttribute("data-refreshed") != null);
        }
        wait(Duration.ofSeconds(30)).until(ExpectedConditions.presenceOfElementLocated(By.id("service-due-list")));
        openSensors();
        assertEquals(expectedDue, read("#service-due-list > li", "data-asset"), "due pumps in the order of their due date");
        List<String> dates = read("#service-due-list > li", "data-due");
        for (int i = 1; i < dates.size(); i++) {
            assertTrue(dates.get(i - 1).compareTo(dates.get(i)) <= 0, "due dates rise: " + dates);
        }
        List<String> card = read("#down-list li[data-asset='" + stopped + "']", null);
        assertEquals(1, card.size(), stopped + " is listed as probably down");
        // One word for the state, the officer's and the API's ("probably down"), in headings, cards and the round's words.
        assertTrue(read("#sensors-title", null).get(0).matches("What the sensors say: \\d+ probably down, \\d+ due for service"),
                read("#sensors-title", null).toString());
        assertTrue(read("#down-title", null).get(0).startsWith("Probably down: "), read("#down-title", null).toString());
        String words = read("#sensors", null).get(0) + read("#pump-count", null).get(0);
        assertFalse(words.toLowerCase().contains("stopped"), words);
        assertTrue(card.get(0).contains("Probably down ("), card.get(0));
        // The mechanic is the one who would go: told to check before the trip, not to ask "the area mechanic".
        List<String> caution = read("#sensors .sensor-caution", null);
        assertTrue(caution.size() == 1 && caution.get(0).contains("before making the trip")
                && !caution.get(0).contains("the area mechanic"), caution.toString());
        // A pump probably down is on the round of pumps to visit, its card saying why.
        List<String> onRound = read("#pump-list #pump-" + stopped, null);
        assertEquals(1, onRound.size(), stopped + " is among the pumps to visit");
        assertTrue(onRound.get(0).contains("Sensor: Probably down (") && onRound.get(0).contains("ask the community before the trip"),
                onRound.get(0));
        Number scroll = (Number) driver.executeScript("return document.documentElement.scrollWidth");
        assertTrue(scroll.intValue() <= width, "the page is " + scroll + " px wide on a " + width + " px screen");
    }

    /**
     * "Report broken" on a flagged pump's own card and on its card in the sensors' list starts from the day the sensor saw
     * use fall, said so beside the date, which stays inside the pump's life; on another pump's card, from today.
     */
    private void reportFromTheSensorCard(String stopped, String fell) throws Exception {
        String today = (String) driver.executeScript("const d = new Date(); return `${d.getFullYear()}-`"
                + " + `${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`");
        assertTrue(fell.compareTo(today) < 0, "the demo pump's use fell before today: " + fell);
        String installed = as("lead").get("/api/pumps/" + stopped).then().statusCode(200).extract().path("installedOn");
        WebElement since = driver.findElement(By.cssSelector("#status-form input[name=since]"));
        driver.executeScript("[...document.querySelectorAll(arguments[0])].find(b => b.textContent === 'Report broken')"
                + ".scrollIntoView({block: 'center'})", "#pump-" + stopped + " button");
        driver.executeScript("[...document.querySelectorAll(arguments[0])].find(b => b.textContent === 'Report broken').click()",
                "#pump-" + stopped + " button");
        assertEquals(fell, since.getDomProperty("value"), "a report from a flagged pump's own card starts from the day use fell");
        assertTrue(driver.findElement(By.id("since-source")).getText().startsWith("From the sensor: use fell on "));
        // A pump its sensor does not flag starts from today, from its own card too.
        String other = (String) driver.executeScript("const card = [...document.querySelectorAll('#pump-list article.pump')]"
                + ".find(c => !c.querySelector('.pump__sensor') && [...c.querySelectorAll('button')].some(b => b.textContent === 'Report broken'));"
                + "if (!card) return null; [...card.querySelectorAll('button')].find(b => b.textContent === 'Report broken').click();"
                + "return card.id");
        assertTrue(other != null, "a pump not flagged by its sensor is on the list");
        assertEquals(today, since.getDomProperty("value"), "a report from " + other + "'s card starts from today");
        assertEquals("", driver.findElement(By.id("since-source")).getText());

        tap("#down-list li[data-asset='" + stopped + "'] button");
        assertEquals(fell, since.getDomProperty("value"), "the report starts from the day the sensor saw use fall");
        assertEquals(installed, since.getDomAttribute("min"));
        assertEquals(today, since.getDomAttribute("max"));
        String source = driver.findElement(By.id("since-source")).getText();
        assertTrue(source.startsWith("From the sensor: use fell on ") && source.contains("Change it if you know"), source);
        screenshot("mechanic-report-from-sensor-360");

        String before = LocalDate.parse(installed).minusDays(1).toString();
        driver.executeScript("arguments[0].value = arguments[1]", since, before);
        tap("#status-form button[type=submit]");
        String error = wait(Duration.ofSeconds(10)).until(d -> d.findElement(By.cssSelector("#status-form .field-error"))).getText();
        assertTrue(error.startsWith("cannot be before the pump was installed on"), error);
        String describedBy = since.getDomAttribute("aria-describedby");
        assertTrue(describedBy.contains("since-source") && describedBy.contains(driver.findElement(
                By.cssSelector("#status-form .field-error")).getDomAttribute("id")), "the date's source and its error: " + describedBy);
        assertEquals("0", driver.findElement(By.tagName("body")).getDomAttribute("data-outbox"), "nothing queued");
        driver.executeScript("arguments[0].value = arguments[1]", since, fell);
    }

    @Test
    void dueServicesComeInDueDateOrderWithTheStoppedPumpsAndStillShowOffline() throws Exception {
        JsonPath depot = as("lead").queryParam("depot", DEPOT).get("/api/sensors/probably-down").then()
                .statusCode(200).extract().jsonPath();
        String stopped = depot.getString("pumps.find { it.assetId.startsWith('OB-') }.assetId");
        assertTrue(stopped != null, "the demo has a pump probably down at " + DEPOT);
        String mechanic = depot.getString("pumps.find { it.assetId == '" + stopped + "' }.assignedMechanic");
        JsonPath plan = given().auth().preemptive().basic(mechanic, mechanic + "-demo").get(url("/api/sensors/service-plan"))
                .then().statusCode(200).extract().jsonPath();
        String last = LocalDate.parse(plan.getString("today")).plusDays(89).toString();
        List<String> expected = plan.getList("pumps.findAll { it.dueOn != null && it.dueOn <= '" + last + "' }.assetId");
        assertFalse(expected.isEmpty(), mechanic + " has pumps due in the next 90 days");

        phone();
        signIn(mechanic, mechanic + "-demo");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        assertShows(expected, stopped, 360, true);
        assertTrue(driver.findElement(By.id("sensors-title")).getText().startsWith("What the sensors say: "));
        // The weight budget (300 KB first load, MechanicPagesBenchmark): the two sensor answers are a small part of it.
        Number sensorBytes = (Number) driver.executeScript("return performance.getEntriesByType('resource')"
                + ".filter(e => e.name.includes('/api/sensors/')).reduce((t, e) => t + e.transferSize, 0)");
        System.out.printf("sensor data on %s's first load: %.1f KB for %d pumps due%n", mechanic,
                sensorBytes.doubleValue() / 1024, expected.size());
        assertTrue(sensorBytes.intValue() > 0 && sensorBytes.intValue() < 80 * 1024, sensorBytes + " bytes of sensor data");
        screenshot("mechanic-sensors-360");
        driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "navigator.serviceWorker.ready.then(() => { const check = () => navigator.serviceWorker.controller"
                + " ? done(true) : setTimeout(check, 50); check(); });");

        desk();
        driver.navigate().refresh();
        waitReady();
        assertShows(expected, stopped, 1280, true);
        screenshot("mechanic-sensors-1280");

        phone();
        offline(true);
        driver.navigate().refresh();
        waitReady();
        assertTrue(driver.findElement(By.id("connection")).getText().startsWith("No connection"));
        assertShows(expected, stopped, 360, false);
        screenshot("mechanic-sensors-offline-360");

        reportFromTheSensorCard(stopped, depot.getString("pumps.find { it.assetId == '" + stopped + "' }.stoppedFrom"));
        // Reported broken from the sensors' list with no connection: the card says it waits, and offers no second report.
        tap("#status-form button[type=submit]");
        wait(Duration.ofSeconds(10)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-outbox")));
        List<String> card = read("#down-list li[data-asset='" + stopped + "']", null);
        assertTrue(card.get(0).contains("Reported on this phone: waiting to send"), card.get(0));
        assertTrue(read("#down-list li[data-asset='" + stopped + "'] button", null).isEmpty(), "no second report offered");
        screenshot("mechanic-sensors-reported-offline-360");
        // Left offline: the report is never sent, so the demo pump stays as other tests expect it.
        assertNoPageErrors();
    }
}
