package org.depotcast.benchmark;

import io.quarkus.test.common.http.TestHTTPResource;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.net.URL;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Ledger figures through the HTTP service: movements posted per second by 4 concurrent clients (target ≥ 500/s on
 * 2 cores) and the time to list balances for a depot holding 500 parts (target < 20 ms median). The subclasses say
 * which database the service runs on.
 */
abstract class LedgerWorkload {
    private static final String AUTH = "Basic " + Base64.getEncoder()
            .encodeToString("officer:officer-demo".getBytes(StandardCharsets.UTF_8));

    @Inject
    TestData data;

    @TestHTTPResource("/")
    URL base;

    /** The database the figures are for, as the results file names it. */
    abstract String database();

    @Test
    void movementsPerSecondAndDepotBalances() throws Exception {
        String depot = data.depot();
        String other = data.depot();
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < 500; i++) {
            String part = data.part(UnitOfIssue.EACH);
            data.stock(part, depot, 1_000);
            parts.add(part);
        }
        HttpClient client = HttpClient.newBuilder().executor(Executors.newFixedThreadPool(4)).build();
        URI balances = URI.create(base + "api/stock/balances?location=" + depot);
        for (int i = 0; i < 30; i++) {
            get(client, balances); // warm-up
        }
        double[] listMillis = new double[200];
        for (int i = 0; i < listMillis.length; i++) {
            long start = System.nanoTime();
            assertEquals(200, get(client, balances));
            listMillis[i] = (System.nanoTime() - start) / 1e6;
        }
        Figures.report(String.format("%s: balances for a depot with 500 parts: median %.2f ms over %d requests",
                database(), Figures.median(listMillis), listMillis.length));

        URI movements = URI.create(base + "api/stock/movements");
        post(client, movements, parts, depot, other, 3_000, 4); // warm-up: JIT and connection pool
        double[] rates = new double[5];
        for (int round = 0; round < rates.length; round++) {
            int count = 3_000;
            long start = System.nanoTime();
            post(client, movements, parts, depot, other, count, 4);
            rates[round] = count / ((System.nanoTime() - start) / 1e9);
        }
        Figures.report(String.format("%s: movements posted through HTTP, 4 concurrent clients: median %.0f per second (rounds: %s)",
                database(), Figures.median(rates), java.util.Arrays.toString(java.util.Arrays.stream(rates).map(Math::rint).toArray())));
    }

    private static int get(HttpClient client, URI uri) throws Exception {
        return client.send(HttpRequest.newBuilder(uri).header("Authorization", AUTH).build(),
                HttpResponse.BodyHandlers.discarding()).statusCode();
    }

    private static void post(HttpClient client, URI uri, List<String> parts, String from, String to, int count,
                             int clients) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(clients);
        AtomicInteger next = new AtomicInteger();
        List<Future<?>> futures = new ArrayList<>();
        for (int c = 0; c < clients; c++) {
            futures.add(pool.submit(() -> {
                for (int i = next.getAndIncrement(); i < count; i = next.getAndIncrement()) {
                    String body = "{\"kind\":\"TRANSFER\",\"partNumber\":\"" + parts.get(i % parts.size())
                            + "\",\"from\":\"" + from + "\",\"to\":\"" + to + "\",\"quantity\":1}";
                    int status = client.send(HttpRequest.newBuilder(uri).header("Authorization", AUTH)
                            .header("Content-Type", "application/json")
                            .POST(HttpRequest.BodyPublishers.ofString(body)).build(),
                            HttpResponse.BodyHandlers.discarding()).statusCode();
                    if (status != 201) {
                        throw new IllegalStateException("movement refused with " + status);
                    }
                }
                return null;
            }));
        }
        for (Future<?> f : futures) {
            f.get();
        }
        pool.shutdown();
    }
}
