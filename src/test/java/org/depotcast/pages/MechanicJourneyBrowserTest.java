package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.StaleElementReferenceException;

import java.math.BigDecimal;
import java.time.Duration;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The area mechanic's day on a phone with no connection: the page and its data stay on the phone, a request and a
 * repair wait in the outbox, and once the connection returns each reaches the server exactly once.
 */
@QuarkusTest
class MechanicJourneyBrowserTest extends MechanicPhoneSession {
    @Test
    void offlineRequestAndRepairReachTheServerExactlyOnceWhenTheConnectionReturns() throws Exception {
        openPageOnPhone();
        offline(true);
        // The page opens again with no connection: its files from the phone, its data from the last visit.
        driver.navigate().refresh();
        waitReady();
        assertTrue(driver.findElement(By.id("connection")).getText().startsWith("No connection"));
        assertTrue(driver.findElement(By.id("freshness")).getText().startsWith("Data from the server as of"));

        // Half a piece is refused on the phone, not by the server once the connection returns.
        openSection("ask");
        choose("#ask-form select[data-field='lines[0].partNumber']", valvePart);
        type("#ask-form input[data-field='lines[0].quantity']", "1.5");
        press("#ask-form button[type=submit]");
        String halfPiece = wait(Duration.ofSeconds(10)).until(d -> d.findElement(By.cssSelector("#ask-form .field-error")).getText());
        assertTrue(halfPiece.contains("give a whole number: this part is counted in pieces"), halfPiece);
        assertEquals("0", driver.findElement(By.tagName("body")).getDomAttribute("data-outbox"));
        // "Pump down" names the pump that is down: without one it is refused on the phone, beside the pump's field.
        type("#ask-form input[data-field='lines[0].quantity']", "1");
        choose("#ask-form select[name=urgency]", "PUMP_DOWN");
        press("#ask-form button[type=submit]");
        String noPump = wait(Duration.ofSeconds(10)).until(d -> d.findElement(By.cssSelector("#ask-form select[name=assetId] + .field-error")).getText());
        assertTrue(noPump.startsWith("choose the pump that is down"), noPump);
        assertEquals("0", driver.findElement(By.tagName("body")).getDomAttribute("data-outbox"));
        choose("#ask-form select[name=urgency]", "ROUTINE");

        askForTopUp(valvePart, 3);
        waitOutbox(1);
        recordFixedRepair(sealPart, 2);
        waitOutbox(2);
        // A further repair taking more seals than the 3 the waiting one leaves is named on the form before it is sent.
        press("#repair-form div.part-lines + button");
        choose("#repair-form select[data-field='lines[0].partNumber']", sealPart);
        type("#repair-form input[data-field='lines[0].quantity']", "4");
        String shortNote = wait(Duration.ofSeconds(10)).ignoring(StaleElementReferenceException.class).until(d -> {
            String words = d.findElement(By.cssSelector("#repair-form .kit-short")).getText();
            return words.isEmpty() ? null : words;
        });
        assertTrue(shortNote.startsWith("More than your kit holds: " + sealPart + " has 3 pieces left after the repairs waiting to send"),
                shortNote);
        String offered = driver.findElement(By.cssSelector("#repair-form select[data-field='lines[0].partNumber'] option[value='"
                + sealPart + "']")).getText();
        assertTrue(offered.endsWith("(5 pieces in kit)"), "the kit as last read, with its unit: " + offered);
        type("#repair-form input[data-field='lines[0].quantity']", "3");
        wait(Duration.ofSeconds(10)).until(d -> d.findElement(By.cssSelector("#repair-form .kit-short")).getText().isEmpty());
        assertEquals("2 actions are waiting to send.", driver.findElement(By.id("outbox-count")).getText());
        assertEquals(2, driver.findElements(By.cssSelector("#outbox-list li")).size());
        // The waiting actions say their quantities in the part's unit, as the kit table does.
        String waitingWords = driver.findElement(By.id("outbox-list")).getDomProperty("textContent");
        assertTrue(waitingWords.contains("Parts request to top up the kit: 3 pieces " + valvePart), waitingWords);
        assertTrue(waitingWords.contains("parts used: 2 pieces " + sealPart), waitingWords);
        assertFitsThePhone();
        screenshot("mechanic-offline-outbox");

        offline(false);
        waitOutbox(0);
        openSection("outbox");
        wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("outbox-body")).getText().contains("Nothing waiting"));
        screenshot("mechanic-back-online");

        List<Map<String, Object>> requests = asMechanic().get("/api/requests").then().statusCode(200).extract().jsonPath().getList("$");
        assertEquals(1, requests.size(), requests.toString());
        assertEquals("RAISED", requests.get(0).get("status"));
        assertEquals(kit, requests.get(0).get("kit"));
        List<Map<String, Object>> repairs = asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("$");
        assertEquals(1, repairs.size(), repairs.toString());
        assertEquals(LocalDate.now().toString(), repairs.get(0).get("fixedOn"));
        assertEquals(true, repairs.get(0).get("ledgerPosted"));
        assertEquals(0, new BigDecimal("3").compareTo(stock.onHand(sealPart, kit)), "5 in the kit, 2 used");
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(valvePart, kit)), "requested, not yet issued");
        // The refreshed page shows the same: 3 seals on hand and the request waiting for approval.
        openSection("requests");
        assertTrue(driver.findElement(By.id("requests-table")).getText().contains("Waiting for approval"));
        assertNoPageErrors();
    }

    @Test
    @SuppressWarnings("unchecked")
    void aResendAfterALostAnswerCountsOnceAndARefusalStaysOnThePhoneInWords() throws Exception {
        openPageOnPhone();
        offline(true);
        askForTopUp(valvePart, 2);
        waitOutbox(1);
        recordFixedRepair(sealPart, 9);
        waitOutbox(2);
        // The request reached the server once already and only its answer was lost: the phone still holds it.
        List<Map<String, Object>> held = (List<Map<String, Object>>) driver.executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                + "import('/app/mechanic/store.js').then(s => s.items()).then(done, e => done(String(e)));");
        Map<String, Object> request = held.stream().filter(i -> "request".equals(i.get("kind"))).findFirst().orElseThrow();
        asMechanic().contentType("application/json").body(request.get("body")).post("/api/requests").then().statusCode(201);

        offline(false);
        waitOutbox(0);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        // The outbox list is drawn again as the page refreshes its data: read each text in one step that retries.
        String message = textOf(By.cssSelector(".outbox__item--refused .outbox__message"));
        assertEquals("The books show only 5 of part " + sealPart + " in " + kit + ", and this needs 9.", message);
        assertTrue(textOf(By.id("outbox-count")).contains("1 refused by the server"));
        screenshot("mechanic-refused-action");

        List<Map<String, Object>> requests = asMechanic().get("/api/requests").then().statusCode(200).extract().jsonPath().getList("$");
        assertEquals(1, requests.size(), "the resend found the first request: " + requests);
        assertEquals(request.get("ref"), requests.get(0).get("clientRef"));
        asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200).body("size()", org.hamcrest.Matchers.equalTo(0));
        assertEquals(0, new BigDecimal("5").compareTo(stock.onHand(sealPart, kit)), "nothing left the kit");

        // The refusal leaves only when the mechanic discards it, and says so a second time when asked.
        press(".outbox__item--refused button.outbox__discard");
        textOf(By.cssSelector("dialog.ask[open]"));
        press("#ask-yes");
        wait(Duration.ofSeconds(10)).until(d -> "0".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        // The one refusal caused on purpose shows in the network events and the browser log; nothing else may fail.
        String repairs = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + repairs,
                repairs + " - Failed to load resource: the server responded with a status of 422");
        assertEquals(1L, pageProblems().stream().filter(p -> p.startsWith("HTTP ")).count(), "only the refused repair failed");
    }

    private String textOf(By by) {
        return wait(Duration.ofSeconds(10)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(by).getText());
    }
}
