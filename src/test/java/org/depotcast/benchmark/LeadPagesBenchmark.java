package org.depotcast.benchmark;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.depotcast.pages.BrowserSession;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Issue 11 figure: a forecast chart for one part draws in under 500 ms (median) in the headless browser on the demo.
 * Two measures: the forecast page opened with a part named in its address, from navigation to data shown (chart,
 * method scores and the fleet model drawn); and another part chosen on the open page, from the click until its chart
 * is in the page.
 */
@QuarkusTest
class LeadPagesBenchmark extends BrowserSession {
    private static final List<String> PARTS = List.of("OB-CS-50", "OB-ROD-12", "OB-PL-50", "OB-FV-63", "OB-BR-20", "OB-RM-50");

    @Inject
    ForecastRunService runs;

    @Test
    void aPartsForecastChartDraws() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("benchmark", LocalDate.of(2026, 12, 2));
        }
        signIn("lead", "lead-demo");
        waitReady();
        double[] opened = new double[15];
        for (int i = -3; i < opened.length; i++) {
            open("/app/lead/?part=" + PARTS.get(Math.floorMod(i, PARTS.size())));
            waitReady();
            if (i >= 0) {
                opened[i] = readyMillis();
            }
        }
        double[] chosen = new double[15];
        for (int i = -3; i < chosen.length; i++) {
            String part = PARTS.get(Math.floorMod(i + 1, PARTS.size()));
            Object millis = driver.executeAsyncScript("""
                    const [part, done] = [arguments[0], arguments[arguments.length - 1]];
                    document.getElementById('part').value = part;
                    const t0 = performance.now();
                    document.getElementById('explore-form').requestSubmit();
                    const check = () => {
                        const h3 = document.querySelector('#explorer h3');
                        if (h3 && h3.textContent.startsWith(part) && document.querySelector('#explorer figure.chart svg')) {
                            done(performance.now() - t0);
                        } else {
                            requestAnimationFrame(check);
                        }
                    };
                    check();
                    """, part);
            if (i >= 0) {
                chosen[i] = ((Number) millis).doubleValue();
            }
        }
        assertNoPageErrors();
        assertTrue(Figures.median(chosen) > 0 && Figures.median(opened) > 0);
        Figures.report(String.format("lead's forecast chart for one part (headless Chromium, demo): page opened to chart "
                        + "drawn median %.0f ms over %d loads; another part chosen to its chart drawn median %.0f ms over %d",
                Figures.median(opened), opened.length, Figures.median(chosen), chosen.length));
    }
}
