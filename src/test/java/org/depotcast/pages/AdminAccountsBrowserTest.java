package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.StaleElementReferenceException;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The administrator makes a stores officer's account for one depot through the accounts page. */
@QuarkusTest
class AdminAccountsBrowserTest extends BrowserSession {

    @Test
    void anAdminMakesAnAccountWithARoleAndAStore() {
        signIn("admin", "admin-demo");
        assertTrue(driver.getCurrentUrl().endsWith("/app/admin/"), driver.getCurrentUrl());
        waitReady();
        String username = "officer-" + Long.toString(System.nanoTime(), 36);
        driver.findElement(By.id("new-username")).sendKeys(username);
        driver.findElement(By.id("new-password")).sendKeys("first-password-1");
        driver.findElement(By.cssSelector("#create-form button[type=submit]")).click();
        String missingRole = waitFor(By.cssSelector("#create-form .field-error")).getText();
        assertTrue(missingRole.contains("Check this:") || !missingRole.isBlank(), missingRole);
        Object refused = as("admin").get("/api/accounts").then().extract().jsonPath().param("u", username).get("find { it.username == u }");
        assertNull(refused, "a refused account is not made");

        driver.findElement(By.cssSelector("#new-roles input[value=stores-officer]")).click();
        driver.findElement(By.cssSelector("#new-locations input[value=DEP-TESHVALE]")).click();
        if (driver.findElement(By.id("new-password")).getDomProperty("value").isEmpty()) {
            driver.findElement(By.id("new-password")).sendKeys("first-password-1");
        }
        driver.findElement(By.cssSelector("#create-form button[type=submit]")).click();
        wait(Duration.ofSeconds(20)).ignoring(StaleElementReferenceException.class)
                .until(d -> d.findElement(By.id("account-table")).getText().contains(username));

        Map<String, Object> made = as("admin").get("/api/accounts").then().statusCode(200).extract().jsonPath()
                .param("u", username).get("find { it.username == u }");
        assertEquals(List.of("stores-officer"), made.get("roles"));
        assertEquals(List.of("DEP-TESHVALE"), made.get("locationCodes"));
        given().auth().preemptive().basic(username, "first-password-1").get(url("/api/me")).then().statusCode(200);
        assertEquals(List.of("DEP-TESHVALE"), given().auth().preemptive().basic(username, "first-password-1")
                .get(url("/api/me")).then().extract().jsonPath().getList("locationCodes"));
        assertNoPageErrors("HTTP 400 POST " + url("/api/accounts"), "/api/accounts - Failed to load resource: the server responded with a status of 400");
    }
}
