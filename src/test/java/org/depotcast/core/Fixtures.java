package org.depotcast.core;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the reference fixtures under src/test/resources/reference/ (made by make-fixtures.R). */
public final class Fixtures {
    private Fixtures() {
    }

    public static List<CSVRecord> read(String name) {
        try (Reader reader = new InputStreamReader(Fixtures.class.getResourceAsStream("/reference/" + name),
                StandardCharsets.UTF_8)) {
            return new ArrayList<>(CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                    .parse(reader).getRecords());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static Map<String, double[]> series() {
        Map<String, List<Double>> lists = new LinkedHashMap<>();
        for (CSVRecord r : read("series.csv")) {
            lists.computeIfAbsent(r.get("series_id"), k -> new ArrayList<>()).add(Double.parseDouble(r.get("quantity")));
        }
        Map<String, double[]> series = new LinkedHashMap<>();
        lists.forEach((id, values) -> series.put(id, values.stream().mapToDouble(Double::doubleValue).toArray()));
        return series;
    }
}
