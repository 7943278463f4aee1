package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.pages.BrowserSession;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The mechanic's phone page in headless Chromium on the demo (mechanic3: 125 pumps): bytes moved by the first load
 * with an empty browser cache, and how fast the page opens again from the phone (service worker and IndexedDB),
 * with the connection and without it.
 */
@QuarkusTest
class MechanicPagesBenchmark extends BrowserSession {
    private static final int ROUNDS = 15;

    private long firstLoadBytes() {
        return ((Number) driver.executeScript("""
                const nav = performance.getEntriesByType('navigation').map(e => e.transferSize);
                const rest = performance.getEntriesByType('resource').map(e => e.transferSize);
                return [...nav, ...rest].reduce((a, b) => a + b, 0);""")).longValue();
    }

    /** What the service worker stores to keep the page: the bodies as kept, uncompressed. */
    private long keptBytes() {
        return ((Number) driver.executeAsyncScript("""
                const done = arguments[arguments.length - 1];
                navigator.serviceWorker.ready.then(async () => {
                    let total = 0;
                    for (const name of await caches.keys()) {
                        const cache = await caches.open(name);
                        for (const request of await cache.keys()) {
                            total += (await (await cache.match(request)).arrayBuffer()).byteLength;
                        }
                    }
                    done(total);
                });""")).longValue();
    }

    /**
     * The service worker's files as the network carries them: each file it keeps, fetched again from a page outside its
     * scope (so the worker does not answer) with the browser's HTTP cache bypassed, counted by the page's timings
     * ({transfer size: compressed body and headers, compressed body alone}). The worker's own fetches are not visible
     * to the page's timings; this repeats them as a browser with nothing cached would make them, so it is an upper
     * bound of what its install moves right after a first load.
     */
    @SuppressWarnings("unchecked")
    private long[] keptOverTheWire() {
        open("/app/not-found.html");
        List<Number> sizes = (List<Number>) driver.executeAsyncScript("""
                const done = arguments[arguments.length - 1];
                (async () => {
                    const urls = [];
                    for (const name of await caches.keys()) {
                        for (const request of await (await caches.open(name)).keys()) {
                            urls.push(request.url);
                        }
                    }
                    performance.clearResourceTimings();
                    for (const url of urls) {
                        await (await fetch(url, {cache: 'no-store', credentials: 'same-origin'})).arrayBuffer();
                    }
                    const entries = performance.getEntriesByType('resource').filter(e => urls.includes(e.name));
                    done([entries.reduce((t, e) => t + e.transferSize, 0), entries.reduce((t, e) => t + e.encodedBodySize, 0),
                        urls.length, entries.length]);
                })();""");
        assertTrue(sizes.get(2).intValue() > 0 && sizes.get(2).intValue() == sizes.get(3).intValue(),
                "each kept file timed once: " + sizes);
        return new long[] {sizes.get(0).longValue(), sizes.get(1).longValue(), sizes.get(2).longValue()};
    }

    private double openAgain(boolean online) {
        open("/app/mechanic/");
        waitReady();
        double ms = readyMillis();
        if (online) {
            // Let the background refresh finish, so the next round starts from the same state.
            wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.tagName("body")).getDomAttribute("data-refreshed") != null);
        }
        return ms;
    }

    @Test
    void firstLoadWeightAndOpeningFromThePhonesCache() {
        phone();
        signIn("mechanic3", "mechanic3-demo");
        driver.executeCdpCommand("Network.enable", Map.of());
        driver.executeCdpCommand("Network.clearBrowserCache", Map.of());
        open("/app/mechanic/");
        waitReady();
        // The kit folds on the phone (open only when something needs topping up): its table is there either way.
        wait(java.time.Duration.ofSeconds(30)).until(org.openqa.selenium.support.ui.ExpectedConditions.presenceOfElementLocated(By.id("kit-table")));
        double firstMs = readyMillis();
        long pageBytes = firstLoadBytes();
        long kept = keptBytes();
        long[] wire = keptOverTheWire();
        long total = pageBytes + wire[0];
        Figures.report(String.format(Locale.ROOT, "mechanic page first load (empty cache, demo mechanic3): %.1f KB "
                + "page, modules and data over the network + %.1f KB the service worker's %d files over the network "
                + "(%.1f KB of it compressed bodies, the rest headers; %.1f KB as the worker stores them, uncompressed) "
                + "= %.1f KB over the network (budget 300 KB); ready in %.0f ms",
                pageBytes / 1024.0, wire[0] / 1024.0, wire[2], wire[1] / 1024.0, kept / 1024.0, total / 1024.0, firstMs));
        assertTrue(total <= 300 * 1024, "first load moved " + total + " bytes");

        double[] online = new double[ROUNDS];
        for (int i = 0; i < ROUNDS; i++) {
            online[i] = openAgain(true);
        }
        offline(true);
        double[] offline = new double[ROUNDS];
        for (int i = 0; i < ROUNDS; i++) {
            offline[i] = openAgain(false);
        }
        offline(false);
        Figures.report(String.format(Locale.ROOT, "mechanic page opened again from the phone's cache: median %.0f ms with "
                + "the connection, %.0f ms without it (%d rounds each; target < 300 ms)",
                Figures.median(online), Figures.median(offline), ROUNDS));
    }
}
