package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The officer's task pages: each opens on a phone and a desk screen; counts, imports and purchase orders work through them. */
@QuarkusTest
class OfficerTaskPagesBrowserTest extends BrowserSession {
    private static final String DEPOT = "DEP-MARROWFORD";

    private RequestSpecification officer() {
        return given().auth().preemptive().basic("officer", "officer-demo").accept("application/json");
    }

    @Test
    void everyTaskPageOpensOnAPhoneAndADeskWithoutErrors() throws Exception {
        signIn("officer", "officer-demo");
        for (String page : List.of("requests", "transfers", "purchases", "stock")) {
            for (boolean narrow : List.of(true, false)) {
                if (narrow) {
                    phone();
                } else {
                    desk();
                }
                open("/app/officer/" + page + ".html?location=" + DEPOT);
                waitReady();
                assertTrue(driver.findElement(By.tagName("h1")).getText().contains(DEPOT));
                Object overflow = driver.executeScript("return document.documentElement.scrollWidth > document.documentElement.clientWidth");
                assertEquals(Boolean.FALSE, overflow, page + " fits the screen without sideways scrolling");
                screenshot("officer-" + page + (narrow ? "-phone" : "-desk"));
            }
        }
        assertNoPageErrors();
    }

    @Test
    void aCountSheetBooksWhatWasCountedAndABadFileShowsItsRowsAndColumns() throws Exception {
        signIn("officer", "officer-demo");
        open("/app/officer/stock.html?location=" + DEPOT);
        waitReady();
        WebElement first = driver.findElement(By.cssSelector("#count-sheet input[type=number]"));
        String part = first.getDomAttribute("name").substring("count-".length());
        first.sendKeys("7");
        driver.findElement(By.cssSelector("#count-sheet button[type=submit]")).click();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("Count booked"));
        List<Map<String, Object>> balances = officer().get(url("/api/stock/balances?location=" + DEPOT)).jsonPath().getList("$");
        assertEquals(7.0, balances.stream().filter(b -> part.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9);

        Path bad = Files.createTempFile("count", ".csv");
        Files.writeString(bad, "location_code,part_number,quantity,counted_on\n" + DEPOT + "," + part + ",-3,2026-12-01\n"
                + DEPOT + ",NO-SUCH-PART,1,2026-12-01\n");
        driver.findElement(By.id("import-file")).sendKeys(bad.toString());
        driver.findElement(By.cssSelector("#import-form button[type=submit]")).click();
        WebElement errors = waitFor(By.cssSelector("#import-form .file-errors"));
        assertTrue(errors.getText().contains("row 2, column quantity"), errors.getText());
        assertTrue(errors.getText().contains("row 3, column part_number"), errors.getText());
        List<Map<String, Object>> after = officer().get(url("/api/stock/balances?location=" + DEPOT)).jsonPath().getList("$");
        assertEquals(7.0, after.stream().filter(b -> part.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9, "a refused file changes nothing");
        screenshot("officer-stock-import-errors");
        Files.delete(bad);
        assertNoPageErrors("HTTP 400 POST " + url("/api/stock/counts/import"), "counts/import - Failed to load resource");
    }
}
