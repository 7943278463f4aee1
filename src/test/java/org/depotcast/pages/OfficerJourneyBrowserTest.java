package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The stores officer's day through the pages: the morning board of a depot shows the API's alerts in the API's
 * order, a mechanic's request is approved, a suggested transfer is dispatched; the state is then read back
 * through the API. A depot officer sees only their own depot.
 */
@QuarkusTest
class OfficerJourneyBrowserTest extends BrowserSession {
    private static final String DEPOT = "DEP-TESHVALE";

    private RequestSpecification as(String account) {
        return given().auth().preemptive().basic(account, account + "-demo").accept("application/json");
    }

    @BeforeEach
    void forecastRun() throws InterruptedException {
        forecastRunThroughTheApi(url(""));
    }

    /** The board's numbers come from a finished forecast run; starts one through the API when there is none. */
    static void forecastRunThroughTheApi(String server) throws InterruptedException {
        RequestSpecification lead = given().auth().preemptive().basic("lead", "lead-demo").accept("application/json");
        if (!lead.get(server + "/api/forecast/runs?status=DONE&planning=true&limit=1").jsonPath().getList("$").isEmpty()) {
            return;
        }
        long id = lead.post(server + "/api/forecast/runs").then().statusCode(202).extract().jsonPath().getLong("id");
        for (int i = 0; i < 240; i++) {
            String status = lead.get(server + "/api/forecast/runs/" + id).jsonPath().getString("status");
            if (!"RUNNING".equals(status)) {
                assertEquals("DONE", status);
                return;
            }
            Thread.sleep(500);
        }
        throw new AssertionError("the forecast run did not finish in two minutes");
    }

    private List<String> boardParts() {
        return driver.findElements(By.cssSelector("#alerts tbody tr.alert-row")).stream()
                .map(tr -> tr.getDomAttribute("data-part")).toList();
    }

    @Test
    void theOfficerReadsTheBoardApprovesARequestAndDispatchesATransfer() throws Exception {
        long requestId = as("mechanic1").contentType("application/json")
                .body(Map.of("clientRef", "journey-" + UUID.randomUUID(), "urgency", "ROUTINE",
                        "lines", List.of(Map.of("partNumber", "OB-CS-50", "quantity", 2))))
                .post(url("/api/requests")).then().statusCode(201).extract().jsonPath().getLong("id");

        signIn("officer", "officer-demo");
        open("/app/officer/?location=" + DEPOT);
        waitReady();
        List<String> api = as("officer").get(url("/api/planning/alerts?location=" + DEPOT)).then().statusCode(200)
                .extract().jsonPath().getList("partNumber", String.class);
        assertFalse(api.isEmpty(), "the demo depot has alerts after a forecast run");
        List<String> board = boardParts();
        assertEquals(api.subList(0, Math.min(5, api.size())), board.subList(0, Math.min(5, board.size())),
                "the board's top alerts are the API's, in its order");
        assertEquals(api.size(), board.size());
        String firstRow = driver.findElement(By.cssSelector("#alerts tbody tr.alert-row")).getText();
        JsonPath top = as("officer").get(url("/api/planning/alerts?location=" + DEPOT)).jsonPath();
        assertTrue(firstRow.contains(top.getString("[0].partNumber")), firstRow);
        Object fits = driver.executeScript("const t = document.getElementById('alerts'); return t.scrollWidth <= t.parentElement.clientWidth + 1;");
        assertEquals(Boolean.TRUE, fits, "every column of the board shows on a 1280 px screen");
        // Pump-days keep one decimal on every row (a whole 21 showed as "21" beside "261.4") and in the summary.
        List<WebElement> days = driver.findElements(By.cssSelector("#alerts tbody tr.alert-row td[data-label='Pump-days without water']"));
        List<Number> apiDays = top.getList("pumpDaysAtRisk");
        assertEquals(apiDays.size(), days.size());
        for (int i = 0; i < days.size(); i++) {
            String shown = days.get(i).getText();
            assertTrue(shown.matches("\\d{1,3}(,\\d{3})*\\.\\d"), "one decimal: " + shown);
            assertEquals(apiDays.get(i).doubleValue(), Double.parseDouble(shown.replace(",", "")), 0.05, shown);
        }
        // The demand over the protection period in words ("Lead-time demand" before), a small average with its
        // decimal (0.3 showed as "0" beside a reorder point of 2).
        Map<String, Map<String, Object>> policies = new java.util.HashMap<>();
        as("officer").get(url("/api/planning/policies?location=" + DEPOT)).jsonPath().<Map<String, Object>>getList("$")
                .forEach(p -> policies.put((String) p.get("partNumber"), p));
        List<WebElement> use = driver.findElements(By.cssSelector("#alerts tbody tr.alert-row td[data-label='Expected use']"));
        assertEquals(api.size(), use.size());
        int noForecast = 0;
        for (int i = 0; i < use.size(); i++) {
            Map<String, Object> policy = policies.get(api.get(i));
            if ("no forecast".equals(top.getString("[" + i + "].forecastMethod"))) {
                // Demand unknown, not zero: no use, reorder point or order-up-to is given (they showed 0, 0 and 1).
                WebElement row = driver.findElement(By.cssSelector("#alerts tr.alert-row[data-part='" + api.get(i) + "']"));
                for (String column : List.of("Expected use", "Reorder point", "Order up to")) {
                    assertEquals("–", row.findElement(By.cssSelector("td[data-label='" + column + "']")).getText(), column);
                }
                noForecast++;
                continue;
            }
            if (policy == null) {
                continue;
            }
            double mean = ((Number) policy.get("demandMean")).doubleValue();
            String[] lines = use.get(i).getText().split("\n");
            assertEquals(mean, Double.parseDouble(lines[0].replace(",", "")), mean < 10 ? 0.051 : 0.51, use.get(i).getText());
            assertEquals("over the next " + ((Number) policy.get("protectionDays")).intValue() + " days", lines[1]);
        }
        assertTrue(noForecast > 0, "the demo depot holds grease that no forecast covers");
        String summary = driver.findElement(By.cssSelector(".board-summary")).getText();
        assertTrue(summary.matches("(?s).*Expected pump-days without water\\n\\d{1,3}(,\\d{3})*\\.\\d\\n.*"), summary);
        screenshot("officer-board-desk");
        // An alert's details say its forecast method in words (the API sends a code such as FLEET) and the demand a
        // day with the part's unit.
        WebElement more = driver.findElement(By.cssSelector("#alerts tbody tr.alert-row button.more"));
        // Each row's buttons say which part they act on to a screen reader (every row has the same visible words).
        String firstPart = top.getString("[0].partNumber");
        // An alert already acknowledged (by an earlier test in the suite, say) has no Acknowledge button.
        WebElement ackRow = driver.findElements(By.cssSelector("#alerts tbody tr.alert-row")).stream()
                .filter(tr -> !tr.findElements(By.cssSelector("button.ack")).isEmpty()).findFirst().orElseThrow();
        assertEquals("Acknowledge the alert for " + ackRow.getDomAttribute("data-part"),
                ackRow.findElement(By.cssSelector("button.ack")).getAccessibleName());
        assertEquals("Details, snooze, transfer, buy for " + firstPart, more.getAccessibleName());
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", more);
        more.click();
        String details = wait(Duration.ofSeconds(10)).until(d -> d.findElement(By.id("details-0")).getText());
        String method = top.getString("[0].forecastMethod");
        assertTrue(details.contains("Forecast method\n" + methodWords(method)), details);
        assertTrue(details.matches("(?s).*Demand a day\n[0-9.,]+ (pieces|sets|pairs|lengths|m|kg|L)\n.*"), details);
        // Acknowledging redraws the board: the row says so in words and keeps only its details button (the
        // missing Acknowledge button was written as the word "null").
        String acknowledged = ackRow.getDomAttribute("data-part");
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", ackRow.findElement(By.cssSelector("button.ack")));
        ackRow.findElement(By.cssSelector("button.ack")).click();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText()
                .contains("Alert for " + acknowledged + " acknowledged until the next review"));
        WebElement done = driver.findElement(By.cssSelector("#alerts tr.alert-row[data-part='" + acknowledged + "']"));
        assertTrue(done.findElement(By.cssSelector("td[data-label=Why]")).getText().contains("Acknowledged"), done.getText());
        String actions = done.findElement(By.cssSelector("td[data-label=Actions]")).getText();
        assertTrue(actions.startsWith("Details, snooze, transfer, buy"), actions);
        assertFalse(actions.contains("null") || actions.contains("Acknowledge"), actions);
        driver.findElement(By.cssSelector("#status .message button")).click();
        driver.executeScript("window.scrollTo(0, 0)");

        driver.findElement(By.linkText("Requests")).click();
        waitReady();
        WebElement card = waitFor(By.cssSelector("form[data-request-id='" + requestId + "']"));
        card.findElement(By.cssSelector("button.approve-full")).click();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("Request " + requestId + " approved in full"));
        JsonPath approved = as("officer").get(url("/api/requests/" + requestId)).jsonPath();
        assertEquals("APPROVED", approved.getString("status"));
        assertEquals(2.0, approved.getDouble("lines[0].approved"), 1e-9);
        assertEquals("officer", approved.getString("history[-1].actor"));

        driver.findElement(By.linkText("Transfers")).click();
        waitReady();
        WebElement dispatch = waitFor(By.cssSelector("#suggestions button.dispatch"));
        String part = dispatch.getDomAttribute("data-part");
        String from = dispatch.getDomAttribute("data-from");
        String to = dispatch.getDomAttribute("data-to");
        double quantity = Double.parseDouble(dispatch.getDomAttribute("data-quantity"));
        assertEquals("Dispatch " + part + " from " + from + " to " + to, dispatch.getAccessibleName());
        // The table weighs moves by their transport cost, so it shows it: the lane's cost a unit times the quantity.
        Map<String, Object> suggested = as("officer").get(url("/api/planning/transfers/suggestions")).jsonPath()
                .param("p", part).param("f", from).param("t", to)
                .get("find { it.partNumber == p && it.from == f && it.to == t }");
        double cost = quantity * ((Number) suggested.get("unitCost")).doubleValue();
        String shown = dispatch.findElement(By.xpath("ancestor::tr/td[@data-label='Transport cost']")).getText().replace('\u00a0', ' ');
        assertTrue(shown.matches("USD [\\d,]+\\.\\d\\d"), shown);
        assertEquals(cost, Double.parseDouble(shown.replaceAll("[^\\d.]", "")), 0.006, shown);
        double fromBefore = onHand(from, part);
        int inTransitBefore = inTransit(from, to, part).size();
        dispatch.click();
        wait(Duration.ofSeconds(20)).until(d -> d.findElement(By.id("status")).getText().contains("dispatched"));
        List<Map<String, Object>> moving = inTransit(from, to, part);
        assertEquals(inTransitBefore + 1, moving.size(), "exactly one new transfer");
        assertEquals(quantity, ((Number) moving.get(0).get("quantity")).doubleValue(), 1e-9);
        assertEquals("officer", moving.get(0).get("actor"));
        assertEquals(fromBefore - quantity, onHand(from, part), 1e-9, "the stock left the sending store");
        assertNoPageErrors();
    }

    @Test
    void theBoardSaysWhenAWaitingPumpsPartIsOnTheShelfAndWhatItsPumpDaysSpan() throws Exception {
        // The demo's Marrowford depot holds 50 rod centralisers while a pump waits 9 days for one: the officer read
        // "More than needed" beside a waiting pump, with nothing saying the part was short in the kit, not here.
        String depot = "DEP-MARROWFORD";
        signIn("officer", "officer-demo");
        open("/app/officer/?location=" + depot);
        waitReady();
        List<Map<String, Object>> alerts = as("officer").get(url("/api/planning/alerts?location=" + depot)).then()
                .statusCode(200).extract().jsonPath().getList("$");
        int onShelf = 0;
        for (Map<String, Object> a : alerts) {
            String cell = driver.findElement(By.cssSelector("#alerts tr.alert-row[data-part='" + a.get("partNumber")
                    + "'] td[data-label='Pumps waiting']")).getText();
            double spare = ((Number) a.get("onHand")).doubleValue() - ((Number) a.get("committed")).doubleValue();
            boolean waiting = !((List<?>) a.get("waitingPumps")).isEmpty();
            assertEquals(waiting && spare > 0, cell.contains("on the shelf here and not promised: the pump waits on its "
                    + "mechanic's kit, not on this store"), a.get("partNumber") + ": " + cell);
            onShelf += waiting && spare > 0 ? 1 : 0;
        }
        assertTrue(onShelf > 0, "the demo depot has a pump waiting for a part on its shelf");
        assertTrue(driver.findElement(By.id("pump-days-meaning")).getText()
                .contains("until it is next resupplied here (the days under \"Expected use\")"));
        assertFalse(driver.findElements(By.cssSelector("#alerts thead th")).stream()
                .noneMatch(th -> th.getText().replace('\n', ' ').equals("On order or on the way")), "the depot's on order counts transfers");
        // What is on order says when it comes: the demo's rods for Marrowford are on an order due in March, while a
        // pump waits for one and the board said "More than needed" (the 30 on order) with nothing else.
        Map<String, String> firstDue = new java.util.HashMap<>();
        List<Map<String, Object>> orders = as("officer").get(url("/api/purchase-orders?status=OPEN")).then()
                .statusCode(200).extract().jsonPath().getList("$");
        for (Map<String, Object> o : orders) {
            for (Map<String, Object> line : (List<Map<String, Object>>) o.get("lines")) {
                if (depot.equals(o.get("destination")) && ((Number) line.get("outstanding")).doubleValue() > 0
                        && o.get("expectedOn") != null) {
                    firstDue.merge((String) line.get("partNumber"), (String) o.get("expectedOn"),
                            (x, y) -> x.compareTo(y) <= 0 ? x : y);
                }
            }
        }
        int said = 0, toldToWait = 0;
        for (Map<String, Object> a : alerts) {
            String part = (String) a.get("partNumber");
            String row = "#alerts tr.alert-row[data-part='" + part + "'] ";
            List<WebElement> due = driver.findElements(By.cssSelector(row + "td[data-label='On order or on the way'] .arrival"));
            if (firstDue.containsKey(part)) {
                assertEquals(firstDue.get(part), due.get(0).getAttribute("data-due"), part);
                assertTrue(due.get(0).getText().startsWith("first due "), part + ": " + due.get(0).getText());
                said++;
                double spare = ((Number) a.get("onHand")).doubleValue() - ((Number) a.get("committed")).doubleValue();
                if (!((List<?>) a.get("waitingPumps")).isEmpty() && spare <= 0) {
                    String waits = driver.findElement(By.cssSelector(row + "td[data-label='Pumps waiting']")).getText();
                    assertTrue(waits.replace('\n', ' ').contains("none here to give; what is on order: first due "),
                            part + ": " + waits);
                    toldToWait++;
                }
            }
        }
        assertTrue(said > 0 && toldToWait > 0, "the demo depot has parts on order, one a pump waits for: " + said + ", "
                + toldToWait);
        screenshot("officer-board-marrowford");
        assertNoPageErrors();
    }

    /** The words the pages use for a method (app/js/methods.js), for the methods the demo's alerts come from. */
    private static String methodWords(String method) {
        return switch (method) {
            case "FLEET" -> "fleet model (breakdown rate of the installed pumps)";
            case "SBA" -> "SBA (Croston, bias-corrected)";
            case "TSB" -> "TSB (Teunter–Syntetos–Babai)";
            case "SES" -> "simple exponential smoothing";
            case "POISSON" -> "Poisson mean";
            case "MEAN12" -> "mean of the last 12 months";
            case "COMBINED" -> "combination (the middle value of SBA, TSB, smoothing, Poisson mean and 12-month mean)";
            default -> method.toLowerCase(java.util.Locale.ROOT);
        };
    }

    private double onHand(String location, String part) {
        List<Map<String, Object>> rows = as("officer").get(url("/api/stock/balances?location=" + location)).jsonPath().getList("$");
        return rows.stream().filter(r -> part.equals(r.get("partNumber"))).mapToDouble(r -> ((Number) r.get("onHand")).doubleValue())
                .sum();
    }

    private List<Map<String, Object>> inTransit(String from, String to, String part) {
        List<Map<String, Object>> rows = as("officer").get(url("/api/planning/transfers?state=IN_TRANSIT&from=" + from + "&to=" + to))
                .then().statusCode(200).extract().jsonPath().getList("$");
        return rows.stream().filter(r -> part.equals(r.get("partNumber")))
                .sorted((a, b) -> Long.compare(((Number) b.get("id")).longValue(), ((Number) a.get("id")).longValue())).toList();
    }

    @Test
    void aDepotOfficerSeesOnlyTheirDepotOnAPhone() throws Exception {
        signIn("officer2", "officer2-demo");
        phone();
        open("/app/officer/?location=" + DEPOT);
        waitReady();
        String heading = driver.findElement(By.tagName("h1")).getText();
        assertTrue(heading.contains("DEP-PELLOWDENE") && !heading.contains(DEPOT), heading);
        assertTrue(driver.findElements(By.id("store")).isEmpty(), "one store: no store picker");
        // The store asked for in the address is not theirs: the page says so in words instead of silently showing another.
        assertEquals(DEPOT + " is not one of your stores, so Pellowdene Flats district depot (DEP-PELLOWDENE) is shown. "
                + "If you need " + DEPOT + ", ask the programme's administrator to assign it to your account.",
                driver.findElement(By.id("store-not-yours")).getText());
        List<String> api = as("officer2").get(url("/api/planning/alerts?location=DEP-PELLOWDENE")).then().statusCode(200)
                .extract().jsonPath().getList("partNumber", String.class);
        assertFalse(api.isEmpty());
        assertEquals(api, boardParts());
        as("officer2").get(url("/api/planning/alerts?location=" + DEPOT)).then().statusCode(403);
        screenshot("officer2-board-phone");
        assertNoPageErrors();
    }
}
