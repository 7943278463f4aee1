package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The officer's task pages: each opens on a phone and a desk screen; counts, imports and purchase orders work through them. */
@QuarkusTest
class OfficerTaskPagesBrowserTest extends BrowserSession {
    private static final String DEPOT = "DEP-MARROWFORD";

    @Inject
    TestData data;

    /** Clicks in the middle of the screen, clear of the message bar that stays at the top while scrolling. */
    private void press(WebElement element) {
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", element);
        element.click();
    }

    private RequestSpecification officer() {
        return given().auth().preemptive().basic("officer", "officer-demo").accept("application/json");
    }

    @Test
    void everyTaskPageOpensOnAPhoneAndADeskWithoutErrors() throws Exception {
        signIn("officer", "officer-demo");
        for (String page : List.of("requests", "transfers", "purchases", "stock")) {
            for (boolean narrow : List.of(true, false)) {
                if (narrow) {
                    phone();
                } else {
                    desk();
                }
                open("/app/officer/" + page + ".html?location=" + DEPOT);
                waitReady();
                assertTrue(driver.findElement(By.tagName("h1")).getText().contains(DEPOT));
                Object overflow = driver.executeScript("return document.documentElement.scrollWidth > document.documentElement.clientWidth");
                assertEquals(Boolean.FALSE, overflow, page + " fits the screen without sideways scrolling");
                screenshot("officer-" + page + (narrow ? "-phone" : "-desk"));
            }
        }
        assertNoPageErrors();
    }

    @Test
    void aCountSheetBooksWhatWasCountedAndABadFileShowsItsRowsAndColumns() throws Exception {
        signIn("officer", "officer-demo");
        open("/app/officer/stock.html?location=" + DEPOT);
        waitReady();
        WebElement first = driver.findElement(By.cssSelector("#count-sheet input[type=number]"));
        String part = first.getDomAttribute("name").substring("count-".length());
        first.sendKeys("7");
        press(driver.findElement(By.cssSelector("#count-sheet button[type=submit]")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("Count booked"));
        List<Map<String, Object>> balances = officer().get(url("/api/stock/balances?location=" + DEPOT)).jsonPath().getList("$");
        assertEquals(7.0, balances.stream().filter(b -> part.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9);

        Path bad = Files.createTempFile("count", ".csv");
        Files.writeString(bad, "location_code,part_number,quantity,counted_on\n" + DEPOT + "," + part + ",-3,2026-12-01\n"
                + DEPOT + ",NO-SUCH-PART,1,2026-12-01\n");
        driver.findElement(By.id("import-file")).sendKeys(bad.toString());
        press(driver.findElement(By.cssSelector("#import-form button[type=submit]")));
        WebElement errors = waitFor(By.cssSelector("#import-form .file-errors"));
        assertTrue(errors.getText().contains("row 2, column quantity"), errors.getText());
        assertTrue(errors.getText().contains("row 3, column part_number"), errors.getText());
        List<Map<String, Object>> after = officer().get(url("/api/stock/balances?location=" + DEPOT)).jsonPath().getList("$");
        assertEquals(7.0, after.stream().filter(b -> part.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9, "a refused file changes nothing");
        screenshot("officer-stock-import-errors");
        Files.delete(bad);
        assertNoPageErrors("HTTP 400 POST " + url("/api/stock/counts/import"), "counts/import - Failed to load resource");
    }

    @Test
    void aPartStockedHereThatHasRunOutIsListedAmongTheBalancesAtNothing() throws Exception {
        OfficerJourneyBrowserTest.forecastRunThroughTheApi(url(""));
        Set<String> listed = officer().get(url("/api/stock/balances?location=" + DEPOT)).jsonPath().<Map<String, Object>>getList("$")
                .stream().map(b -> (String) b.get("partNumber")).collect(Collectors.toSet());
        String sheet = officer().accept("text/csv").get(url("/api/stock/counts/export?location=" + DEPOT)).asString();
        List<String> runOut = sheet.lines().skip(1).map(l -> l.split(",")[1]).filter(p -> !listed.contains(p)).toList();
        assertFalse(runOut.isEmpty(), "the demo depot has parts on its count sheet at 0 that the ledger never listed");
        signIn("officer", "officer-demo");
        open("/app/officer/stock.html?location=" + DEPOT);
        waitReady();
        driver.findElement(By.id("balance-search")).sendKeys(runOut.get(0));
        WebElement row = waitFor(By.cssSelector("#balances tbody tr"));
        assertTrue(row.getText().contains(runOut.get(0)), row.getText());
        assertTrue(row.findElement(By.cssSelector("td[data-label='On hand']")).getText().startsWith("0 "), row.getText());
        assertEquals(0, driver.findElements(By.cssSelector("#balances + .empty")).size(), "not said to match nothing");
        assertNoPageErrors();
    }

    @Test
    void anAlertIsAcknowledgedAndItsPartBoughtThroughThePlanThenReceivedInPart() throws Exception {
        OfficerJourneyBrowserTest.forecastRunThroughTheApi(url(""));
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        data.stock(part, depot, 5);
        signIn("officer", "officer-demo");
        open("/app/officer/?location=" + depot);
        waitReady();
        WebElement row = waitFor(By.cssSelector("#alerts tr.alert-row[data-part='" + part + "']"));
        press(row.findElement(By.cssSelector("button.ack")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("acknowledged"));
        List<Map<String, Object>> alerts = officer().get(url("/api/planning/alerts?location=" + depot)).jsonPath().getList("$");
        assertEquals(Boolean.TRUE, alerts.stream().filter(a -> part.equals(a.get("partNumber"))).findFirst().orElseThrow().get("acknowledged"));

        row = waitFor(By.cssSelector("#alerts tr.alert-row[data-part='" + part + "']"));
        press(row.findElement(By.cssSelector("button.more")));
        WebElement quantity = waitFor(By.id("plan-" + part));
        quantity.clear();
        quantity.sendKeys("30");
        press(driver.findElement(By.xpath("//button[normalize-space()='Put into the purchase plan']")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("is in the purchase plan"));

        open("/app/officer/purchases.html?location=" + depot);
        waitReady();
        WebElement plan = waitFor(By.cssSelector("form[data-supplier='Test Supplier']"));
        // One part is "1 part" (it said "1 parts"), and the pack and the minimum say which is which ("10 pieces, 10 pieces").
        assertEquals("Purchase plan for " + depot + " (1 part)", driver.findElement(By.id("plan-title")).getText());
        assertEquals("packs of 10 pieces; at least 10 pieces",
                plan.findElement(By.cssSelector("td[data-label='Pack, minimum order']")).getText().replace('\n', ' '));
        String orderNumber = TestData.unique("PO").toUpperCase();
        WebElement number = plan.findElement(By.name("orderNumber"));
        number.clear();
        number.sendKeys(orderNumber);
        press(plan.findElement(By.cssSelector("button[type=submit]")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("placed"));
        officer().get(url("/api/purchase-orders/" + orderNumber)).then().statusCode(200)
                .body("destination", org.hamcrest.Matchers.equalTo(depot)).body("lines[0].partNumber", org.hamcrest.Matchers.equalTo(part))
                .body("lines[0].quantityOrdered", org.hamcrest.Matchers.comparesEqualTo(30.0f));

        WebElement order = waitFor(By.cssSelector("form[data-order='" + orderNumber + "']"));
        WebElement arrived = order.findElement(By.cssSelector("input[type=number]"));
        // Nothing entered above 0 books nothing and says so beside the line, not "booked in".
        arrived.clear();
        arrived.sendKeys("0");
        press(order.findElement(By.cssSelector("button.receive-part")));
        WebElement refused = waitFor(By.cssSelector("form[data-order='" + orderNumber + "'] .field-error"));
        assertTrue(refused.getText().contains("more than 0"), refused.getText());
        assertFalse(driver.findElement(By.id("status")).getText().contains("booked in"), driver.findElement(By.id("status")).getText());
        officer().get(url("/api/purchase-orders/" + orderNumber)).then().statusCode(200)
                .body("lines[0].quantityReceived", org.hamcrest.Matchers.comparesEqualTo(0.0f));
        arrived.clear();
        arrived.sendKeys("12");
        press(order.findElement(By.cssSelector("button.receive-part")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("booked in"));
        officer().get(url("/api/purchase-orders/" + orderNumber)).then().statusCode(200)
                .body("lines[0].quantityReceived", org.hamcrest.Matchers.comparesEqualTo(12.0f))
                .body("lines[0].outstanding", org.hamcrest.Matchers.comparesEqualTo(18.0f));
        List<Map<String, Object>> balances = officer().get(url("/api/stock/balances?location=" + depot)).jsonPath().getList("$");
        assertEquals(17.0, balances.stream().filter(b -> part.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9);
        assertNoPageErrors();
    }

    private long raise(String mechanic, String part, int quantity) {
        return given().auth().preemptive().basic(mechanic, mechanic + "-demo").contentType("application/json")
                .body(Map.of("clientRef", TestData.unique("web"), "urgency", "ROUTINE", "lines", List.of(Map.of("partNumber", part, "quantity", quantity))))
                .post(url("/api/requests")).then().statusCode(201).extract().jsonPath().getLong("id");
    }

    @Test
    void requestsAreApprovedInPartWithASubstituteRefusedWithAReasonAndIssuedToTheKit() throws Exception {
        String asked = data.part(UnitOfIssue.EACH);
        String substitute = data.part(UnitOfIssue.EACH);
        given().auth().preemptive().basic("admin", "admin-demo").contentType("application/json")
                .body(Map.of("partNumber", substitute)).post(url("/api/parts/" + asked + "/substitutes")).then().statusCode(200);
        data.stock(substitute, "DEP-TESHVALE", 10);
        long partly = raise("mechanic2", asked, 4);
        long refused = raise("mechanic2", asked, 1);

        signIn("officer", "officer-demo");
        open("/app/officer/requests.html?location=DEP-TESHVALE");
        waitReady();
        WebElement card = waitFor(By.cssSelector("form[data-request-id='" + partly + "']"));
        WebElement quantity = card.findElement(By.cssSelector("input[type=number]"));
        quantity.clear();
        quantity.sendKeys("3");
        new org.openqa.selenium.support.ui.Select(card.findElement(By.tagName("select"))).selectByValue(substitute);
        assertTrue(card.findElement(By.cssSelector("p.message")).getText().contains("approved for drinking-water contact"));
        press(card.findElement(By.cssSelector("button.approve-entered")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("partly approved"));
        assertTrue(driver.findElement(By.id("status")).getText().contains("in contact with drinking water"), "the API's caution is shown");
        officer().get(url("/api/requests/" + partly)).then().statusCode(200)
                .body("status", org.hamcrest.Matchers.equalTo("PARTLY_APPROVED"))
                .body("lines[0].substitute", org.hamcrest.Matchers.equalTo(substitute))
                .body("lines[0].approved", org.hamcrest.Matchers.comparesEqualTo(3.0f));

        WebElement other = waitFor(By.cssSelector("form[data-request-id='" + refused + "']"));
        press(other.findElement(By.cssSelector("button.refuse")));
        WebElement error = waitFor(By.cssSelector("form[data-request-id='" + refused + "'] .field-error"));
        assertTrue(error.getText().length() > 0, "an empty reason is named beside its input");
        other = driver.findElement(By.cssSelector("form[data-request-id='" + refused + "']"));
        other.findElement(By.name("reason")).sendKeys("none in stock this week");
        press(other.findElement(By.cssSelector("button.refuse")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("refused"));
        officer().get(url("/api/requests/" + refused)).then().statusCode(200)
                .body("status", org.hamcrest.Matchers.equalTo("REFUSED"))
                .body("history[-1].reason", org.hamcrest.Matchers.equalTo("none in stock this week"));

        press(waitFor(By.cssSelector("div[data-request-id='" + partly + "'] button.issue")));
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("issued"));
        officer().get(url("/api/requests/" + partly)).then().body("status", org.hamcrest.Matchers.equalTo("ISSUED"));
        List<Map<String, Object>> kit = officer().get(url("/api/stock/balances?location=KIT-M02")).jsonPath().getList("$");
        assertEquals(3.0, kit.stream().filter(b -> substitute.equals(b.get("partNumber")))
                .mapToDouble(b -> ((Number) b.get("onHand")).doubleValue()).sum(), 1e-9);
        screenshot("officer-requests-after");
        assertNoPageErrors("HTTP 400 POST " + url("/api/requests/" + refused + "/refuse"), "/refuse - Failed to load resource");
    }
}
