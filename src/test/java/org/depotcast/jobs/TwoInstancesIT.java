package org.depotcast.jobs;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
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
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * Two instances of the packaged service on one PostgreSQL database (DEPOTCAST_CLUSTER_JDBC_URL, set by
 * ops/test-postgres.sh; skipped on the H2 run, where instances cannot share a database). The nightly schedule is
 * made to fire every 5 s on both: one scheduled run happens for the day. A forecast run started on A is polled to
 * its end on B; a start on B while a run is going on A is refused (409). A is killed while a run is going: B marks
 * the job failed once the heartbeat is older than the limit (4 s here), and the run with it.
 */
class TwoInstancesIT {
    private static final String AUTH = "Basic " + Base64.getEncoder().encodeToString("lead:lead-demo".getBytes(StandardCharsets.UTF_8));
    private static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    private static final String JDBC_URL = System.getenv().getOrDefault("DEPOTCAST_CLUSTER_JDBC_URL", "");
    private static Path workDir;
    private static final List<Process> started = new ArrayList<>();

    private record Instance(String name, int port, Process process, Path log) {
    }

    @BeforeAll
    static void needsASharedDatabase() throws IOException {
        Assumptions.assumeFalse(JDBC_URL.isBlank(), "no PostgreSQL configured (DEPOTCAST_CLUSTER_JDBC_URL): "
                + "the two-instance test runs in ops/test-postgres.sh");
        workDir = Files.createTempDirectory("depotcast-two");
    }

    @AfterAll
    static void stop() {
        started.stream().filter(Process::isAlive).forEach(Process::destroy);
    }

    @Test
    void twoInstancesShareTheirJobs() throws Exception {
        Instance a = start("a");
        Instance b = start("b"); // after A has loaded the demo, so only one instance loads it

        // The schedule fires on both every 10 s; one run for the day, the other instance finds the day claimed.
        String scheduled = waitFor(b, "/api/forecast/runs?limit=100", body -> body.contains("\"trigger\":\"schedule\"")
                && runsOf(body, "schedule").stream().allMatch(r -> !r.contains("\"status\":\"RUNNING\"")), 60);
        long scheduledDone = System.nanoTime();
        assertTrue(runsOf(scheduled, "schedule").get(0).contains("\"status\":\"DONE\""), scheduled);
        assertFalse(runsOf(scheduled, "schedule").get(0).contains("\"seriesDone\":0,"), "run on the loaded demo: " + scheduled);

        // Started on A, polled to its end on B.
        HttpResponse<String> startedOnA = post(a, "/api/forecast/runs");
        assertEquals(202, startedOnA.statusCode(), startedOnA.body());
        String jobId = field(startedOnA.body(), "jobId");
        String done = waitFor(b, "/api/jobs/" + jobId, body -> !body.contains("\"state\":\"RUNNING\""), 60);
        assertTrue(done.contains("\"state\":\"DONE\""), done);
        String runOnB = get(b, "/api/forecast/runs/" + field(startedOnA.body(), "id")).body();
        assertTrue(runOnB.contains("\"status\":\"DONE\""), runOnB);

        // A dies during a run; B marks its job failed, with a message that names no exception.
        HttpResponse<String> second = post(a, "/api/forecast/runs");
        assertEquals(202, second.statusCode(), second.body());
        // One run at a time across instances: B refuses a start while A's run is going.
        HttpResponse<String> alsoOnB = post(b, "/api/forecast/runs");
        assertEquals(409, alsoOnB.statusCode(), alsoOnB.body());
        a.process().destroyForcibly();
        a.process().waitFor();
        String abandonedJob = field(second.body(), "jobId");
        String failed = waitFor(b, "/api/jobs/" + abandonedJob, body -> !body.contains("\"state\":\"RUNNING\""), 60);
        assertTrue(failed.contains("\"state\":\"FAILED\"") && failed.contains("has not answered since"), failed);
        assertFalse(failed.contains("Exception"), failed);
        String abandonedRun = get(b, "/api/forecast/runs/" + field(second.body(), "id")).body();
        assertTrue(abandonedRun.contains("\"status\":\"FAILED\""), abandonedRun);

        // By now the schedule has fired again on B (and fired on A until it died): still one run for the day.
        Thread.sleep(Math.max(0, 11_000 - (System.nanoTime() - scheduledDone) / 1_000_000));
        List<String> schedule = runsOf(get(b, "/api/forecast/runs?limit=100").body(), "schedule");
        assertEquals(1, schedule.size(), "one scheduled run across both instances: " + schedule);
        // Each instance tried the day after its start-up; exactly one won (A may win and die before firing again).
        List<String> claimLines = new ArrayList<>(scheduleLines(a));
        claimLines.addAll(scheduleLines(b));
        assertFalse(scheduleLines(a).isEmpty() || scheduleLines(b).isEmpty(), "both instances tried: " + claimLines);
        assertEquals(1, claimLines.stream().filter(line -> line.contains("claimed by this instance")).count(),
                "one claim won: " + claimLines);
        System.out.println("TWO-INSTANCES scheduled runs: " + schedule.size() + "; job " + jobId
                + " started on A done on B; job " + abandonedJob + " of killed A marked failed by B");
    }

    private static List<String> scheduleLines(Instance at) throws IOException {
        return log(at).lines().filter(line -> line.contains("schedule forecast-nightly") && line.contains(" claimed by "))
                .map(line -> at.name() + ": " + line.substring(Math.max(0, line.indexOf("schedule forecast-nightly")))).toList();
    }

    private static List<String> runsOf(String body, String trigger) {
        List<String> runs = new ArrayList<>();
        for (String run : body.split("\\},\\{")) {
            if (run.contains("\"trigger\":\"" + trigger + "\"")) {
                runs.add(run);
            }
        }
        return runs;
    }

    private static String field(String body, String name) {
        Matcher m = Pattern.compile("\"" + name + "\"\\s*:\\s*(\\d+)").matcher(body);
        if (!m.find()) {
            fail("no " + name + " in " + body);
        }
        return m.group(1);
    }

    private static String waitFor(Instance at, String path, Predicate<String> ready, int seconds) throws Exception {
        long deadline = System.nanoTime() + Duration.ofSeconds(seconds).toNanos();
        String body = "";
        while (System.nanoTime() < deadline) {
            HttpResponse<String> answer = get(at, path);
            body = answer.body();
            if (answer.statusCode() == 200 && ready.test(body)) {
                return body;
            }
            Thread.sleep(250);
        }
        throw new AssertionError(path + " on " + at.name() + " not ready within " + seconds + " s: " + body);
    }

    private static HttpResponse<String> get(Instance at, String path) throws IOException, InterruptedException {
        return HTTP.send(request(at, path).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    private static HttpResponse<String> post(Instance at, String path) throws IOException, InterruptedException {
        return HTTP.send(request(at, path).POST(HttpRequest.BodyPublishers.noBody()).build(), HttpResponse.BodyHandlers.ofString());
    }

    private static HttpRequest.Builder request(Instance at, String path) {
        return HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + at.port() + path)).header("Authorization", AUTH)
                .timeout(Duration.ofSeconds(30));
    }

    private static String log(Instance at) throws IOException {
        return Files.readString(at.log());
    }

    private static Instance start(String name) throws Exception {
        Path repo = Path.of("").toAbsolutePath();
        Path jar = Path.of(System.getProperty("depotcast.crash.jar", "target/quarkus-app/quarkus-run.jar")).toAbsolutePath();
        int port;
        try (ServerSocket socket = new ServerSocket(0)) {
            port = socket.getLocalPort();
        }
        Path dir = Files.createDirectories(workDir.resolve(name));
        Path log = dir.resolve("service.log");
        ProcessBuilder builder = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx400m", "-Dquarkus.profile=postgres", "-Ddepotcast.forecast.schedule=0/5 * * * * ?",
                "-jar", jar.toString()).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.appendTo(log.toFile()));
        Map<String, String> env = builder.environment();
        env.keySet().removeIf(key -> key.startsWith("DEPOTCAST_"));
        env.put("DEPOTCAST_PORT", Integer.toString(port));
        env.put("DEPOTCAST_SEED_DIR", repo.resolve("seed-data").toString());
        env.put("DEPOTCAST_FORECAST_MODELS", repo.resolve("forecast-models").toString());
        env.put("DEPOTCAST_JDBC_URL", JDBC_URL);
        env.put("DEPOTCAST_DB_USER", System.getenv().getOrDefault("DEPOTCAST_CLUSTER_DB_USER", "postgres"));
        env.put("DEPOTCAST_JOBS_HEARTBEAT_EVERY", "1s");
        env.put("DEPOTCAST_JOBS_SWEEP_EVERY", "1s");
        env.put("DEPOTCAST_JOBS_DEAD_AFTER", "PT4S");
        Instance instance = new Instance(name, port, builder.start(), log);
        started.add(instance.process());
        long deadline = System.nanoTime() + Duration.ofMinutes(3).toNanos();
        while (System.nanoTime() < deadline) {
            if (!instance.process().isAlive()) {
                fail("instance " + name + " exited:\n" + log(instance));
            }
            try {
                if (get(instance, "/api/me").statusCode() == 200) {
                    return instance;
                }
            } catch (IOException e) {
                // not listening yet
            }
            Thread.sleep(250);
        }
        throw new AssertionError("instance " + name + " did not answer within 3 minutes");
    }
}
