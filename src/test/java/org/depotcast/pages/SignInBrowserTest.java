package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Cookie;

import java.time.Duration;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Signing in and out through the pages, a page refused to the wrong role, and a session that has ended. */
@QuarkusTest
class SignInBrowserTest extends BrowserSession {

    private String message() {
        return waitFor(By.id("message")).getText();
    }

    @Test
    void aWrongPasswordStaysOnTheFormWithAPlainMessage() {
        open("/sign-in.html");
        fillSignIn("officer", "not-the-password");
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("message")).getText().contains("failed"));
        assertEquals("Sign-in failed: the account name or the password is wrong.", message());
        assertTrue(driver.getCurrentUrl().contains("/sign-in.html"), driver.getCurrentUrl());
        assertNoPageErrors("HTTP 401 POST " + url("/sign-in"), "/sign-in - Failed to load resource: the server responded with a status of 401");
    }

    @Test
    void signingInOpensTheUsersOwnPageAndSigningOutSaysSo() {
        signIn("mechanic1", "mechanic1-demo");
        waitReady();
        assertTrue(driver.getCurrentUrl().endsWith("/app/mechanic/"), driver.getCurrentUrl());
        assertTrue(driver.findElement(By.cssSelector(".topbar__who")).getText().contains("Signed in as mechanic1 (area mechanic)"));
        driver.findElement(By.xpath("//button[normalize-space()='Sign out']")).click();
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/sign-in.html?signed-out"));
        assertEquals("You are signed out.", message());
        assertNoPageErrors();
    }

    @Test
    void aMechanicOpeningTheLeadsPagesIsToldWhoTheyAreForAndWhereToGo() {
        signIn("mechanic1", "mechanic1-demo");
        open("/app/lead/");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/refused.html"));
        String explained = wait(Duration.ofSeconds(20)).until(d -> {
            String text = d.findElement(By.id("explain")).getText();
            return text.contains("signed in as") ? text : null;
        });
        assertTrue(explained.contains("You opened the programme lead's forecast and budget pages (for programme leads)."), explained);
        assertTrue(explained.contains("You are signed in as mechanic1 (area mechanic)."), explained);
        assertEquals("/app/mechanic/", driver.findElement(By.linkText("My kit and pumps")).getDomAttribute("href"));
        assertNoPageErrors();
    }

    @Test
    void aSessionEndedElsewhereSendsThePageToSignInWithThatSaidAndBackAfterwards() {
        signIn("mechanic1", "mechanic1-demo");
        waitReady();
        Cookie session = driver.manage().getCookieNamed("depotcast-session");
        given().cookie("depotcast-session", session.getValue()).header("X-Requested-With", "depotcast")
                .header("Accept", "application/json").post(url("/sign-out")).then().statusCode(204);
        open("/app/mechanic/");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/sign-in.html?expired"));
        assertEquals("Your session has ended; sign in again. You will come back to the page you were on.", message());
        fillSignIn("mechanic1", "mechanic1-demo");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().endsWith("/app/mechanic/"));
        waitReady();
        assertNoPageErrors("HTTP 401 GET " + url("/api/me"), "/api/me - Failed to load resource: the server responded with a status of 401");
    }
}
