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
