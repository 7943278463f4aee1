package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.depotcast.core.policy.TransferPlanner;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The mechanic's page on a 360 px phone is quick to scan: its parts fold, each heading says how much it holds, and
 * the pumps that need a visit are listed in the order of a round from the depot (nearest next pump first), with
 * the distance of each leg. Every form is still there, a tap on its heading or jump link away.
 */
@QuarkusTest
class MechanicRoundBrowserTest extends MechanicPhoneSession {

    @Override
    BigDecimal[] depotPosition() {
        return new BigDecimal[] {new BigDecimal("-1.0"), new BigDecimal("3.0")};
    }

    /** A pump of the mechanic's, installed a month ago (no service due), at a longitude on the depot's parallel. */
    private String pumpAt(String longitude, boolean broken) {
        String asset = TestData.unique("MR").toUpperCase();
        Map<String, Object> body = new HashMap<>(Map.of("assetId", asset, "modelCode", "RB-2", "depthM", 30,
                "installedOn", LocalDate.now().minusDays(30).toString(), "depotCode", depot, "assignedMechanic", mechanic,
                "latitude", -1.0, "longitude", new BigDecimal(longitude)));
        as("officer").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
        if (broken) {
            asMechanic().contentType("application/json").body(Map.of("repairRef", "rep-" + java.util.UUID.randomUUID(),
                    "assetId", asset, "kind", "BREAKDOWN", "reportedOn", LocalDate.now().minusDays(1).toString()))
                    .post("/api/repairs").then().statusCode(201);
        }
        return asset;
    }

    @Test
    void pumpsToVisitComeInTheOrderOfARoundAndThePartsFoldWithCountsInTheirHeadings() throws Exception {
        String far = pumpAt("3.30", true);
        String middle = pumpAt("3.10", true);
        String near = pumpAt("2.95", true);
        String fine = pumpAt("3.02", false);
        openPageOnPhone();

        List<String> cards = driver.findElements(By.cssSelector("#pump-list article.pump")).stream()
                .map(e -> e.getDomAttribute("id").replace("pump-", "")).filter(a -> a.startsWith("MR-")).toList();
        // From the depot at longitude 3.0: 2.95 is nearest (0.05°), then 3.10 (0.15° on), then 3.30 (0.20° on).
        assertEquals(List.of(near, middle, far), cards, "nearest next pump first; the working pump with nothing due is not listed");
        assertFalse(cards.contains(fine));
        // One degree of longitude at 1° S is 111.178 km on the 6,371 km sphere: legs 5.6, 16.7 and 22.2 km.
        assertEquals("Stop 1: 5.6 km from the depot", stop(near));
        assertEquals("Stop 2: 16.7 km from the stop before", stop(middle));
        assertEquals("Stop 3: 22.2 km from the stop before", stop(far));

        int listed = driver.findElements(By.cssSelector("#pump-list article.pump")).size();
        assertEquals("My pumps: " + listed + " to visit, of 5", driver.findElement(By.id("pumps-title")).getText());
        assertEquals("Close a repair as fixed: 3 open", driver.findElement(By.id("close-title")).getText());
        assertEquals("My requests: 0 open", driver.findElement(By.id("requests-title")).getText());
        assertTrue(driver.findElement(By.id("kit-title")).getText().startsWith("My kit " + kit + ": "));
        assertNotNull(driver.findElement(By.id("pumps")).getDomAttribute("open"), "the pumps to visit are open");
        for (String folded : List.of("requests", "ask", "repair", "close", "report")) {
            assertEquals(null, driver.findElement(By.id(folded)).getDomAttribute("open"), folded + " starts folded");
        }
        assertFitsThePhone();
        screenshot("mechanic-round-360");

        // A jump link opens its part; a pump card's action opens its form with the pump chosen.
        press(".mech-jump a[href='#ask']");
        assertTrue(driver.findElement(By.id("ask-form")).isDisplayed());
        press("#pump-" + near + " .pump__actions button:nth-child(2)");
        WebElement repairPump = driver.findElement(By.cssSelector("#repair-form select[name=assetId]"));
        assertTrue(repairPump.isDisplayed());
        assertEquals(near, repairPump.getDomProperty("value"));
        assertNoPageErrors();
    }

    private String stop(String asset) {
        return driver.findElement(By.cssSelector("#pump-" + asset + " .pump__stop")).getText();
    }

    @Test
    @SuppressWarnings("unchecked")
    void thePhonesDistancesAgreeWithAPublishedExampleAndWithTheServersPlanner() {
        openPageOnPhone();
        Map<String, Object> out = (Map<String, Object>) driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "import('/app/mechanic/route.js').then(m => done({"
                // Land's End 50°03′59″N 5°42′53″W to John o' Groats 58°38′38″N 3°04′12″W: 968.9 km (C. Veness,
                // "Calculate distance, bearing and more between latitude/longitude points", movable-type.co.uk).
                + " veness: m.distanceKm({latitude: 50 + 3/60 + 59/3600, longitude: -(5 + 42/60 + 53/3600)},"
                + "   {latitude: 58 + 38/60 + 38/3600, longitude: -(3 + 4/60 + 12/3600)}),"
                + " demo: m.distanceKm({latitude: -0.009856, longitude: 2.414233}, {latitude: -0.642807, longitude: 2.2134}),"
                + " none: m.visitOrder(null, [{latitude: null, longitude: null}]).map(s => s.legKm)}), e => done({error: String(e)}));");
        assertEquals(968.9, ((Number) out.get("veness")).doubleValue(), 0.05, String.valueOf(out.get("error")));
        assertEquals(TransferPlanner.distanceKm(-0.009856, 2.414233, -0.642807, 2.2134), ((Number) out.get("demo")).doubleValue(), 1e-9,
                "the same as the server's transfer planner for two demo pumps");
        assertEquals(java.util.Collections.singletonList(null), out.get("none"), "a pump with no position has no leg");
        assertNoPageErrors();
    }
}
