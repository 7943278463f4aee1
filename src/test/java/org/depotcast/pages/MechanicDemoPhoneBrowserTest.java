package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.time.Duration;

import static org.junit.jupiter.api.Assertions.assertEquals;
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

    /**
     * A broken pump's sensor reads next to nothing (0.01 h a day, as the demo's OB-00972 did): its card said "Next
     * service about Jul 13, 2214 ... at 0 h a day". The hours left are what the mechanic can use; no date is given.
     */
    @Test
    void aHardlyUsedPumpGetsTheHoursLeftNotADateCenturiesAhead() {
        driver.executeCdpCommand("Emulation.setLocaleOverride", java.util.Map.of("locale", "en-US"));
        open("/sign-in.html");
        Object words = driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "import('/app/mechanic/views.js').then(m => {"
                + " const due = {serviceIntervalHours: 9125, lastServiceOn: '2021-01-05', countedFrom: '2021-01-05', serviceOnRecord: true,"
                + "   hoursSinceService: 8415.3, hoursLeft: 709.7, state: 'LATER'};"
                + " done([m.serviceLine({...due, hoursPerDay: 0.0104, dueOn: '2214-07-13'}).textContent,"
                + "       m.serviceLine({...due, hoursPerDay: 3.2, dueOn: '2027-03-12'}).textContent]);"
                + "}).catch(e => done(String(e)));");
        java.util.List<?> lines = (java.util.List<?>) words;
        assertEquals("Next service after 710 more operating hours8,415 of 9,125 operating hours since the service on "
                + "Jan 5, 2021; hardly used lately (under 0.1 h a day), so no date can be given.", lines.get(0));
        assertEquals("Next service about Mar 12, 20278,415 of 9,125 operating hours since the service on Jan 5, 2021; "
                + "at 3.2 h a day.", lines.get(1));
        assertNoPageErrors();
    }
}
