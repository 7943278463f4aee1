package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.StaleElementReferenceException;

import java.time.Duration;

import static org.depotcast.TestData.as;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * "Discard this action" on the phone asks first, in words, with "Keep it" chosen unless the mechanic picks the other
 * button: a refused repair made on the phone is deleted only on a second, deliberate tap, and its notice leaves the
 * stores officer's morning board (the phone withdraws it).
 */
@QuarkusTest
class MechanicDiscardBrowserTest extends MechanicPhoneSession {

    @Test
    void discardingAStoredActionAsksFirstAndKeepsItUnlessConfirmed() throws Exception {
        openPageOnPhone();
        recordFixedRepair(sealPart, 7);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        // The refresh after the refusal redraws the outbox and says so last: wait for it, so nothing redraws under a tap.
        wait(Duration.ofSeconds(30)).until(d -> textOf(By.id("status")).contains("refused by the server"));
        String summary = textOf(By.cssSelector(".outbox__item--refused strong"));
        as("officer").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(200).body("size()",
                org.hamcrest.Matchers.equalTo(1));

        pressDiscard();
        String question = textOf(By.cssSelector("dialog.ask[open]"));
        assertEquals("Discard this action for good?", textOf(By.cssSelector("dialog.ask[open] h2")));
        // A screen reader names the dialog by its own heading (the page's "Ask for parts" heading once shared its id).
        assertEquals("Discard this action for good?", driver.executeScript("const id = document.querySelector('dialog.ask[open]')"
                + ".getAttribute('aria-labelledby'); const all = document.querySelectorAll(`[id=\"${id}\"]`);"
                + " return all.length === 1 ? all[0].textContent : all.length + ' elements with id ' + id;"));
        assertTrue(question.contains(summary) && question.contains("The server refused it")
                && question.contains("it will never be sent and cannot be brought back"), question);
        assertEquals("ask-no", driver.switchTo().activeElement().getDomAttribute("id"), "a stray tap keeps the action");
        assertFitsThePhone();
        screenshot("mechanic-discard-question");
        press("#ask-no");
        assertKept(summary);

        // Escape (or the phone's back gesture) keeps it too.
        pressDiscard();
        textOf(By.cssSelector("dialog.ask[open]"));
        driver.switchTo().activeElement().sendKeys(Keys.ESCAPE);
        assertKept(summary);

        pressDiscard();
        textOf(By.cssSelector("dialog.ask[open]"));
        press("#ask-yes");
        wait(Duration.ofSeconds(10)).until(d -> "0".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        assertTrue(textOf(By.id("outbox-body")).contains("Nothing waiting"));
        assertTrue(textOf(By.id("status")).contains("Discarded: " + summary + ". It is off the stores officer's morning board."),
                textOf(By.id("status")));
        as("officer").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(200).body("size()",
                org.hamcrest.Matchers.equalTo(0));
        String posted = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + posted, posted + " - Failed to load resource: the server responded with a status of 422");
    }

    private void assertKept(String summary) {
        wait(Duration.ofSeconds(10)).until(d -> d.findElements(By.cssSelector("dialog.ask")).isEmpty());
        assertEquals("1", driver.findElement(By.tagName("body")).getDomAttribute("data-refused"));
        assertTrue(textOf(By.cssSelector(".outbox__item--refused")).contains(summary));
        assertTrue(textOf(By.id("status")).contains("Kept on this phone: " + summary));
    }

    private void pressDiscard() {
        wait(Duration.ofSeconds(10)).ignoring(StaleElementReferenceException.class).until(d -> {
            press(".outbox__item--refused button.outbox__discard");
            return true;
        });
    }

    private String textOf(By by) {
        return wait(Duration.ofSeconds(10)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(by).getText());
    }
}
