package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.time.Duration;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A demo mechanic's page on a 360 px phone, with the demo's own pumps: their longest state words (a service overdue
 * "since about" a date) must wrap inside the card, not push the page wider than the phone.
 */
@QuarkusTest
class MechanicDemoPhoneBrowserTest extends BrowserSession {
    @Test
    void theDemoMechanicsPumpsFitAPhone() throws Exception {
        phone();
        signIn("mechanic1", "mechanic1-demo");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        assertFalse(driver.findElements(By.xpath("//*[@id='pumps']//span[contains(@class, 'state')]"
                + "[starts-with(normalize-space(), 'Service overdue since about')]")).isEmpty(),
                "the demo gives mechanic1 a pump whose service is overdue");
        Number width = (Number) driver.executeScript("return document.documentElement.scrollWidth");
        Object wide = driver.executeScript("return [...document.querySelectorAll('body *')].filter(e => e.getBoundingClientRect().right > 361)"
                + ".slice(-3).map(e => e.tagName + '.' + e.className + ' ' + (e.textContent || '').slice(0, 60))");
        assertTrue(width.intValue() <= 360, "the page is " + width + " px wide on a 360 px phone; too wide: " + wide);
        screenshot("mechanic-demo-phone");
        assertNoPageErrors();
    }
}
