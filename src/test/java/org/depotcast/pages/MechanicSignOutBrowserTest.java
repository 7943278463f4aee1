package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Signing out clears what the phone kept (kit and pump data, the outbox, the page's caches), so the next person to
 * sign in on the same phone sees nothing of the last one's; actions that have not reached the server are deleted
 * only after the mechanic has been told what they are and agreed.
 */
@QuarkusTest
class MechanicSignOutBrowserTest extends MechanicPhoneSession {

    private void signOutButton() {
        press(".topbar__who button");
    }

    @SuppressWarnings("unchecked")
    private Map<String, Object> keptOnThePhone() {
        return (Map<String, Object>) driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "Promise.all([indexedDB.databases(), caches.keys(), navigator.serviceWorker.getRegistrations()])"
                + ".then(([dbs, names, workers]) => done({databases: dbs.map(d => d.name), caches: names, workers: workers.length,"
                + " keys: Object.keys(localStorage).filter(k => k.startsWith('depotcast.'))}), e => done({error: String(e)}));");
    }

    @Test
    void signOutAsksBeforeDroppingUnsentActionsAndThenLeavesNothingForTheNextPerson() throws Exception {
        openPageOnPhone();
        Map<String, Object> before = keptOnThePhone();
        assertTrue(((List<?>) before.get("databases")).contains("depotcast-mechanic"), before.toString());
        assertTrue(((List<?>) before.get("caches")).stream().anyMatch(n -> String.valueOf(n).startsWith("depotcast-mechanic")), before.toString());

        // With no connection the server cannot end the session: nothing is cleared, and the page says so.
        offline(true);
        recordFixedRepair(sealPart, 9);
        waitOutbox(1);
        signOutButton();
        waitFor(By.cssSelector("#status .message--error"));
        assertTrue(driver.findElement(By.id("status")).getText().contains("Signing out needs a connection"));
        assertTrue(driver.getCurrentUrl().contains("/app/mechanic/"));

        // Back online the repair is refused (9 seals, the kit holds 5): it stays on the phone, unsent.
        offline(false);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        signOutButton();
        String question = waitFor(By.cssSelector("dialog.ask")).getText();
        assertTrue(question.contains("1 action has not reached the server") && question.contains("1 refused by the server")
                && question.contains("Repair of pump " + pump), question);
        screenshot("mechanic-sign-out-question");
        driver.findElement(By.id("ask-no")).click();
        assertTrue(driver.findElements(By.cssSelector("dialog.ask")).isEmpty());
        assertEquals("1", driver.findElement(By.tagName("body")).getDomAttribute("data-refused"), "kept after staying signed in");

        signOutButton();
        waitFor(By.id("ask-yes")).click();
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/sign-in.html?signed-out"));
        Map<String, Object> after = keptOnThePhone();
        assertEquals(List.of(), after.get("databases"), after.toString());
        assertEquals(List.of(), after.get("caches"), after.toString());
        assertEquals(0L, ((Number) after.get("workers")).longValue(), after.toString());
        assertEquals(List.of(), after.get("keys"), after.toString());

        // The next mechanic on this phone sees their own kit and nothing of the first one's.
        String second = TestData.unique("mech").toLowerCase();
        String secondKit = data.kit(depot, second);
        data.asSystem(() -> accounts.create(second, PASSWORD, Set.of("mechanic"), locations.require(null, secondKit).id));
        signIn(second, PASSWORD);
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("kit-title")).getText().startsWith("My kit " + secondKit));
        openSection("kit");
        String page = driver.findElement(By.id("main")).getText();
        assertTrue(!page.contains(kit) && !page.contains(pump), page);
        assertEquals("0", driver.findElement(By.tagName("body")).getDomAttribute("data-refused"));
        String repairs = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + repairs, repairs + " - Failed to load resource: the server responded with a status of 422");
    }

    @Test
    @SuppressWarnings("unchecked")
    void someoneSigningInWithoutTheLastOneSigningOutSeesNoneOfTheirDataAndTheirUnsentActionStays() throws Exception {
        openPageOnPhone();
        offline(true);
        recordFixedRepair(sealPart, 9);
        waitOutbox(1);
        offline(false);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));

        // The next person signs in over the first one's session (say it had run out) without signing out.
        String second = TestData.unique("mech").toLowerCase();
        String secondKit = data.kit(depot, second);
        data.asSystem(() -> accounts.create(second, PASSWORD, Set.of("mechanic"), locations.require(null, secondKit).id));
        signIn(second, PASSWORD);
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("kit-title")).getText().startsWith("My kit " + secondKit));
        assertEquals("1 unsent action of " + mechanic + " is kept on this phone and sent when that account signs in here again.",
                waitFor(By.id("others-waiting")).getText());
        assertEquals("0", driver.findElement(By.tagName("body")).getDomAttribute("data-refused"), "not the second one's to see or discard");
        List<Object> kept = (List<Object>) driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "const open = indexedDB.open('depotcast-mechanic'); open.onsuccess = () => { const r = open.result"
                + ".transaction('snapshot').objectStore('snapshot').getAllKeys(); r.onsuccess = () => done(r.result); };");
        assertEquals(List.of(second), kept, "only the signed-in person's data stays on the phone");
        String repairs = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + repairs, repairs + " - Failed to load resource: the server responded with a status of 422");
    }
}
