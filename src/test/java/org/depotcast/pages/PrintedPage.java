package org.depotcast.pages;

import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A page as the printer gets it: print media emulated through DevTools ({@code Emulation.setEmulatedMedia}) to see
 * what the print stylesheet shows and hides, and Chromium's own print to PDF ({@code Page.printToPDF}).
 */
final class PrintedPage {
    private static final Pattern PAGE = Pattern.compile("/Type\\s*/Page[^s]");

    private PrintedPage() {
    }

    /**
     * Under print media the chart in {@code figureCss} and its table show in full (no scroll box), its axis text is
     * at least 12 px, and the top bar, tabs and every button are hidden. Then the page prints to a PDF of at least
     * one sheet, kept as target/browser-screens/{@code name}.pdf to look at. Returns the number of sheets.
     */
    static int assertPrintsChartAndTable(ChromeDriver driver, String figureCss, String name) {
        driver.executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", "print"));
        try {
            WebElement figure = driver.findElement(By.cssSelector(figureCss));
            assertTrue(figure.findElement(By.tagName("svg")).isDisplayed(), "the chart prints");
            WebElement tableBox = figure.findElement(By.cssSelector(".table-wrap"));
            assertTrue(tableBox.findElement(By.tagName("table")).isDisplayed(), "the chart's table prints");
            assertEquals("visible", tableBox.getCssValue("overflow-y"), "the whole table prints, not a scroll box");
            assertEquals("table-row", figure.findElement(By.cssSelector("tbody tr")).getCssValue("display"),
                    "rows print as table rows, not as the phone's stacked lines");
            double axis = Double.parseDouble(figure.findElement(By.cssSelector("text.chart-axis, .chart-axis text"))
                    .getCssValue("font-size").replace("px", ""));
            assertTrue(axis >= 12, "axis text prints at " + axis + " px");
            assertFalse(driver.findElement(By.cssSelector(".topbar")).isDisplayed(), "the top bar does not print");
            List<WebElement> shownButtons = driver.findElements(By.tagName("button")).stream().filter(WebElement::isDisplayed).toList();
            assertTrue(shownButtons.isEmpty(), "buttons do not print: " + shownButtons.stream().map(WebElement::getText).toList());
            driver.findElements(By.cssSelector(".tabs")).forEach(t -> assertFalse(t.isDisplayed(), "the tabs do not print"));
            Map<String, Object> pdf = driver.executeCdpCommand("Page.printToPDF", Map.of("printBackground", false));
            byte[] bytes = Base64.getDecoder().decode((String) pdf.get("data"));
            Path file = Path.of("target", "browser-screens", name + ".pdf");
            Files.createDirectories(file.getParent());
            Files.write(file, bytes);
            String text = new String(bytes, StandardCharsets.ISO_8859_1);
            assertTrue(text.startsWith("%PDF-"), "Chromium printed a PDF");
            Matcher pages = PAGE.matcher(text);
            int sheets = 0;
            while (pages.find()) {
                sheets++;
            }
            assertTrue(sheets >= 1, "the PDF has pages");
            return sheets;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            driver.executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", ""));
        }
    }
}
