package org.depotcast.benchmark;

import io.quarkus.test.common.http.TestHTTPResource;
import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.net.URL;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.Base64;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Issue 4 figure: reorder alerts for one depot of the demo programme, through HTTP (target &lt; 50 ms median). */
@QuarkusTest
class AlertsBenchmark {
    private static final String AUTH = "Basic " + Base64.getEncoder()
            .encodeToString("officer:officer-demo".getBytes(StandardCharsets.UTF_8));

    @Inject
    ForecastRunService runs;

    @TestHTTPResource("/")
    URL base;

    @Test
    void alertsForADepot() throws Exception {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("benchmark", LocalDate.of(2026, 12, 2));
        }
        HttpClient client = HttpClient.newHttpClient();
        HttpRequest request = HttpRequest.newBuilder(URI.create(base + "api/planning/alerts?location=DEP-TESHVALE"))
                .header("Authorization", AUTH).build();
        for (int i = 0; i < 30; i++) {
            client.send(request, HttpResponse.BodyHandlers.discarding());
        }
        double[] millis = new double[200];
        for (int i = 0; i < millis.length; i++) {
            long start = System.nanoTime();
            assertEquals(200, client.send(request, HttpResponse.BodyHandlers.discarding()).statusCode());
            millis[i] = (System.nanoTime() - start) / 1e6;
        }
        Figures.report(String.format("reorder alerts for one demo depot (HTTP): median %.1f ms over %d requests",
                Figures.median(millis), millis.length));
    }
}
