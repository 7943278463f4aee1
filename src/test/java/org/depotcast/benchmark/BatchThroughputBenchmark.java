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

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The CSV batch forecast through HTTP against R forecast 8.20's point-only Croston over the same series, in one run
 * (issue: at least 100 times R's series per second), and a million series of 120 months (about 1.5 GB) through the
 * service in the benchmark JVM's 1 GiB heap, with the heap's peak reported. The service and R are timed alternately,
 * round after round (one warm-up round each first), so a change in the shared machine's load between rounds
 * reaches both; the ratio is of the two medians, and each round's own ratio is reported beside it. R is optional:
 * without {@code Rscript} the ratio is reported as not measured.
 */
@QuarkusTest
class BatchThroughputBenchmark {
    private static final int MONTHS = 120;
    private static final int SERIES = 100_000;
    private static final int R_SERIES = 5_000;
    private static final int ROUNDS = 5;
    private static final int MILLION = 1_000_000;

    @TestHTTPResource("/api/forecast/batch?method=croston&alpha=0.1&horizon=12")
    URL batch;

    @Test
    void batchThroughputAgainstRAndAMillionSeriesInBoundedMemory() throws Exception {
        Path small = write(SERIES, 11);
        Path forR = write(R_SERIES, 11); // the same seed: R's series are the first 5,000 of the service's
        double[][] ours = new double[2][ROUNDS], theirs = new double[2][ROUNDS];
        try (RCrostonRounds r = RCrostonRounds.start(forR)) {
            post(small, ours, 0); // warm-up: the JIT compiles the path first
            if (r != null) {
                r.round(); // and R compiles croston2 to byte code
            }
            for (int round = 0; round < ROUNDS; round++) {
                post(small, ours, round);
                RCrostonRounds.Round their = r == null ? new RCrostonRounds.Round(Double.NaN, Double.NaN) : r.round();
                theirs[0][round] = their.perSecond();
                theirs[1][round] = their.perCpuSecond();
            }
        }
        Figures.report(throughputLine(Files.size(small), ours, theirs));
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
     * Posts the file and keeps its series per second of elapsed time and of the JVM's processor time (every thread:
     * the service, its HTTP layer, the garbage collector and this benchmark's client).
     */
    private void post(Path csv, double[][] rates, int round) throws IOException {
        com.sun.management.OperatingSystemMXBean os = (com.sun.management.OperatingSystemMXBean)
                ManagementFactory.getOperatingSystemMXBean();
        long start = System.nanoTime(), cpu = os.getProcessCpuTime();
        assertEquals((long) SERIES * 12 + 1, post(csv));
        rates[0][round] = SERIES / ((System.nanoTime() - start) / 1e9);
        rates[1][round] = SERIES / ((os.getProcessCpuTime() - cpu) / 1e9);
    }

    private static String throughputLine(long bytes, double[][] ours, double[][] theirs) {
        String against = Double.isNaN(theirs[0][0]) ? "R not measured (no Rscript)" : String.format("R forecast 8.20 "
                + "point-only Croston on %,d of the same series %s; per second of processor time (the JVM's every "
                + "thread against R's user + system time): %s", R_SERIES, compared(ours[0], theirs[0]),
                compared(ours[1], theirs[1]));
        return String.format("Batch Croston through HTTP, %,d series × %d months (%.0f MB), %d rounds timed alternately "
                + "with R after one warm-up each: median %,.0f series/s (%.2f s); %s", SERIES, MONTHS, bytes / 1e6, ROUNDS,
                Figures.median(ours[0]), SERIES / Figures.median(ours[0]), against);
    }

    /** Both medians, the ratio of the medians, the range of the rounds' own ratios and every round's pair. */
    private static String compared(double[] ours, double[] theirs) {
        StringBuilder rounds = new StringBuilder();
        double[] ratios = new double[ROUNDS];
        for (int i = 0; i < ROUNDS; i++) {
            ratios[i] = ours[i] / theirs[i];
            rounds.append(String.format("%s%,.0f / %,.0f", i == 0 ? "" : "; ", ours[i], theirs[i]));
        }
        java.util.Arrays.sort(ratios);
        return String.format("median %,.0f series/s against ours %,.0f: ratio of medians %.0f× (rounds' own ratios "
                + "%.0f–%.0f×; ours / R's: %s)", Figures.median(theirs), Figures.median(ours),
                Figures.median(ours) / Figures.median(theirs), ratios[0], ratios[ROUNDS - 1], rounds);
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

    private static void resetPeaks() {
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
    }

    private static long heapPeak() {
        return ManagementFactory.getMemoryPoolMXBeans().stream().filter(p -> p.getType() == MemoryType.HEAP)
                .mapToLong(p -> p.getPeakUsage().getUsed()).sum();
    }
}
