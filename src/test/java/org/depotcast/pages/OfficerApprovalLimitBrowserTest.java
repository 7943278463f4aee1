package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Approving more than the mechanic asked for is named beside the quantity in words, and nothing is approved; a
 * "pump down" request stored before one had to name its pump reads as such, not as a kit top-up.
 */
@QuarkusTest
class OfficerApprovalLimitBrowserTest extends BrowserSession {
    @Inject
    TestData data;
    @Inject
    EntityManager em;

    @Test
    void approvingMoreThanAskedIsNamedBesideTheQuantity() throws Exception {
        String part = data.part(UnitOfIssue.EACH);
        long id = given().auth().preemptive().basic("mechanic2", "mechanic2-demo").contentType("application/json")
                .body(Map.of("clientRef", TestData.unique("over"), "urgency", "ROUTINE",
                        "lines", List.of(Map.of("partNumber", part, "quantity", 2))))
                .post(url("/api/requests")).then().statusCode(201).extract().jsonPath().getLong("id");

        signIn("officer", "officer-demo");
        open("/app/officer/requests.html?location=DEP-TESHVALE");
        waitReady();
        WebElement card = waitFor(By.cssSelector("form[data-request-id='" + id + "']"));
        WebElement quantity = card.findElement(By.cssSelector("input[type=number]"));
        quantity.clear();
        quantity.sendKeys("3");
        WebElement approve = card.findElement(By.cssSelector("button.approve-entered"));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", approve);
        approve.click();
        WebElement error = waitFor(By.cssSelector("form[data-request-id='" + id + "'] input[type=number] + .field-error"));
        assertTrue(error.getText().startsWith("cannot approve more than the 2"), error.getText());
        assertEquals("true", quantity.getDomAttribute("aria-invalid"));
        wait(Duration.ofSeconds(5)).until(d -> d.findElement(By.id("status")).getText().contains("nothing was approved"));
        given().auth().preemptive().basic("officer", "officer-demo").get(url("/api/requests/" + id))
                .then().statusCode(200).body("status", equalTo("RAISED"));
        assertNoPageErrors();
    }

    @Test
    void aPumpDownRequestStoredWithoutItsPumpDoesNotReadAsAKitTopUp() {
        String part = data.part(UnitOfIssue.EACH);
        long id = given().auth().preemptive().basic("mechanic2", "mechanic2-demo").contentType("application/json")
                .body(Map.of("clientRef", TestData.unique("old-down"), "urgency", "ROUTINE",
                        "lines", List.of(Map.of("partNumber", part, "quantity", 1))))
                .post(url("/api/requests")).then().statusCode(201).extract().jsonPath().getLong("id");
        // As stored before a "pump down" request had to name its pump (commit 1223c65): the API refuses one now.
        QuarkusTransaction.requiringNew().run(() -> em.createNativeQuery(
                "update parts_request set urgency = 'PUMP_DOWN' where id = ?1").setParameter(1, id).executeUpdate());

        signIn("officer", "officer-demo");
        open("/app/officer/requests.html?location=DEP-TESHVALE");
        waitReady();
        WebElement card = waitFor(By.cssSelector("form[data-request-id='" + id + "']"));
        String words = card.findElement(By.cssSelector("p.small.muted")).getText();
        assertTrue(words.startsWith("Pump down, no pump named") && !words.contains("top-up"), words);
        assertNoPageErrors();
    }
}
