package org.depotcast;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A breakdown rate the demo generator planted for a component family (its {@code planted-rates.csv}): events per
 * 1,000 operating hours for a new pump at 30 m, scaled by (depth / 30 m) to the depth exponent and by
 * exp(age coefficient × age in years), with the units replaced per breakdown. The truth the tests hold the fitted
 * models and forecasts against.
 */
public record PlantedRate(String family, double per1000HoursAt30m, double depthExponent, double agePerYear,
                          double unitsPerEvent) {

    /** Breakdowns per operating hour of a pump at this depth and age. */
    public double perHour(double depthM, double ageYears) {
        return per1000HoursAt30m / 1000 * Math.pow(depthM / 30.0, depthExponent) * Math.exp(agePerYear * ageYears);
    }

    /** The file's rates by family name, in file order. */
    public static Map<String, PlantedRate> read(Path file) throws IOException {
        Map<String, PlantedRate> rates = new LinkedHashMap<>();
        try (Reader reader = Files.newBufferedReader(file)) {
            for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(reader)) {
                rates.put(r.get("family"), new PlantedRate(r.get("family"),
                        Double.parseDouble(r.get("events_per_1000h_at_30m_new")), Double.parseDouble(r.get("depth_exponent")),
                        Double.parseDouble(r.get("age_coefficient_per_year")), Double.parseDouble(r.get("units_per_event"))));
            }
        }
        return rates;
    }
}
