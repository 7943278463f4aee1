package org.depotcast.benchmark;

import io.quarkus.test.common.http.TestHTTPResource;
import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.io.OutputStream;
import java.net.HttpURLConnection;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The CSV batch forecast through HTTP against R forecast 8.20's point-only Croston over the same series, in one run
 * (issue: at least 100 times R's series per second), and a million series of 120 months (about 1.4 GB) through the
 * service in the benchmark JVM's 1 GiB heap, with the heap's peak reported. R is optional: without {@code Rscript}
 * the ratio is reported as not measured.
 */
@QuarkusTest
class BatchThroughputBenchmark {
    private static final int MONTHS = 120;
    private static final int SERIES = 100_000;
    private static final int R_SERIES = 5_000;
    private static final int MILLION = 1_000_000;

    @TestHTTPResource("/api/forecast/batch?method=croston&alpha=0.1&horizon=12")
    URL batch;

    @Test
    void batchThroughputAgainstRAndAMillionSeriesInBoundedMemory() throws Exception {
        Path small = write(SERIES, 11);
        assertEquals((long) SERIES * 12 + 1, post(small)); // warm-up: the JIT compiles the path first
        double[] seconds = new double[5];
        for (int round = 0; round < seconds.length; round++) {
            long start = System.nanoTime();
            assertEquals((long) SERIES * 12 + 1, post(small));
            seconds[round] = (System.nanoTime() - start) / 1e9;
        }
        double ours = SERIES / Figures.median(seconds);
        Path forR = write(R_SERIES, 11);
        double r = rSeriesPerSecond(forR);
        Figures.report(String.format("Batch Croston through HTTP, %,d series × %d months (%.0f MB): median %.2f s over 5 "
                        + "rounds after one warm-up = %,.0f series/s; R forecast 8.20 point-only Croston on %,d of the same series: %s", SERIES, MONTHS,
                Files.size(small) / 1e6, Figures.median(seconds), ours, R_SERIES,
                Double.isNaN(r) ? "not measured (no Rscript)" : String.format("%,.0f series/s, ratio %.0f×", r, ours / r)));
        Files.delete(small);
        Files.delete(forR);

        Path million = write(MILLION, 12);
        resetPeaks();
        long start = System.nanoTime();
        assertEquals((long) MILLION * 12 + 1, post(million));
        double took = (System.nanoTime() - start) / 1e9;
        Figures.report(String.format("Batch Croston through HTTP, %,d series × %d months (%.2f GB) with -Xmx%d MiB: %.1f s "
                        + "(%,.0f series/s); heap peak %d MiB", MILLION, MONTHS, Files.size(million) / 1e9,
                Runtime.getRuntime().maxMemory() >> 20, took, MILLION / took, heapPeak() >> 20));
        Files.delete(million);
    }

    /**
     * Posts the file and counts the lines of the answer without keeping either: HttpURLConnection in fixed-length
     * streaming mode sends the body as it is read from disk (the JDK's HttpClient ran the benchmark JVM, which also
     * runs the service, out of its 1 GiB heap on the 1.5 GB body).
     */
    private long post(Path csv) throws IOException {
        HttpURLConnection connection = (HttpURLConnection) batch.openConnection();
        connection.setRequestMethod("POST");
        connection.setDoOutput(true);
        connection.setFixedLengthStreamingMode(Files.size(csv));
        connection.setRequestProperty("Authorization", "Basic " + Base64.getEncoder().encodeToString(
                "officer:officer-demo".getBytes(StandardCharsets.UTF_8)));
        connection.setRequestProperty("Content-Type", "text/csv");
        try (OutputStream out = connection.getOutputStream()) {
            Files.copy(csv, out);
        }
        assertEquals(200, connection.getResponseCode());
        long lines = 0;
        byte[] buffer = new byte[1 << 16];
        try (InputStream in = connection.getInputStream()) {
            for (int n; (n = in.read(buffer)) >= 0; ) {
                for (int i = 0; i < n; i++) {
                    lines += buffer[i] == '\n' ? 1 : 0;
                }
            }
        }
        return lines;
    }

    private static Path write(int seriesCount, long seed) throws IOException {
        SplittableRandom random = new SplittableRandom(seed);
        Path file = Files.createTempFile("batch-benchmark-", ".csv");
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write("series_id,period,quantity\n");
            for (int s = 0; s < seriesCount; s++) {
                double p = 0.05 + 0.5 * random.nextDouble();
                String id = "P" + s;
                for (int t = 1; t <= MONTHS; t++) {
                    out.write(id);
                    out.write(',');
                    out.write(Integer.toString(t));
                    out.write(',');
                    out.write(Integer.toString(random.nextDouble() < p ? 1 + random.nextInt(5) : 0));
                    out.write('\n');
                }
            }
        }
        return file;
    }

    private static double rSeriesPerSecond(Path csv) throws IOException, InterruptedException {
        Path script = Path.of("src", "test", "resources", "benchmark", "croston-throughput.R");
        Process r;
        try {
            r = new ProcessBuilder("Rscript", script.toString(), csv.toString()).redirectErrorStream(true).start();
        } catch (IOException noR) {
            return Double.NaN;
        }
        String out = new String(r.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        if (!r.waitFor(10, TimeUnit.MINUTES) || r.exitValue() != 0) {
            throw new IllegalStateException("Rscript failed: " + out);
        }
        String[] parts = out.split("\\s+");
        return Double.parseDouble(parts[parts.length - 2]) / Double.parseDouble(parts[parts.length - 1]);
    }

    private static void resetPeaks() {
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
    }

    private static long heapPeak() {
        return ManagementFactory.getMemoryPoolMXBeans().stream().filter(p -> p.getType() == MemoryType.HEAP)
                .mapToLong(p -> p.getPeakUsage().getUsed()).sum();
    }
}
