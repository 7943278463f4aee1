package org.depotcast.pages;

import io.restassured.specification.RequestSpecification;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.access.AccountService;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationRequest;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.BeforeEach;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;

import java.math.BigDecimal;
import java.time.Duration;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A mechanic of the test's own on a 360 px phone: a kit holding 5 seals, one working pump, nothing else (so counts
 * are exact), with the steps the mechanic's browser tests share: open the page, fill its forms, watch the outbox.
 */
abstract class MechanicPhoneSession extends BrowserSession {
    static final String PASSWORD = "kit-and-pumps-1";

    @Inject
    TestData data;
    @Inject
    AccountService accounts;
    @Inject
    LocationService locations;
    @Inject
    StockQueryService stock;

    String depot;
    String mechanic;
    String kit;
    String pump;
    String sealPart;
    String valvePart;

    /** Where the test's depot stands ({latitude, longitude}); null for none on record, as most test depots. */
    BigDecimal[] depotPosition() {
        return null;
    }

    private String depotAt(BigDecimal[] position) {
        String code = TestData.unique("TDEP").toUpperCase();
        data.asSystem(() -> accounts.addLocation("officer", locations.create(new LocationRequest(code, "test depot",
                LocationKind.DEPOT, "CENTRAL", position[0], position[1], null)).id));
        return code;
    }

    @BeforeEach
    void mechanicWithKitAndPump() {
        depot = depotPosition() == null ? data.depot() : depotAt(depotPosition());
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

    RequestSpecification asMechanic() {
        return given().auth().preemptive().basic(mechanic, PASSWORD);
    }

    void openPageOnPhone() {
        phone();
        signIn(mechanic, PASSWORD);
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/app/mechanic/"));
        waitReady();
        wait(Duration.ofSeconds(30)).until(ExpectedConditions.presenceOfElementLocated(By.id("kit-table")));
        // The page's own files are on the phone once its service worker has taken charge of it.
        driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "navigator.serviceWorker.ready.then(() => { const check = () => navigator.serviceWorker.controller"
                + " ? done(true) : setTimeout(check, 50); check(); });");
    }

    /** Nothing wider than the phone: the page scrolls down, never sideways. */
    void assertFitsThePhone() {
        Number width = (Number) driver.executeScript("return document.documentElement.scrollWidth");
        Object wide = driver.executeScript("return [...document.querySelectorAll('body *')].filter(e => e.getBoundingClientRect().right > 361)"
                + ".slice(-3).map(e => e.tagName + '.' + e.className + ' ' + (e.textContent || '').slice(0, 60))");
        assertTrue(width.intValue() <= 360, "the page is " + width + " px wide on a 360 px phone; too wide: " + wide);
    }

    void waitOutbox(int waiting) {
        wait(Duration.ofSeconds(30)).until(d -> String.valueOf(waiting).equals(
                d.findElement(By.tagName("body")).getDomAttribute("data-outbox")));
    }

    /** Scrolls the control to the middle of the phone's screen, then taps it. */
    void press(String css) {
        WebElement control = driver.findElement(By.cssSelector(css));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", control);
        control.click();
    }

    /** Opens a folded part of the page by tapping its heading, as the mechanic would (a no-op when it is open). */
    void openSection(String id) {
        if (driver.findElement(By.id(id)).getDomAttribute("open") == null) {
            press("#" + id + " > summary");
        }
    }

    void choose(String css, String value) {
        new Select(driver.findElement(By.cssSelector(css))).selectByValue(value);
    }

    void type(String css, String text) {
        WebElement input = driver.findElement(By.cssSelector(css));
        input.clear();
        input.sendKeys(text);
    }

    void askForTopUp(String part, int quantity) {
        openSection("ask");
        choose("#ask-form select[name=assetId]", "");
        choose("#ask-form select[data-field='lines[0].partNumber']", part);
        type("#ask-form input[data-field='lines[0].quantity']", String.valueOf(quantity));
        press("#ask-form button[type=submit]");
    }

    void recordFixedRepair(String part, int quantity) {
        openSection("repair");
        choose("#repair-form select[name=assetId]", pump);
        type("#repair-form textarea[name=fault]", "cup seals worn, no water after 40 strokes");
        press("#repair-form div.part-lines + button");
        choose("#repair-form select[data-field='lines[0].partNumber']", part);
        type("#repair-form input[data-field='lines[0].quantity']", String.valueOf(quantity));
        press("#repair-form button[type=submit]");
    }
}
