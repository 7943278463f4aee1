package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The stores officer learns of a repair the ledger refused for parts the kit's books did not hold: the morning board
 * of the kit's depot says in words who used what, where and when, what the books held and what to do; a resend
 * recorded after the officer books the parts takes it off the board, and the officer may dismiss one.
 */
@QuarkusTest
class OfficerRefusedRepairBrowserTest extends MechanicPhoneSession {

    private Map<String, Object> fixedRepair(String ref, String part, int quantity) {
        Map<String, Object> body = new HashMap<>();
        body.put("repairRef", ref);
        body.put("assetId", pump);
        body.put("kind", "BREAKDOWN");
        body.put("reportedOn", "2026-11-20");
        body.put("fixedOn", "2026-11-21");
        body.put("lines", List.of(Map.of("partNumber", part, "quantity", quantity)));
        return body;
    }

    private int send(String ref, String part, int quantity) {
        return asMechanic().contentType("application/json").body(fixedRepair(ref, part, quantity)).post("/api/repairs").statusCode();
    }

    private List<WebElement> notices() {
        return driver.findElements(By.cssSelector("#refused-repairs li.refused-repair"));
    }

    @Test
    void theBoardSaysWhatARefusedRepairNeedsAndDropsItOnceRecordedOrDismissed() throws Exception {
        String seals = TestData.unique("phone-rep");
        String valve = TestData.unique("phone-rep");
        assertEquals(422, send(seals, sealPart, 7));
        assertEquals(422, send(seals, sealPart, 7), "the phone sends it again before anything was booked");
        assertEquals(422, send(valve, valvePart, 1));

        desk();
        signIn("officer", "officer-demo");
        open("/app/officer/?location=" + depot);
        waitReady();
        assertEquals(2, notices().size(), "one notice per refused report, however often it was sent");
        String heading = driver.findElement(By.id("refused-title")).getText();
        assertEquals("Repairs refused for parts not on a kit's books: 2", heading);
        WebElement first = notices().get(0);
        assertEquals(seals, first.getDomAttribute("data-ref"), "the oldest refusal first");
        String words = first.getText();
        assertTrue(words.contains("Refused: parts not on the kit's books"), "the state in words: " + words);
        assertTrue(words.contains("Mechanic " + mechanic + " reported using 7 pieces of " + sealPart + " (test part) at pump "
                + pump + " on "), words);
        assertTrue(words.contains("; the books of kit " + kit + " held 5 pieces of " + sealPart + ". Book the parts to kit " + kit
                + " (a transfer to the kit or a count of it), then the phone can send it again."), words);
        assertTrue(words.contains("Sent 2 times"), words);
        assertTrue(notices().get(1).getText().contains("held 0 pieces of " + valvePart), notices().get(1).getText());
        screenshot("officer-board-refused-repairs");

        // The officer dismisses the valve repair (the mechanic sorts it out another way).
        WebElement dismiss = notices().get(1).findElement(By.cssSelector("button.dismiss"));
        assertEquals("Dismiss the refused repair at pump " + pump, dismiss.getAccessibleName());
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", dismiss);
        dismiss.click();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText()
                .contains("The refused repair at pump " + pump + " is dismissed"));
        assertEquals(1, notices().size());
        as("officer").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(200)
                .body("repairRef", org.hamcrest.Matchers.equalTo(List.of(seals)));

        // The officer books the two seals the books missed; the phone's resend is recorded and the notice closes.
        as("officer").contentType("application/json").body(Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", sealPart, "to", kit,
                "quantity", 2, "reference", "kit count after a repair", "idempotencyKey", TestData.unique("count")))
                .post("/api/stock/movements").then().statusCode(201);
        assertEquals(201, send(seals, sealPart, 7));
        driver.navigate().refresh();
        waitReady();
        assertTrue(driver.findElements(By.id("refused-repairs")).isEmpty(), "nothing refused is open at " + depot);
        assertNoPageErrors();
    }
}
