package org.depotcast.sensors;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.depotcast.common.InvalidInputException;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.function.Consumer;

/**
 * Reads an intake file one row at a time from the request stream (never the whole file as one string), as CSV
 * ({@code asset_id,day} and one or more of {@code hours,strokes,litres}) or as newline-delimited JSON
 * ({@code {"assetId":"…","day":"yyyy-mm-dd","hours":3.5}}, or {@code strokes} / {@code litres}).
 */
final class ReadingFiles {
    /** A JSON line longer than this is not a reading; it is refused and skipped without being held. */
    static final int LONGEST_LINE = 1_000;

    private ReadingFiles() {
    }

    static void readCsv(InputStream body, Consumer<RawReading> rows) {
        ReadingCsv.read(body, rows);
    }

    static void readNdjson(InputStream body, ObjectMapper json, Consumer<RawReading> rows) {
        if (body == null) {
            throw new InvalidInputException("body", "the body is empty");
        }
        BufferedReader in = new BufferedReader(new InputStreamReader(
                org.depotcast.common.BodySizeLimit.countedBulk(body), StandardCharsets.UTF_8), 64 * 1024);
        StringBuilder line = new StringBuilder(128);
        long number = 0;
        boolean anyLine = false;
        try {
            while (true) {
                line.setLength(0);
                int end = readLine(in, line);
                if (end != -1 || !line.isEmpty()) {
                    number++;
                    if (end == -2) {
                        rows.accept(RawReading.unreadable(number, "line longer than " + LONGEST_LINE + " characters"));
                    } else if (!line.toString().isBlank()) {
                        rows.accept(parse(number, line.toString(), json));
                    }
                    anyLine |= end == -2 || !line.toString().isBlank();
                }
                if (end == -1) {
                    if (!anyLine) {
                        // As an empty CSV: a file that says nothing is a mistake, not "0 readings taken".
                        throw new InvalidInputException("body", "the body is empty");
                    }
                    return;
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads to the end of a line; 0 at a line end, -1 at the end of the body, -2 for a line too long (skipped). */
    private static int readLine(BufferedReader in, StringBuilder line) throws IOException {
        boolean tooLong = false;
        for (int c = in.read(); ; c = in.read()) {
            if (c == -1) {
                return tooLong ? -2 : -1;
            }
            if (c == '\n') {
                return tooLong ? -2 : 0;
            }
            if (c != '\r' && !tooLong) {
                if (line.length() >= LONGEST_LINE) {
                    tooLong = true;
                    line.setLength(0);
                    line.append('x');
                } else {
                    line.append((char) c);
                }
            }
        }
    }

    private static RawReading parse(long number, String text, ObjectMapper json) {
        JsonNode node;
        try {
            node = json.readTree(text);
        } catch (IOException e) {
            return RawReading.unreadable(number, "not a JSON object");
        }
        if (node == null || !node.isObject()) {
            return RawReading.unreadable(number, "not a JSON object");
        }
        return new RawReading(number, text(node, "assetId"), text(node, "day"), text(node, "hours"),
                text(node, "strokes"), text(node, "litres"), null);
    }

    private static String text(JsonNode node, String field) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            return null;
        }
        return value.isValueNode() ? value.asText() : "{}";
    }
}
