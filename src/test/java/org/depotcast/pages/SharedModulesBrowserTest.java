package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The shared page modules in a real browser: number and date formats, the SVG charts with their tables, 401 handling. */
@QuarkusTest
class SharedModulesBrowserTest extends BrowserSession {

    @SuppressWarnings("unchecked")
    private Map<String, Object> inPage(String module, String body) {
        open("/sign-in.html");
        return (Map<String, Object>) driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "import('" + module + "').then(m => { " + body + " }).catch(e => done({error: String(e)}));");
    }

    @Test
    void formatsGiveWholePiecesMoneyWithSeparatorsAndNoNegativeZero() {
        driver.executeCdpCommand("Emulation.setLocaleOverride", Map.of("locale", "en-US"));
        Map<String, Object> out = inPage("/app/js/format.js", "done({pieces: m.qty(2.6, 'EACH'), one: m.qty(1, 'SET'),"
                + " metres: m.qty(12.345, 'METRE'), money: m.money(1250, 'USD'), zero: m.num(-0.2), big: m.num(1234567.891, 1),"
                + " none: m.qty(null, 'EACH'), day: m.date('2026-11-03'), pct: m.percent(0.953),"
                + " days: m.pumpDays(21), manyDays: m.pumpDays(1234.56), noDays: m.pumpDays(-0.01),"
                + " forPump: m.requestFor({assetId: 'MJ-1', urgency: 'PUMP_DOWN'}), topUp: m.requestFor({urgency: 'ROUTINE'}),"
                + " downNoPump: m.requestFor({assetId: null, urgency: 'PUMP_DOWN'})});");
        assertEquals("3 pieces", out.get("pieces"));
        assertEquals("1 set", out.get("one"));
        assertEquals("12.35 m", out.get("metres"));
        assertEquals("USD 1,250.00", out.get("money").toString().replace('\u00a0', ' '));
        assertEquals("0", out.get("zero"));
        assertEquals("1,234,567.9", out.get("big"));
        assertEquals("–", out.get("none"));
        assertEquals("Nov 3, 2026", out.get("day"), "a calendar date stays that day in every time zone");
        assertEquals("95.3 %", out.get("pct"));
        assertEquals("21.0", out.get("days"), "pump-days always keep their one decimal");
        assertEquals("1,234.6", out.get("manyDays"));
        assertEquals("0.0", out.get("noDays"));
        assertEquals("Pump MJ-1", out.get("forPump"));
        assertEquals("Kit top-up", out.get("topUp"));
        assertEquals("Pump down, no pump named", out.get("downNoPump"), "a pump-down request from before one named its pump");
        assertNoPageErrors();
    }

    @Test
    void chartsDrawLabelledAxesALegendInWordsAndTheSameNumbersAsATable() {
        Map<String, Object> out = inPage("/app/js/chart.js", """
                const fig = m.lineChart({title: 'Cup seals a month', x: ['Jan', 'Feb', 'Mar', 'Apr'], xLabel: 'Month',
                    yLabel: 'Units a month', series: [{name: 'History', values: [3, 5, null, null]},
                    {name: 'Forecast', values: [null, 5, 4, 6], dashed: true}],
                    bands: [{name: '80 % range', level: 80, lower: [null, 5, 2, 3], upper: [null, 5, 6, 9]},
                            {name: '95 % range', level: 95, lower: [null, 5, 1, 2], upper: [null, 5, 8, 11]}],
                    marker: {at: 1, label: 'forecast starts'}});
                const bars = m.barChart({title: 'Spend a year', x: ['2027', '2028'], xLabel: 'Year', yLabel: 'USD',
                    series: [{name: 'Planned', values: [1200, 1500]}, {name: 'Actual', values: [1100, null]}]});
                document.body.append(fig, bars);
                done({figures: document.querySelectorAll('figure.chart').length,
                      axisText: [...fig.querySelectorAll('svg text')].map(t => t.textContent),
                      legend: [...fig.querySelectorAll('.chart-legend li')].map(li => li.textContent),
                      rows: fig.querySelectorAll('tbody tr').length, headers: [...fig.querySelectorAll('th')].map(t => t.textContent),
                      bands: fig.querySelectorAll('polygon').length, lines: fig.querySelectorAll('path').length,
                      bars: bars.querySelectorAll('svg rect[height]').length, barCells: [...bars.querySelectorAll('tbody td')].map(t => t.textContent)});
                """);
        assertEquals(2L, out.get("figures"), String.valueOf(out.get("error")));
        List<?> axis = (List<?>) out.get("axisText");
        assertTrue(axis.contains("Units a month") && axis.contains("Month") && axis.contains("forecast starts"), axis.toString());
        assertEquals(List.of("History (solid line)", "Forecast (dashed line)", "95 % range (lighter band)", "80 % range (darker band)"),
                out.get("legend"));
        assertEquals(4L, out.get("rows"));
        assertEquals(List.of("Month", "History", "Forecast", "95 % range: low", "95 % range: high", "80 % range: low",
                "80 % range: high"), out.get("headers"));
        assertEquals(2L, out.get("bands"));
        assertEquals(2L, out.get("lines"));
        assertEquals(List.of("2027", "1,200", "1,100", "2028", "1,500", "–"), out.get("barCells"));
        assertNoPageErrors();
    }

    @Test
    void aPageOpenedWithoutSignInGoesToTheSignInPageAndComesBackAfterwards() {
        open("/app/mechanic/");
        wait(Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/sign-in.html"));
        assertTrue(driver.getCurrentUrl().contains("next=%2Fapp%2Fmechanic%2F"), driver.getCurrentUrl());
        assertTrue(!driver.getCurrentUrl().contains("expired"), "never signed in here: no 'session ended' message");
        List<String> problems = pageProblems();
        assertTrue(problems.stream().allMatch(p -> p.contains("401") && p.contains("/api/me")), problems.toString());
        WebElement form = driver.findElement(By.tagName("form"));
        assertTrue(form.isDisplayed());
    }
}
