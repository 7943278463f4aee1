package org.depotcast.benchmark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;

/** Medians and a shared results file for the benchmark classes (target/benchmark-results.txt). */
final class Figures {
    private static final Path RESULTS = Path.of("target", "benchmark-results.txt");

    private Figures() {
    }

    static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }

    /**
     * Processor time this JVM has used, every thread, in seconds: beside the clock, a figure that other programs
     * on a shared machine do not stretch (they still compete for caches, so it is not free of them either).
     */
    static double processCpuSeconds() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                .getOperatingSystemMXBean()).getProcessCpuTime() / 1e9;
    }

    static void report(String line) {
        System.out.println("BENCHMARK " + line);
        try {
            Files.createDirectories(RESULTS.getParent());
            Files.writeString(RESULTS, line + System.lineSeparator(), StandardOpenOption.CREATE, StandardOpenOption.APPEND);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
