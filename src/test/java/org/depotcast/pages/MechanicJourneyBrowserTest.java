package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.specification.RequestSpecification;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.access.AccountService;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

import java.math.BigDecimal;
import java.time.Duration;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The area mechanic's day on a phone with no connection: the page and its data stay on the phone, a request and a
 * repair wait in the outbox, and once the connection returns each reaches the server exactly once.
 */
@QuarkusTest
class MechanicJourneyBrowserTest extends BrowserSession {
    private static final String PASSWORD = "kit-and-pumps-1";

    @Inject
    TestData data;
    @Inject
    AccountService accounts;
    @Inject
    LocationService locations;
    @Inject
    StockQueryService stock;

    String mechanic;
    String kit;
    String pump;
    String sealPart;
    String valvePart;

    /** A mechanic of their own: a kit holding 5 seals, one working pump, nothing else, so counts are exact. */
    @BeforeEach
    void mechanicWithKitAndPump() {
        String depot = data.depot();
        mechanic = TestData.unique("mech").toLowerCase();
        kit = data.kit(depot, mechanic);
        data.asSystem(() -> accounts.create(mechanic, PASSWORD, Set.of("mechanic"), locations.require(null, kit).id));
        sealPart = data.part(UnitOfIssue.EACH);
        valvePart = data.part(UnitOfIssue.EACH);
        data.stock(sealPart, kit, 5);
        pump = TestData.unique("MJ").toUpperCase();
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", pump);
        body.put("modelCode", "RB-2");
        body.put("depthM", 35);
        body.put("installedOn", "2022-05-01");
        body.put("depotCode", depot);
        body.put("assignedMechanic", mechanic);
        as("officer").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
    }

    private RequestSpecification asMechanic() {
        return given().auth().preemptive().basic(mechanic, PASSWORD);
    }

    private void openPageOnPhone() {
        phone();
        signIn(mechanic, PASSWORD);
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        waitFor(By.id("kit-table"));
        // The page's own files are on the phone once its service worker has taken charge of it.
        driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "navigator.serviceWorker.ready.then(() => { const check = () => navigator.serviceWorker.controller"
                + " ? done(true) : setTimeout(check, 50); check(); });");
    }

    /** Nothing wider than the phone: the page scrolls down, never sideways. */
    private void assertFitsThePhone() {
        Number width = (Number) driver.executeScript("return document.documentElement.scrollWidth");
        assertTrue(width.intValue() <= 360, "the page is " + width + " px wide on a 360 px phone");
    }

    private void waitOutbox(int waiting) {
        wait(Duration.ofSeconds(30)).until(d -> String.valueOf(waiting).equals(
                d.findElement(By.tagName("body")).getDomAttribute("data-outbox")));
    }


    /** Scrolls the control to the middle of the phone's screen, then taps it. */
    private void press(String css) {
        WebElement control = driver.findElement(By.cssSelector(css));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", control);
        control.click();
    }

    private void choose(String css, String value) {
        new Select(driver.findElement(By.cssSelector(css))).selectByValue(value);
    }

    private void type(String css, String text) {
        WebElement input = driver.findElement(By.cssSelector(css));
        input.clear();
        input.sendKeys(text);
    }

    private void askForTopUp(String part, int quantity) {
        choose("#ask-form select[name=assetId]", "");
        choose("#ask-form select[data-field='lines[0].partNumber']", part);
        type("#ask-form input[data-field='lines[0].quantity']", String.valueOf(quantity));
        press("#ask-form button[type=submit]");
    }

    private void recordFixedRepair(String part, int quantity) {
        choose("#repair-form select[name=assetId]", pump);
        type("#repair-form textarea[name=fault]", "cup seals worn, no water after 40 strokes");
        press("#repair-form div.part-lines + button");
        choose("#repair-form select[data-field='lines[0].partNumber']", part);
        type("#repair-form input[data-field='lines[0].quantity']", String.valueOf(quantity));
        press("#repair-form button[type=submit]");
    }

    @Test
    void offlineRequestAndRepairReachTheServerExactlyOnceWhenTheConnectionReturns() throws Exception {
        openPageOnPhone();
        offline(true);
        // The page opens again with no connection: its files from the phone, its data from the last visit.
        driver.navigate().refresh();
        waitReady();
        assertTrue(driver.findElement(By.id("connection")).getText().startsWith("No connection"));
        assertTrue(driver.findElement(By.id("freshness")).getText().startsWith("Data from the server as of"));

        askForTopUp(valvePart, 3);
        waitOutbox(1);
        recordFixedRepair(sealPart, 2);
        waitOutbox(2);
        assertEquals("2 actions are waiting to send.", driver.findElement(By.id("outbox-count")).getText());
        assertEquals(2, driver.findElements(By.cssSelector("#outbox-list li")).size());
        assertFitsThePhone();
        screenshot("mechanic-offline-outbox");

        offline(false);
        waitOutbox(0);
        wait(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("outbox-body")).getText().contains("Nothing waiting"));
        screenshot("mechanic-back-online");

        List<Map<String, Object>> requests = asMechanic().get("/api/requests").then().statusCode(200).extract().jsonPath().getList("$");
        assertEquals(1, requests.size(), requests.toString());
        assertEquals("RAISED", requests.get(0).get("status"));
        assertEquals(kit, requests.get(0).get("kit"));
        List<Map<String, Object>> repairs = asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("$");
        assertEquals(1, repairs.size(), repairs.toString());
        assertEquals(LocalDate.now().toString(), repairs.get(0).get("fixedOn"));
        assertEquals(true, repairs.get(0).get("ledgerPosted"));
        assertEquals(0, new BigDecimal("3").compareTo(stock.onHand(sealPart, kit)), "5 in the kit, 2 used");
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(valvePart, kit)), "requested, not yet issued");
        // The refreshed page shows the same: 3 seals on hand and the request waiting for approval.
        assertTrue(driver.findElement(By.id("requests-table")).getText().contains("Waiting for approval"));
        assertNoPageErrors();
    }

    @Test
    @SuppressWarnings("unchecked")
    void aResendAfterALostAnswerCountsOnceAndARefusalStaysOnThePhoneInWords() throws Exception {
        openPageOnPhone();
        offline(true);
        askForTopUp(valvePart, 2);
        waitOutbox(1);
        recordFixedRepair(sealPart, 9);
        waitOutbox(2);
        // The request reached the server once already and only its answer was lost: the phone still holds it.
        List<Map<String, Object>> held = (List<Map<String, Object>>) driver.executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                + "import('/app/mechanic/store.js').then(s => s.items()).then(done, e => done(String(e)));");
        Map<String, Object> request = held.stream().filter(i -> "request".equals(i.get("kind"))).findFirst().orElseThrow();
        asMechanic().contentType("application/json").body(request.get("body")).post("/api/requests").then().statusCode(201);

        offline(false);
        waitOutbox(0);
        wait(Duration.ofSeconds(30)).until(d -> "1".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        String message = driver.findElement(By.cssSelector(".outbox__item--refused .outbox__message")).getText();
        assertTrue(message.contains("only 5 of part '" + sealPart + "'") && message.contains("cannot take 9"), message);
        assertTrue(driver.findElement(By.id("outbox-count")).getText().contains("1 refused by the server"));
        screenshot("mechanic-refused-action");

        List<Map<String, Object>> requests = asMechanic().get("/api/requests").then().statusCode(200).extract().jsonPath().getList("$");
        assertEquals(1, requests.size(), "the resend found the first request: " + requests);
        assertEquals(request.get("ref"), requests.get(0).get("clientRef"));
        asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200).body("size()", org.hamcrest.Matchers.equalTo(0));
        assertEquals(0, new BigDecimal("5").compareTo(stock.onHand(sealPart, kit)), "nothing left the kit");

        // The refusal leaves only when the mechanic discards it.
        press(".outbox__item--refused button");
        wait(Duration.ofSeconds(10)).until(d -> "0".equals(d.findElement(By.tagName("body")).getDomAttribute("data-refused")));
        // The one refusal caused on purpose shows in the network events and the browser log; nothing else may fail.
        String repairs = url("/api/repairs");
        assertNoPageErrors("HTTP 422 POST " + repairs,
                repairs + " - Failed to load resource: the server responded with a status of 422");
        assertEquals(1L, pageProblems().stream().filter(p -> p.startsWith("HTTP ")).count(), "only the refused repair failed");
    }
}
