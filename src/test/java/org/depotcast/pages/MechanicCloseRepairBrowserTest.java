package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.math.BigDecimal;
import java.time.Duration;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The mechanic closes an open repair as fixed from the phone with no connection: the closing waits in the outbox,
 * reaches the server once (the repair fixed, its parts out of the kit, the pump working again), and a closing the
 * server refuses because an officer already closed the repair with another date stays on the phone in words.
 */
@QuarkusTest
class MechanicCloseRepairBrowserTest extends MechanicPhoneSession {

    /** An open breakdown repair of the test's pump, waiting for 2 seals, recorded through the API. */
    private String openRepair(String reportedOn) {
        String ref = "rep-" + java.util.UUID.randomUUID();
        asMechanic().contentType("application/json").body(Map.of("repairRef", ref, "assetId", pump, "kind", "BREAKDOWN",
                "reportedOn", reportedOn, "fault", "rising main leaks at the third joint",
                "lines", List.of(Map.of("partNumber", sealPart, "quantity", 2)))).post("/api/repairs").then().statusCode(201);
        return ref;
    }

    private void closeOnThePhone(String ref) {
        press("li[data-repair='" + ref + "'] button.close-repair");
        wait(Duration.ofSeconds(10)).until(d -> ref.equals(d.findElement(By.cssSelector("#close-form select[name=repairRef]"))
                .getDomProperty("value")));
        // The parts the repair waited for are offered as the parts used.
        assertEquals(sealPart, driver.findElement(By.cssSelector("#close-form select[data-field='lines[0].partNumber']")).getDomProperty("value"));
        press("#close-form button[type=submit]");
    }

    @Test
    void aRepairClosedOfflineReachesTheServerOnceWithItsPartsOutOfTheKit() throws Exception {
        String ref = openRepair(LocalDate.now().minusDays(3).toString());
        openPageOnPhone();
        assertTrue(driver.findElement(By.id("pump-" + pump)).getText().contains("Broken since"));
        offline(true);
        // Where work on a pump is written down, the safety words are there too, not only folded at the page's foot.
        for (String form : List.of("#repair-form", "#close-form")) {
            String words = driver.findElement(By.cssSelector(form + " .repair-caution")).getDomProperty("textContent");
            assertTrue(words.startsWith("Safety:") && words.contains("touch drinking water") && words.contains("disinfection"), words);
        }
        closeOnThePhone(ref);
        waitOutbox(1);
        assertTrue(driver.findElement(By.cssSelector("li[data-repair='" + ref + "']")).getText()
                .contains("Closed on this phone: waiting to send"));
        assertFitsThePhone();
        screenshot("mechanic-close-offline");

        offline(false);
        waitOutbox(0);
        Map<String, Object> repair = asMechanic().get("/api/repairs/" + ref).then().statusCode(200).extract().jsonPath().getMap("$");
        assertEquals(LocalDate.now().toString(), repair.get("fixedOn"));
        assertEquals(true, repair.get("ledgerPosted"));
        assertEquals(0, new BigDecimal("3").compareTo(stock.onHand(sealPart, kit)), "5 in the kit, 2 used by the repair");
        asMechanic().get("/api/pumps/" + pump).then().statusCode(200).body("status", org.hamcrest.Matchers.equalTo("WORKING"));
        // The refreshed page no longer lists the repair as open.
        wait(Duration.ofSeconds(20)).until(d -> d.findElements(By.cssSelector("li[data-repair='" + ref + "']")).isEmpty());
        assertNoPageErrors();
    }

    @Test
    void aClosingRefusedBecauseAnOfficerClosedItFirstStaysOnThePhoneInWords() throws Exception {
        String ref = openRepair(LocalDate.now().minusDays(5).toString());
        openPageOnPhone();
        offline(true);
        closeOnThePhone(ref);
        waitOutbox(1);
        String yesterday = LocalDate.now().minusDays(1).toString();
        as("officer").contentType("application/json").body(Map.of("fixedOn", yesterday)).patch("/api/repairs/" + ref)
                .then().statusCode(200);

        offline(false);
        waitOutbox(0);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        // The outbox list may be drawn again as the page refreshes its data: read the message once it holds still.
        String message = wait(Duration.ofSeconds(30)).ignoring(org.openqa.selenium.StaleElementReferenceException.class)
                .until(d -> d.findElement(By.cssSelector(".outbox__item--refused .outbox__message")).getText());
        assertTrue(message.startsWith("Fixed on: is already recorded as ") && !message.contains(yesterday), "in the phone's own date words: " + message);
        screenshot("mechanic-close-refused");
        // The heading counts it in words, and the kit no longer counts its parts as on their way out of the kit.
        assertEquals("Waiting to send: nothing, 1 refused by the server", driver.findElement(By.id("outbox-title")).getText());
        String kitRow = driver.findElements(By.cssSelector("#kit-table tbody tr")).stream()
                .map(tr -> tr.getDomProperty("textContent")).filter(t -> t.startsWith(sealPart)).findFirst().orElseThrow();
        assertFalse(kitRow.contains("in repairs waiting to send"), kitRow);
        assertEquals(0, new BigDecimal("3").compareTo(stock.onHand(sealPart, kit)), "taken once, by the officer's closing");
        String repairs = url("/api/repairs/" + ref);
        assertNoPageErrors("HTTP 409 PATCH " + repairs, repairs + " - Failed to load resource: the server responded with a status of 409");
    }
}
