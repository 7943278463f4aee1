package org.depotcast.benchmark;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * R forecast 8.20's point-only Croston ({@code croston-throughput.R}) kept running between rounds: it reads the series
 * once, then times one pass over all of them each time {@link #round()} asks, while the caller times its own rounds
 * in between. R's figures are R's own (the elapsed and processor time of its loop, reading the file not counted).
 */
final class RCrostonRounds implements AutoCloseable {
    private final Process r;
    private final BufferedReader out;
    private final Writer in;

    private RCrostonRounds(Process r) {
        this.r = r;
        this.out = new BufferedReader(new InputStreamReader(r.getInputStream(), StandardCharsets.UTF_8));
        this.in = new OutputStreamWriter(r.getOutputStream(), StandardCharsets.UTF_8);
    }

    /** R started on the file and ready for its first round; null without {@code Rscript}. */
    static RCrostonRounds start(Path csv) throws IOException {
        Path script = Path.of("src", "test", "resources", "benchmark", "croston-throughput.R");
        Process r;
        try {
            r = new ProcessBuilder("Rscript", script.toString(), csv.toString()).redirectErrorStream(true).start();
        } catch (IOException noR) {
            return null;
        }
        RCrostonRounds rounds = new RCrostonRounds(r);
        String line = rounds.out.readLine();
        if (!"ready".equals(line)) {
            rounds.close();
            throw new IllegalStateException("Rscript did not start: " + line);
        }
        return rounds;
    }

    /** R's series per second of elapsed time and per second of its own processor time (user + system). */
    record Round(double perSecond, double perCpuSecond) {
    }

    /** One timed pass of R over every series. */
    Round round() throws IOException {
        in.write("go\n");
        in.flush();
        String line = out.readLine();
        String[] parts = line == null ? new String[0] : line.strip().split("\\s+");
        if (parts.length != 3) {
            throw new IllegalStateException("Rscript answered: " + line);
        }
        double series = Double.parseDouble(parts[0]);
        return new Round(series / Double.parseDouble(parts[1]), series / Double.parseDouble(parts[2]));
    }

    @Override
    public void close() throws IOException {
        in.close();
        try {
            if (!r.waitFor(30, java.util.concurrent.TimeUnit.SECONDS)) {
                r.destroyForcibly();
            }
        } catch (InterruptedException e) {
            r.destroyForcibly();
            Thread.currentThread().interrupt();
        }
    }
}
