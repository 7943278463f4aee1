package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.StaleElementReferenceException;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The programme lead's day through the pages: run the forecasts and follow the progress bar, read a part's chart,
 * make a budget plan and accept it, run a spend scenario and read its chart. State is checked through the API.
 */
@QuarkusTest
class LeadJourneyBrowserTest extends BrowserSession {

    private String text(By by) {
        return waitFor(by).getText();
    }

    private void runTheForecasts() {
        driver.findElement(By.id("start-run")).click();
        String finished = steady(Duration.ofSeconds(180)).until(d -> {
            String words = d.findElement(By.id("run-progress")).getText();
            return words.contains("finished.") ? words : null;
        });
        JsonPath latest = as("lead").get("/api/forecast/runs?status=DONE&limit=1").then().statusCode(200).extract().jsonPath();
        int runId = latest.getInt("[0].id");
        assertTrue(finished.contains("Forecast run " + runId), finished);
        assertEquals("request", latest.getString("[0].trigger"));
        steady(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("provenance")).getText()
                .contains("forecast run " + runId + ", which finished"));
        assertEquals("finished", driver.findElement(By.cssSelector("#runs tbody tr:first-child td[data-label=State]")).getText());
        assertEquals("lead", driver.findElement(By.cssSelector("#runs tbody tr:first-child td[data-label='Started by']")).getText());
    }

    private void readAPartsChart() {
        new Select(driver.findElement(By.id("part"))).selectByValue("OB-CS-50");
        new Select(driver.findElement(By.id("location"))).selectByValue("DEP-PELLOWDENE");
        driver.findElement(By.cssSelector("#explore-form button[type=submit]")).click();
        steady(Duration.ofSeconds(30)).until(d -> d.findElement(By.cssSelector("#explorer h3")).getText().contains("at DEP-PELLOWDENE"));
        JsonPath api = as("lead").queryParam("location", "DEP-PELLOWDENE").get("/api/forecast/explorer/parts/OB-CS-50")
                .then().statusCode(200).extract().jsonPath();
        WebElement figure = driver.findElement(By.cssSelector("#explorer figure.chart"));
        assertTrue(figure.findElement(By.tagName("svg")).getText().contains("Units a month"), "the y axis says its unit");
        List<WebElement> rows = figure.findElements(By.cssSelector("tbody tr"));
        assertEquals(36 + 24, rows.size(), "three years of history and 24 forecast months");
        List<Map<String, Object>> ranges = api.getList("ranges");
        WebElement firstForecast = rows.get(36);
        assertEquals(text(firstForecast, "95 % range: high"), String.valueOf(Math.round(((Number) ranges.get(0).get("high95")).doubleValue())));
        double mean = ((Number) ranges.get(0).get("mean")).doubleValue();
        assertEquals(oneDecimal(mean), text(firstForecast, "Forecast, breakdowns and services"));
        // The history counts breakdown repairs only: the forecast's breakdown part is drawn beside it and the note
        // says how much of the month is services, so the step where the forecast starts is not read as a jump.
        double breakdowns = api.getDouble("forecast.forecast[0].breakdown");
        double services = api.getDouble("forecast.forecast[0].preventive");
        assertEquals(oneDecimal(breakdowns), text(firstForecast, "Forecast, breakdowns only"));
        assertEquals("–", text(rows.get(35), "Forecast, breakdowns only"));
        assertTrue(figure.getText().contains("Used in breakdown repairs (solid line)")
                && figure.getText().contains("Forecast, breakdowns only (dotted line)"), figure.getText());
        if (services > 0) {
            assertTrue(driver.findElement(By.id("history-note")).getText().contains("next month " + oneDecimal(services) + " of the "
                    + oneDecimal(mean) + " expected are for services"), driver.findElement(By.id("history-note")).getText());
        }
        String method = api.getString("forecast.method");
        String chosenBox = driver.findElement(By.cssSelector("#explorer .method-box")).getText();
        assertTrue(chosenBox.contains("How the method was chosen") && chosenBox.contains("RMSSE"), chosenBox);
        // The held-out scores are for comparison: a lower history score beside "uses the fleet model" is explained first.
        assertTrue(chosenBox.contains("For comparison only: over the last 12 months held out"), chosenBox);
        if ("FLEET".equals(api.getString("forecast.method"))) {
            assertTrue(chosenBox.contains("whichever scored lower on one held-out year. The forecast uses the fleet model"), chosenBox);
        }
        // The rate's reason in words, not the stored figures ("credibility 0.000 for 1928.0 units" before).
        assertTrue(chosenBox.contains("FLEET".equals(method) ? "The forecast uses the fleet model" : "The forecast uses the part's own history"), chosenBox);
        assertFalse(chosenBox.matches("(?s).*credibility \\d.*") || chosenBox.contains("fleet model x"), chosenBox);
        if (!"FLEET".equals(method)) {
            assertTrue(driver.findElements(By.xpath("//div[@class='method-box']//td[@data-label='In use'][normalize-space()='used']")).size() == 1);
        }
        assertTrue(driver.getCurrentUrl().contains("part=OB-CS-50") && driver.getCurrentUrl().contains("location=DEP-PELLOWDENE"));
        PrintedPage.assertPrintsChartAndTable(driver, "#explorer figure.chart", "lead-forecast-printed");
        assertEquals(List.of("pieces", "pieces", "pieces"), unitWords());

        // A part counted in sets says sets in every figure, the expected month too (it said "pieces").
        new Select(driver.findElement(By.id("part"))).selectByValue("OB-OR-SET");
        driver.findElement(By.cssSelector("#explore-form button[type=submit]")).click();
        steady(Duration.ofSeconds(30)).until(d -> d.findElement(By.cssSelector("#explorer h3")).getText().startsWith("OB-OR-SET"));
        assertEquals(List.of("sets", "sets", "sets"), unitWords());
        String axis = driver.findElement(By.cssSelector("#explorer figure.chart svg")).getText();
        assertTrue(axis.contains("Units a month (sets)"), axis);
    }

    private static String oneDecimal(double value) {
        return String.format(java.util.Locale.US, "%,.1f", value).replaceAll("\\.0$", "");
    }

    /** The unit word that ends the expected next month, the expected next 12 months and the 80 % range. */
    private List<String> unitWords() {
        return driver.findElements(By.cssSelector("#explorer dl.figures dd")).subList(1, 4).stream()
                .map(dd -> dd.getText().replaceAll("^.*\\s", "")).toList();
    }

    /** A wait that reads elements afresh when the page has redrawn them meanwhile. */
    private org.openqa.selenium.support.ui.FluentWait<org.openqa.selenium.WebDriver> steady(Duration timeout) {
        return wait(timeout).ignoring(StaleElementReferenceException.class);
    }

    /** Opens another of the lead's pages by its tab, from the top of the page where the tabs are. */
    private void tab(String label) {
        driver.executeScript("window.scrollTo(0, 0)");
        driver.findElement(By.linkText(label)).click();
    }

    private static String text(WebElement row, String column) {
        return row.findElement(By.cssSelector("td[data-label='" + column + "']")).getText();
    }

    /** Full-page pictures at the desk and phone widths, to look at (target/browser-screens/). */
    private void screens(String name) {
        try {
            screenshot(name + "-1280");
            phone();
            screenshot(name + "-360");
            desk();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private void makeAndAcceptABudgetPlan() {
        tab("Budget plan");
        waitReady();
        WebElement budget = driver.findElement(By.id("budget"));
        budget.sendKeys("3000");
        driver.findElement(By.cssSelector("#budget-form button[type=submit]")).click();
        waitFor(By.id("plan-lines"));
        String url = driver.getCurrentUrl();
        assertTrue(url.contains("?plan="), url);
        long planId = Long.parseLong(url.replaceAll(".*\\?plan=", ""));
        JsonPath plan = as("lead").get("/api/planning/purchase-plans/" + planId).then().statusCode(200).extract().jsonPath();
        assertEquals("PROPOSED", plan.getString("status"));
        assertEquals(3000.0, plan.getDouble("budget"), 0);
        int lines = plan.getList("lines").size();
        assertTrue(lines > 0, "the demo's stock leaves parts below their reorder points");
        assertEquals(lines, driver.findElements(By.cssSelector("#plan-lines tbody tr")).size());
        // Positions are the programme's (all stores, kits and on order), not the central store's shelf the board shows.
        assertTrue(driver.findElement(By.cssSelector("#plan-lines thead")).getText().contains("Programme stock position before"));
        assertTrue(driver.findElement(By.id("position-meaning")).getText().contains("the depots and the mechanics' kits hold, plus what is on order"));
        assertEquals(plan.getList("leftOut").size(), driver.findElements(By.cssSelector("#plan-left-out tbody tr")).size());
        // Where each part ends: the plan buys to the reorder point and past it only where a unit saves most, so a
        // part often ends short of its order-up-to level (the empty "Left out" once said every part reached it).
        List<WebElement> after = driver.findElements(By.cssSelector("#plan-lines tbody td[data-label='Position after']"));
        assertEquals(lines, after.size());
        for (int i = 0; i < lines; i++) {
            double position = plan.getDouble("lines[" + i + "].positionBefore") + plan.getDouble("lines[" + i + "].quantity");
            assertEquals(position, Double.parseDouble(after.get(i).getText().replaceAll("[^\\d.]", "")), 1e-9, after.get(i).getText());
        }
        if (plan.getList("leftOut").isEmpty()) {
            assertEquals("Nothing left out: every part that was below its reorder point reaches it with this plan.",
                    driver.findElement(By.cssSelector("#plan-left-out + p.empty")).getText());
        }
        assertEquals(String.format(java.util.Locale.US, "%,.1f pump-days", plan.getDouble("pumpDaysBefore")),
                driver.findElement(By.id("pump-days-before")).getText());
        assertTrue(driver.findElement(By.id("plan")).getText().contains(plan.getString("caution")), "the plan's caution is shown");
        assertEquals("/api/planning/purchase-plans/" + planId + "/export",
                driver.findElement(By.linkText("Download as CSV")).getDomAttribute("href"));
        driver.findElement(By.id("accept")).click();
        waitFor(By.id("accepted"));
        assertEquals("ACCEPTED", as("lead").get("/api/planning/purchase-plans/" + planId).then().statusCode(200)
                .extract().jsonPath().getString("status"));
        List<String> orders = as("lead").get("/api/purchase-orders").then().statusCode(200).extract().jsonPath()
                .getList("orderNumber", String.class).stream().filter(n -> n.startsWith("PP" + planId + "-")).toList();
        assertTrue(!orders.isEmpty(), "accepting places purchase orders");
        assertEquals(orders.size(), driver.findElements(By.cssSelector("#accepted tbody tr")).size());
        assertTrue(driver.findElement(By.id("accept")).getDomAttribute("disabled") != null, "a plan is accepted once");
        // Leaves the programme's stock on order as it found it, for the tests that plan after this one.
        orders.forEach(n -> as("lead").post("/api/purchase-orders/" + n + "/cancel").then().statusCode(200));
    }

    private void runAScenarioAndReadItsChart() {
        tab("Spend");
        waitReady();
        driver.findElement(By.id("new-scenario")).click();
        String name = "more use " + System.nanoTime();
        driver.findElement(By.id("sc-name")).sendKeys(name);
        WebElement horizon = driver.findElement(By.id("sc-horizon"));
        horizon.clear();
        horizon.sendKeys("3");
        driver.findElement(By.id("sc-usage")).sendKeys("10");
        WebElement draws = driver.findElement(By.id("sc-draws"));
        draws.clear();
        draws.sendKeys("2000");
        driver.findElement(By.id("add-installation")).click();
        WebElement count = driver.findElement(By.cssSelector("#installations [data-name=count]"));
        count.clear();
        count.sendKeys("25");
        refusalsAreSaidBesideTheirFieldsInWords(name);
        driver.findElement(By.id("save-scenario")).click();
        steady(Duration.ofSeconds(30)).until(d -> d.findElement(By.id("scenarios")).getText().contains(name));
        JsonPath saved = as("lead").get("/api/spend/scenarios").then().statusCode(200).extract().jsonPath();
        Map<String, Object> scenario = saved.<Map<String, Object>>getList("$").stream().filter(s -> name.equals(s.get("name"))).findFirst().orElseThrow();
        long scenarioId = ((Number) scenario.get("id")).longValue();
        @SuppressWarnings("unchecked")
        Map<String, Object> definition = (Map<String, Object>) scenario.get("definition");
        assertEquals(10.0, ((Number) definition.get("usageChangePercent")).doubleValue(), 0);
        assertEquals(0.95, ((Number) definition.get("serviceLevel")).doubleValue(), 1e-6, "95 typed as per cent"); // a JSON float
        assertEquals(25, ((Number) ((List<Map<String, Object>>) definition.get("installations")).get(0).get("count")).intValue());

        WebElement run = driver.findElement(By.xpath("//button[normalize-space()='Run " + name + "']"));
        // Centred: at the top edge the "saved" message, fixed over the page, takes the click.
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", run);
        run.click();
        waitFor(By.id("spend-progress")).findElement(By.tagName("progress"));
        String total = steady(Duration.ofSeconds(300)).until(d -> {
            List<WebElement> shown = d.findElements(By.id("spend-total"));
            return shown.isEmpty() ? null : shown.get(0).getText();
        });
        JsonPath runs = as("lead").queryParam("scenario", scenarioId).get("/api/spend/runs").then().statusCode(200).extract().jsonPath();
        long runId = runs.getLong("[0].id");
        assertEquals("DONE", runs.getString("[0].status"));
        JsonPath results = as("lead").get("/api/spend/runs/" + runId + "/results").then().statusCode(200).extract().jsonPath();
        List<Map<String, Object>> years = results.getList("years");
        WebElement fan = driver.findElement(By.cssSelector("#results figure.chart"));
        assertTrue(fan.findElement(By.tagName("svg")).getText().contains("Spend a year (" + results.getString("currency") + ")"));
        List<WebElement> rows = fan.findElements(By.cssSelector("tbody tr"));
        assertEquals(years.size(), rows.size());
        @SuppressWarnings("unchecked")
        double firstMean = ((Number) ((Map<String, Object>) years.get(0).get("total")).get("mean")).doubleValue();
        String currency = results.getString("currency");
        assertEquals(currency + " " + String.format(java.util.Locale.US, "%,d", Math.round(firstMean)),
                text(rows.get(0), "Expected (mean)").replace('\u00a0', ' '));
        // One rule for the projection's money: the currency, thousands separators, whole units (a range names the
        // currency once), in the chart's table, the totals and both breakdowns alike.
        String amount = "\\d{1,3}(,\\d{3})*";
        String money = currency + " " + amount + "( – " + amount + ")?";
        assertTrue(total.replace('\u00a0', ' ').matches(money), total);
        for (WebElement cell : driver.findElements(By.cssSelector("#results tbody td.num"))) {
            String shown = cell.getText().replace('\u00a0', ' ');
            assertTrue(shown.matches(money) || shown.equals("–"), "money as the rule says: " + shown);
        }
        // The central store's spend is the first period's stock-up only, and the page says why.
        List<WebElement> central = driver.findElements(By.xpath("//table[@id='spend-depots']//tbody/tr[td[1][normalize-space()='CENTRAL']]/td"));
        assertTrue(central.size() > 2, "the depot table has the central store's row");
        assertEquals(currency + " 0", central.get(2).getText().replace('\u00a0', ' '), "nothing at the central store after the first period");
        // The run's notes say how the stock-up is counted, once; the page adds only how the budget plan differs.
        String said = text(By.id("results"));
        assertFalse(said.contains("The central store buys once"), said);
        assertEquals(1, said.split("bought once by the central store", -1).length - 1, said);
        assertTrue(text(By.id("spend-notes")).contains("counted at the depot whose pumps use them"));
        // The stock-up here and the budget plan's lines differ by the packs only, and the note says so.
        assertTrue(text(By.id("central-store-note")).contains("The budget plan buys the same stock-up in whole packs"));
        // Periods go by their dates, the first (months left in the financial year) holding the stock-up.
        String firstMonths = (String) years.get(0).get("months");
        String lastMonths = (String) years.get(years.size() - 1).get("months");
        String span = text(By.id("spend-span"));
        assertTrue(span.startsWith("Expected parts spend from " + firstMonths.split(" – ")[0] + " to "
                + lastMonths.split(" – ")[lastMonths.split(" – ").length - 1] + ": "), span);
        assertTrue(span.contains("The first period, " + firstMonths + ", holds the central store's one-time stock-up"), span);
        assertFalse(span.contains("over the " + years.size() + " periods"), span);
        // Component families as the trade writes them, never "o ring".
        List<String> families = driver.findElements(By.cssSelector("#spend-families tbody tr td:first-child")).stream()
                .map(WebElement::getText).toList();
        assertTrue(families.contains("Cup seal") && families.contains("O-ring"), families.toString());
        assertTrue(families.stream().allMatch(f -> f.matches("[A-Z].*") && !f.contains("_")), families.toString());
        assertEquals("/api/spend/runs/" + runId + "/report", driver.findElement(By.linkText("Printable report")).getDomAttribute("href"));
        assertTrue(driver.getCurrentUrl().endsWith("?run=" + runId));
        PrintedPage.assertPrintsChartAndTable(driver, "#results figure.chart", "lead-spend-printed");
        comparesReopensAndBackChecks(name);
    }

    /** The page's other parts: finished runs side by side, a saved scenario opened again as saved, the back-check. */
    private void comparesReopensAndBackChecks(String name) {
        WebElement compare = driver.findElement(By.cssSelector("#compare-form button[type=submit]"));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", compare);
        compare.click();
        assertTrue(waitFor(By.id("compare-table")).getText().contains(name));
        WebElement edit = driver.findElement(By.xpath("//button[normalize-space()='Edit " + name + "']"));
        driver.executeScript("arguments[0].scrollIntoView({block: 'center'})", edit);
        edit.click();
        assertEquals(name, driver.findElement(By.id("sc-name")).getDomProperty("value"));
        assertEquals("95", driver.findElement(By.id("sc-level")).getDomProperty("value"), "the fraction shown per cent");
        assertEquals(1, driver.findElements(By.cssSelector("#installations .installation-row")).size());
        driver.findElement(By.id("close-editor")).click();
        String backCheck = steady(Duration.ofSeconds(60)).until(d -> {
            String shown = d.findElement(By.id("back-check")).getText();
            return shown.contains("Working out") ? null : shown;
        });
        assertFalse(backCheck.contains("is not defined") || backCheck.contains("is not a function"), backCheck);
    }

    /**
     * A currency the API refuses, then a service level typed as a fraction (0.2 would be a 20 % level): each refusal
     * is said beside its input, the top line says it in words (no field names), nothing is saved; leaves 95 %.
     */
    private void refusalsAreSaidBesideTheirFieldsInWords(String name) {
        WebElement currency = driver.findElement(By.id("sc-currency"));
        currency.sendKeys("EU");
        driver.findElement(By.id("save-scenario")).click();
        assertTrue(waitFor(By.cssSelector("#sc-currency + .field-error")).getText().contains("three-letter"));
        String top = text(By.id("status"));
        assertTrue(top.contains("The scenario was not saved") && !top.contains("currency:"), top);
        currency.clear();
        WebElement level = driver.findElement(By.id("sc-level"));
        level.sendKeys("0.2");
        driver.findElement(By.id("save-scenario")).click();
        steady(Duration.ofSeconds(20)).until(d -> d.findElements(By.cssSelector("#sc-level + .field-error")).stream()
                .anyMatch(e -> e.getText().contains("per cent, from 50 to 99.9")));
        top = text(By.id("status"));
        assertTrue(top.contains("The scenario was not saved") && !top.contains("serviceLevel"), top);
        assertFalse(as("lead").get("/api/spend/scenarios").then().statusCode(200).extract().asString().contains(name),
                "a refused scenario is not saved");
        level.clear();
        level.sendKeys("95");
    }

    @Test
    void theLeadRunsTheForecastsReadsAChartPlansABudgetAndProjectsSpend() {
        signIn("lead", "lead-demo");
        assertTrue(driver.getCurrentUrl().endsWith("/app/lead/"), driver.getCurrentUrl());
        waitReady();
        runTheForecasts();
        readAPartsChart();
        screens("lead-forecasts");
        makeAndAcceptABudgetPlan();
        screens("lead-budget");
        runAScenarioAndReadItsChart();
        screens("lead-spend");
        // The one refusal the API answered (the currency), on purpose.
        String scenarios = url("/api/spend/scenarios");
        assertNoPageErrors("HTTP 400 POST " + scenarios,
                scenarios + " - Failed to load resource: the server responded with a status of 400");
    }
}
