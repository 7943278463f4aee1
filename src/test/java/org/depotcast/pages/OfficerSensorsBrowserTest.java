package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.util.List;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The officer's "Pump sensors" page on a desk and a phone: a pump of the demo probably down with its state in words,
 * the parts to have ready against stock (those not worth setting aside named apart), and the service kits due week
 * by week for 90 days.
 */
@QuarkusTest
class OfficerSensorsBrowserTest extends BrowserSession {
    private static final String DEPOT = "DEP-MARROWFORD";

    private static final java.util.regex.Pattern EXPECTED_WITH_UNIT =
            java.util.regex.Pattern.compile("(less than 0\\.05|[0-9.,]+) (pieces|pairs|sets|lengths|m|kg|L) expected");

    private List<String> texts(String css) {
        return driver.findElements(By.cssSelector(css)).stream().map(WebElement::getText).toList();
    }

    @Test
    void theOfficerSeesADemoPumpProbablyDownItsPartsAndTheServiceWeeks() throws Exception {
        // Expected parts come from the fleet models, which a finished forecast run fits.
        OfficerJourneyBrowserTest.forecastRunThroughTheApi(url(""));
        JsonPath report = as("officer").queryParam("depot", DEPOT).get("/api/sensors/probably-down").then()
                .statusCode(200).extract().jsonPath();
        List<String> demoPumps = report.getList("pumps.findAll { it.assetId.startsWith('OB-') }.assetId");
        assertFalse(demoPumps.isEmpty(), "the demo has a pump probably down at " + DEPOT);
        assertFalse(report.getList("parts").isEmpty(), "the flagged pumps are expected to need parts");
        // The table lists the parts worth setting aside; the rest are named on a line of their own.
        List<String> partNumbers = report.getList("parts.findAll { it.haveReady > 0 }.partNumber");
        List<String> notSetAside = report.getList("parts.findAll { it.haveReady == 0 }.partNumber");
        assertFalse(partNumbers.isEmpty(), "a pump probably down has some part worth having ready");
        String asset = demoPumps.get(0);
        double probability = report.getDouble("pumps.find { it.assetId == '" + asset + "' }.probabilityDown");
        // A flag is a judgement: a share that rounds to 100 % reads "over 99 %", never as certain.
        String likely = probability >= 0.995 ? "over 99 %" : Math.round(100 * probability) + " %";

        signIn("officer", "officer-demo");
        for (boolean narrow : List.of(false, true)) {
            if (narrow) {
                phone();
            } else {
                desk();
            }
            open("/app/officer/sensors.html?location=" + DEPOT);
            waitReady();
            WebElement row = driver.findElements(By.cssSelector("#down-pumps tbody tr")).stream()
                    .filter(tr -> tr.getText().contains(asset)).findFirst()
                    .orElseThrow(() -> new AssertionError(asset + " is not listed as probably down"));
            assertTrue(row.getText().contains("Probably down (" + likely + " likely)"), row.getText());
            assertTrue(texts("#down-pumps tbody tr").stream().noneMatch(t -> t.contains("(100 % likely)")), row.getText());
            assertTrue(row.getText().contains("Use fell on"), row.getText());
            assertTrue(row.getText().contains("No repair reported") || row.getText().contains("reported: the flag closes"));
            List<String> partRows = texts("#down-parts tbody tr");
            assertEquals(partNumbers.size(), partRows.size());
            for (String part : partNumbers) {
                assertTrue(partRows.stream().anyMatch(t -> t.contains(part)
                        && (t.contains("Enough in stock") || t.contains("Short by"))), part + " with its stock in words");
            }
            // An average count says its unit, like every other quantity on the page.
            for (String r : partRows) {
                assertTrue(EXPECTED_WITH_UNIT.matcher(r).find(), "expected units without their unit: " + r);
            }
            String downNow = driver.findElement(By.cssSelector("#main .figures div")).getText();
            assertTrue(downNow.matches("(?s)Probably down now\\s+" + report.getList("pumps").size() + "\\D.*pumps?"), downNow);
            String aside = notSetAside.isEmpty() ? "" : driver.findElement(By.id("down-parts-aside")).getText();
            for (String part : notSetAside) {
                assertTrue(aside.contains(part), part + " named as not worth setting aside: " + aside);
                assertTrue(partRows.stream().noneMatch(t -> t.contains(part)), part + " is not in the table");
            }
            assertTrue(driver.findElement(By.cssSelector(".sensor-caution")).getText().startsWith("Probably down, not known to be"));
            List<String> weeks = texts("#service-weeks tbody tr");
            assertEquals(13, weeks.size(), "13 weeks cover the 90 days");
            assertTrue(weeks.stream().anyMatch(w -> w.contains("OB-")), "demo pumps fall due in these weeks");
            assertTrue(driver.findElement(By.id("sensor-provenance")).getText().contains("forecast run "));
            Object overflow = driver.executeScript("return document.documentElement.scrollWidth > document.documentElement.clientWidth");
            assertEquals(Boolean.FALSE, overflow, "the page fits the screen without sideways scrolling");
            screenshot("officer-sensors-" + (narrow ? "360" : "1280"));
        }
        assertNoPageErrors();
    }

    /**
     * The list under the weeks names exactly the pumps the weeks count (the last week's too), the last week ends on the
     * 90th day, and the central store, which has no pumps, says so instead of drawing empty tables.
     */
    @Test
    void theDueListHoldsEveryPumpTheWeeksCountAndTheCentralStoreSaysItHasNoPumps() throws Exception {
        signIn("officer", "officer-demo");
        boolean lastWeekChecked = false;
        for (String depot : List.of("DEP-MARROWFORD", "DEP-PELLOWDENE", "DEP-TESHVALE")) {
            JsonPath plan = as("officer").queryParam("depot", depot).get("/api/sensors/service-plan").then()
                    .statusCode(200).extract().jsonPath();
            List<List<String>> weeks = plan.getList("weeks.pumpsDue");
            String lastStart = plan.getString("weeks[-1].weekStart");
            List<String> lastWeek = weeks.get(weeks.size() - 1);
            lastWeekChecked |= plan.getList("pumps.findAll { it.dueOn != null && it.dueOn > '" + lastStart + "' && it.dueOn <= '"
                    + java.time.LocalDate.parse(plan.getString("today")).plusDays(89) + "' }").size() > 0;
            open("/app/officer/sensors.html?location=" + depot);
            waitReady();
            List<String> listed = driver.findElements(By.cssSelector("#service-pumps tbody tr td:first-child")).stream()
                    .map(e -> e.getDomProperty("textContent")).toList();
            List<String> counted = weeks.stream().flatMap(List::stream).toList();
            assertEquals(counted.size(), listed.size(), depot + ": the list names every pump the weeks count");
            assertTrue(listed.containsAll(lastWeek), depot + ": the last week's pumps " + lastWeek + " are listed");
            String lastLabel = texts("#service-weeks tbody tr td:first-child").get(weeks.size() - 1);
            String day = driver.executeScript("return new Date(arguments[0] + 'T12:00:00').toLocaleDateString(undefined, "
                    + "{day: 'numeric', month: 'short', year: 'numeric'})",
                    java.time.LocalDate.parse(plan.getString("today")).plusDays(89).toString()).toString();
            assertTrue(lastLabel.endsWith(day), "the last week ends on the 90th day, " + day + ": " + lastLabel);
        }
        assertTrue(lastWeekChecked, "a demo depot has a pump due in the last week after its first day, so the check bites");

        open("/app/officer/sensors.html?location=CENTRAL");
        waitReady();
        assertTrue(driver.findElement(By.id("sensor-no-pumps")).getText().startsWith("CENTRAL has no pumps of its own"));
        assertTrue(driver.findElements(By.cssSelector("#down-pumps, #service-weeks")).isEmpty(), "no empty tables");
        assertNoPageErrors();
    }
}
