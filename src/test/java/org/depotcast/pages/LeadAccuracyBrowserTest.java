package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.StaleElementReferenceException;
import org.openqa.selenium.WebElement;

import java.io.IOException;
import java.math.RoundingMode;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.time.Duration;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The programme lead checks a past year through the accuracy page: starts the check for the default origin (12 months
 * before this month), watches it finish, and reads a summary whose numbers are the API's; the rows can be searched
 * and sorted, the CSV link answers with the rows, the page fits a phone, and an officer of the central store reads
 * the same check without the means to start one. Any JavaScript error or failed request fails the test.
 */
@QuarkusTest
class LeadAccuracyBrowserTest extends BrowserSession {
    private static final String REPORTS = "/api/forecast/accuracy-reports";

    /** As format.js shows numbers in an en-US browser: rounded half up, thousands separators. */
    private static String shown(double value, int digits) {
        DecimalFormat format = new DecimalFormat(digits == 0 ? "#,##0" : "#,##0.#", DecimalFormatSymbols.getInstance(Locale.US));
        format.setRoundingMode(RoundingMode.HALF_UP);
        double scale = Math.pow(10, digits);
        return format.format(Math.round(value * scale) / scale);
    }

    private static Map<String, Object> summary(JsonPath report, String level, String method) {
        return report.getMap("results.summaries.find { it.level == '" + level + "' && it.method == '" + method + "' }");
    }

    private static double number(Map<String, Object> summary, String field) {
        return ((Number) summary.get(field)).doubleValue();
    }

    @Test
    void theLeadChecksAPastYearAndReadsTheApisNumbersInWords() throws IOException {
        signIn("lead", "lead-demo");
        open("/app/lead/accuracy.html");
        waitReady();
        assertEquals("page", driver.findElement(By.cssSelector(".tabs a[href='/app/lead/accuracy.html']")).getAttribute("aria-current"));
        String origin = LocalDate.now().withDayOfMonth(1).minusMonths(12).toString();
        assertEquals(origin, driver.findElement(By.id("origin")).getAttribute("value"), "the default origin");

        driver.findElement(By.cssSelector("#check-form button[type=submit]")).click();
        wait(Duration.ofSeconds(180)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(By.id("check-progress")).getText().contains("finished."));
        WebElement said = waitFor(By.id("programme-summary"));
        long id = Long.parseLong(driver.getCurrentUrl().replaceAll(".*[?&]report=(\\d+).*", "$1"));

        JsonPath report = as("lead").get(REPORTS + "/" + id).then().statusCode(200).extract().jsonPath();
        assertEquals("DONE", report.getString("job.state"));
        assertEquals(origin, report.getString("results.origin"));
        Map<String, Object> depot = summary(report, "DEPOT", "service");
        Map<String, Object> programme = summary(report, "PROGRAMME", "service");
        String text = said.getText();
        assertTrue(text.contains("off by " + shown(number(depot, "mae"), 1) + " units per part and depot"), text);
        assertTrue(text.contains("the 12-month mean was off by " + shown(number(summary(report, "DEPOT", "mean12"), "mae"), 1)), text);
        assertTrue(text.contains("Croston by " + shown(number(summary(report, "DEPOT", "croston"), "mae"), 1)), text);
        assertTrue(text.contains("inside the 80 % range for " + shown(number(depot, "coverage80"), 0) + " % of "
                + shown(number(depot, "series"), 0) + " part × depot series"), text);
        assertTrue(text.contains("the service was off by " + shown(number(programme, "mae"), 1) + " units per part"), text);
        assertTrue(driver.findElement(By.cssSelector("#earlier-table a[href='?report=" + id + "']")).isDisplayed());
        assertFalse(driver.findElements(By.cssSelector("figure.chart svg circle")).isEmpty(), "the chart has its dots");

        screenshot("lead-accuracy-desk");
        rowsNarrowAndSort(report);
        csvAnswers();
        phone();
        assertTrue((Boolean) driver.executeScript("return document.documentElement.scrollWidth <= document.documentElement.clientWidth"),
                "nothing runs off a phone's screen");
        screenshot("lead-accuracy-phone");
        desk();
        assertNoPageErrors();

        officerOfTheCentralStoreReads(id, shown(number(depot, "mae"), 1));
    }

    /** An officer of the central store reaches the check from the stores pages and reads it without a start button. */
    private void officerOfTheCentralStoreReads(long id, String depotMae) {
        driver.manage().deleteAllCookies();
        signIn("officer", "officer-demo");
        waitReady();
        driver.findElement(By.cssSelector(".tabs a[href='/app/lead/accuracy.html']")).click();
        waitReady();
        waitFor(By.id("programme-summary"));
        assertFalse(driver.findElement(By.id("check-card")).isDisplayed(), "an officer reads checks but starts none");
        open("/app/lead/accuracy.html?report=" + id);
        waitReady();
        assertTrue(waitFor(By.id("programme-summary")).getText().contains(depotMae));
        assertNoPageErrors();
    }

    @Test
    void aDepotOfficerIsToldTheChecksCoverTheWholeProgramme() {
        signIn("officer2", "officer2-demo");
        waitReady();
        assertTrue(driver.findElements(By.cssSelector(".tabs a[href='/app/lead/accuracy.html']")).isEmpty(),
                "no link to figures the account may not read");
        open("/app/lead/accuracy.html");
        waitReady();
        assertTrue(waitFor(By.id("earlier")).getText().contains("cover the whole programme"));
        assertFalse(driver.findElement(By.id("check-card")).isDisplayed());
        assertNoPageErrors("HTTP 403 GET " + url(REPORTS), REPORTS + "?limit=50 - Failed to load resource: the server responded with a status of 403");
    }

    private void rowsNarrowAndSort(JsonPath report) {
        String part = report.getString("results.rows.find { it.level == 'DEPOT' }.partNumber");
        WebElement search = driver.findElement(By.id("row-search"));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", search);
        search.sendKeys(part);
        List<String> parts = driver.findElements(By.cssSelector("#row-table tbody td[data-label='Part']")).stream().map(WebElement::getText).toList();
        assertFalse(parts.isEmpty());
        assertTrue(parts.stream().allMatch(part::equals), parts.toString());
        search.clear();
        search.sendKeys(" ");
        WebElement used = driver.findElement(By.xpath("//table[@id='row-table']//th/button[starts-with(normalize-space(.), 'Used')]"));
        used.sendKeys(Keys.ENTER);
        WebElement focused = driver.switchTo().activeElement();
        assertTrue(focused.getText().startsWith("Used"), "the keyboard stays on the heading it sorted by");
        assertFalse("none".equals(focused.getCssValue("outline-style")), "and its focus shows");
        assertEquals("used:up", driver.findElement(By.id("row-sort")).getAttribute("value"));
        assertEquals("ascending", driver.findElement(By.xpath("//table[@id='row-table']//th[button[starts-with(normalize-space(.), 'Used')]]"))
                .getAttribute("aria-sort"));
        List<Double> values = driver.findElements(By.cssSelector("#row-table tbody td[data-label='Used']")).stream()
                .map(e -> Double.parseDouble(e.getText().replace(",", ""))).toList();
        assertTrue(values.size() > 1);
        for (int i = 1; i < values.size(); i++) {
            assertTrue(values.get(i - 1) <= values.get(i), values.toString());
        }
    }

    /** The download link answers with the rows' CSV (fetched in the page, so no file lands on disk). */
    private void csvAnswers() {
        String href = driver.findElement(By.id("rows-csv")).getAttribute("href");
        Object answer = driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "fetch(arguments[0], {credentials: 'same-origin'}).then(r => r.text().then(t => done(r.status + '\\n' + t)))"
                + ".catch(e => done('failed ' + e));", href);
        String text = String.valueOf(answer);
        assertTrue(text.startsWith("200\npart_number,location,level,origin,actual,service_forecast"), text.substring(0, Math.min(120, text.length())));
    }
}
