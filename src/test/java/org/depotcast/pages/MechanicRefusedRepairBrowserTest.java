package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.repairs.NoticeWritesFail;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.StaleElementReferenceException;

import java.math.BigDecimal;
import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A repair that really happened uses more parts than the kit's books show: the server refuses it (stock never goes
 * negative), the phone keeps it and says in words what to do: tell the stores officer when the server could not put
 * the refusal on their morning board (its answer says so), that the officer has been told once it could. The officer
 * books the parts to the kit, and "Send again" records the repair once, its parts out of the kit.
 */
@QuarkusTest
class MechanicRefusedRepairBrowserTest extends MechanicPhoneSession {

    @Test
    void aRepairRefusedForPartsNotOnTheBooksIsSentAgainOnceTheOfficerBooksThem() throws Exception {
        NoticeWritesFail notices = NoticeWritesFail.install();
        notices.fail(true);
        openPageOnPhone();
        recordFixedRepair(sealPart, 7);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        String untold = textOf(By.cssSelector(".outbox__item--refused .outbox__advice"));
        assertTrue(untold.startsWith("The server could not put this refusal on the stores officer's morning board: tell the "
                + "stores officer yourself") && !untold.contains("has been told"), untold);
        as("officer").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(200).body("size()",
                org.hamcrest.Matchers.equalTo(0));

        // Sent again while the books are still short, the notice is written this time, and the phone says so.
        notices.fail(false);
        press(".outbox__item--refused button.outbox__again");
        wait(Duration.ofSeconds(30)).until(d -> textOf(By.cssSelector(".outbox__item--refused .outbox__advice"))
                .startsWith("The stores officer has been told"));
        String message = textOf(By.cssSelector(".outbox__item--refused .outbox__message"));
        assertEquals("The books show only 5 of part " + sealPart + " in " + kit + ", and this needs 7.", message);
        String advice = textOf(By.cssSelector(".outbox__item--refused .outbox__advice"));
        // The server has put the refusal on the officer's morning board: the phone says so instead of "ask the officer".
        assertTrue(advice.startsWith("The stores officer has been told: this refusal is on their morning board.")
                && advice.contains("Once they have booked the parts to your kit " + kit) && advice.contains("count of the kit")
                && advice.contains("press \"Send again\"") && !advice.contains("ask the stores officer"), advice);
        as("officer").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(200)
                .body("assetId", org.hamcrest.Matchers.contains(pump));
        assertFalse(driver.findElements(By.cssSelector(".outbox__item--refused button.outbox__discard")).isEmpty(),
                "the mechanic may still discard it");
        asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200).body("size()", org.hamcrest.Matchers.equalTo(0));
        assertFitsThePhone();
        screenshot("mechanic-refused-shortage");

        // The officer books the two seals the books missed to the kit (a count of the kit).
        as("officer").contentType("application/json").body(Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", sealPart, "to", kit,
                "quantity", 2, "reference", "kit count after a repair", "idempotencyKey", "count-" + kit))
                .post("/api/stock/movements").then().statusCode(201);

        press(".outbox__item--refused button.outbox__again");
        waitOutbox(0);
        wait(Duration.ofSeconds(30)).until(d -> "0".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("outbox-body")).getText().contains("Nothing waiting"));

        List<Map<String, Object>> repairs = asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("$");
        assertEquals(1, repairs.size(), "recorded once: " + repairs);
        assertEquals(true, repairs.get(0).get("ledgerPosted"));
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(sealPart, kit)), "5 + 2 booked, 7 used");
        List<Map<String, Object>> used = as("officer").queryParam("part", sealPart).get("/api/stock/movements").then().statusCode(200)
                .extract().jsonPath().getList("findAll { it.kind == 'CONSUMPTION' }");
        assertEquals(1, used.size(), "one consumption: " + used);
        String posted = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + posted, posted + " - Failed to load resource: the server responded with a status of 422");
    }

    private String textOf(By by) {
        return wait(Duration.ofSeconds(10)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(by).getText());
    }
}
