package org.depotcast.stock;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * An acknowledged movement survives the service being killed. The packaged service runs as its own process on a
 * fresh database (H2 files in a temporary folder by default; PostgreSQL when the environment variable
 * {@code DEPOTCAST_CRASH_JDBC_URL} names one, see ops/test-postgres.sh); four clients post movements under idempotency keys; the process is killed with SIGKILL while they post, then
 * started again on the same database. Every movement that was answered 201 must still be there: sent again under
 * its key, it is answered 200 with the same id. Reconcile must be consistent. Three rounds.
 */
class CrashRecoveryIT {
    private static final String AUTH = "Basic " + Base64.getEncoder()
            .encodeToString("officer:officer-demo".getBytes(StandardCharsets.UTF_8));
    private static final Pattern ID = Pattern.compile("\"id\"\\s*:\\s*(\\d+)");
    private static final int CLIENTS = 4;
    private static final int ACKNOWLEDGED_BEFORE_KILL = 400;

    private static Path workDir;
    private static Process service;
    private static int port;
    private static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();

    /** Every movement answered 201, by idempotency key: its id and the body it was posted with. */
    private final Map<String, Acknowledged> acknowledged = new ConcurrentHashMap<>();

    private record Acknowledged(long id, String body) {
    }

    @BeforeAll
    static void freshFolder() throws IOException {
        workDir = Files.createTempDirectory("depotcast-crash");
        try (ServerSocket socket = new ServerSocket(0)) {
            port = socket.getLocalPort();
        }
    }

    @AfterAll
    static void cleanUp() throws IOException {
        if (service != null && service.isAlive()) {
            service.destroy();
        }
        try (var files = Files.walk(workDir)) {
            files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Test
    void everyAcknowledgedMovementSurvivesAKill() throws Exception {
        for (int round = 1; round <= 3; round++) {
            start(round);
            if (round > 1) {
                assertAllAcknowledgedAreStored("after the kill in round " + (round - 1));
            }
            postUntilKilled(round);
        }
        start(4);
        assertAllAcknowledgedAreStored("after the kill in round 3");
        service.destroy();
        assertTrue(service.waitFor(60, java.util.concurrent.TimeUnit.SECONDS), "service stops on SIGTERM");
    }

    private void postUntilKilled(int round) throws Exception {
        int before = acknowledged.size();
        AtomicBoolean killed = new AtomicBoolean();
        ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
        List<Future<Integer>> clients = new ArrayList<>();
        for (int c = 0; c < CLIENTS; c++) {
            int client = c;
            clients.add(pool.submit(() -> postAsClient(round, client, killed)));
        }
        long deadline = System.nanoTime() + Duration.ofMinutes(3).toNanos();
        while (acknowledged.size() - before < ACKNOWLEDGED_BEFORE_KILL && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        service.destroyForcibly(); // SIGKILL on Linux: no shutdown hook, no flush
        killed.set(true);
        service.waitFor();
        int refusedWhileRunning = 0;
        for (Future<Integer> f : clients) {
            refusedWhileRunning += f.get();
        }
        pool.shutdown();
        assertEquals(0, refusedWhileRunning, "no movement refused while the service ran");
        assertTrue(acknowledged.size() - before >= ACKNOWLEDGED_BEFORE_KILL,
                "round " + round + ": only " + (acknowledged.size() - before) + " acknowledged before the kill");
    }

    /** Posts until the service is gone; answers the count of refusals other than the connection dropping. */
    private int postAsClient(int round, int client, AtomicBoolean killed) {
        int refused = 0;
        for (int i = 0; ; i++) {
            String key = "crash-r" + round + "-c" + client + "-" + i;
            String body = i % 2 == 0
                    ? movement("COUNT_ADJUSTMENT", "OB-CS-50", null, "CENTRAL", 2, key)
                    : movement("TRANSFER", "OB-CS-50", "CENTRAL", "DEP-TESHVALE", 1, key);
            try {
                HttpResponse<String> answer = post(body);
                if (answer.statusCode() == 201) {
                    acknowledged.put(key, new Acknowledged(idOf(answer.body()), body));
                } else if (!killed.get()) {
                    refused++;
                    System.err.println("refused " + answer.statusCode() + ": " + answer.body());
                }
            } catch (IOException | InterruptedException e) {
                if (killed.get() || !service.isAlive()) {
                    return refused; // the kill: this request has no answer and counts as not acknowledged
                }
                refused++;
            }
        }
    }

    private void assertAllAcknowledgedAreStored(String when) throws Exception {
        List<String> missing = new ArrayList<>();
        for (Map.Entry<String, Acknowledged> e : acknowledged.entrySet()) {
            HttpResponse<String> answer = post(e.getValue().body());
            if (answer.statusCode() != 200 || idOf(answer.body()) != e.getValue().id()) {
                missing.add(e.getKey() + " (id " + e.getValue().id() + ") answered " + answer.statusCode() + " "
                        + answer.body());
            }
        }
        assertTrue(missing.isEmpty(), when + ": " + missing.size() + " of " + acknowledged.size()
                + " acknowledged movements lost or changed, e.g. " + missing.subList(0, Math.min(3, missing.size())));
        HttpResponse<String> reconcile = HTTP.send(request("/api/stock/reconcile").GET().build(),
                HttpResponse.BodyHandlers.ofString());
        assertEquals(200, reconcile.statusCode(), reconcile.body());
        assertTrue(reconcile.body().contains("\"consistent\":true"), when + ": reconcile " + reconcile.body());
    }

    private static String movement(String kind, String part, String from, String to, int quantity, String key) {
        return "{\"kind\":\"" + kind + "\",\"partNumber\":\"" + part + "\","
                + (from == null ? "" : "\"from\":\"" + from + "\",")
                + "\"to\":\"" + to + "\",\"quantity\":" + quantity + ",\"idempotencyKey\":\"" + key + "\"}";
    }

    private static HttpResponse<String> post(String body) throws IOException, InterruptedException {
        return HTTP.send(request("/api/stock/movements").header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(body)).build(), HttpResponse.BodyHandlers.ofString());
    }

    private static HttpRequest.Builder request(String path) {
        return HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path)).header("Authorization", AUTH)
                .timeout(Duration.ofSeconds(30));
    }

    private static long idOf(String body) {
        Matcher m = ID.matcher(body);
        if (!m.find()) {
            fail("no id in " + body);
        }
        return Long.parseLong(m.group(1));
    }

    /** Starts the packaged service on the shared database and waits until it answers (the first start loads the demo). */
    private static void start(int attempt) throws Exception {
        Path repo = Path.of("").toAbsolutePath();
        Path jar = Path.of(System.getProperty("depotcast.crash.jar", "target/quarkus-app/quarkus-run.jar")).toAbsolutePath();
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx512m"));
        String jdbcUrl = System.getenv().getOrDefault("DEPOTCAST_CRASH_JDBC_URL", "");
        if (!jdbcUrl.isBlank()) {
            command.add("-Dquarkus.profile=postgres"); // the jar was built for it: mvn verify -Ppostgres
        }
        command.addAll(List.of("-jar", jar.toString()));
        ProcessBuilder builder = new ProcessBuilder(command).directory(workDir.toFile())
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.appendTo(workDir.resolve("service.log").toFile()));
        Map<String, String> env = builder.environment();
        env.keySet().removeIf(name -> name.startsWith("DEPOTCAST_"));
        env.put("DEPOTCAST_PORT", Integer.toString(port));
        env.put("DEPOTCAST_SEED_DIR", repo.resolve("seed-data").toString());
        env.put("DEPOTCAST_FORECAST_MODELS", repo.resolve("forecast-models").toString());
        if (!jdbcUrl.isBlank()) {
            env.put("DEPOTCAST_JDBC_URL", jdbcUrl);
            env.put("DEPOTCAST_DB_USER", System.getenv().getOrDefault("DEPOTCAST_CRASH_DB_USER", "postgres"));
        } // else the packaged default: H2 files under ./data of the working folder
        service = builder.start();
        long deadline = System.nanoTime() + Duration.ofMinutes(4).toNanos();
        while (System.nanoTime() < deadline) {
            if (!service.isAlive()) {
                fail("start " + attempt + ": the service exited; see " + workDir.resolve("service.log") + "\n"
                        + Files.readString(workDir.resolve("service.log")));
            }
            try {
                if (HTTP.send(request("/api/stock/reconcile").GET().build(), HttpResponse.BodyHandlers.discarding())
                        .statusCode() == 200) {
                    return;
                }
            } catch (IOException e) {
                // not listening yet
            }
            Thread.sleep(250);
        }
        fail("start " + attempt + ": the service did not answer within 4 minutes");
    }
}
