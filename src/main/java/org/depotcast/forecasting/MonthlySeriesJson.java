package org.depotcast.forecasting;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import jakarta.persistence.AttributeConverter;
import jakarta.persistence.Converter;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Arrays;

/**
 * Stores a monthly series as a JSON array of numbers, so the column is readable by any JSON tool and a reader needs
 * no agreement on separators. A missing value (NaN or infinite) is stored as {@code null} (JSON has no NaN) and read
 * back as NaN. Six decimals are plenty for units per month and keep the column short; runs write millions of
 * numbers, so Jackson's streaming writer and parser are used rather than a tree.
 */
@Converter
public class MonthlySeriesJson implements AttributeConverter<double[], String> {
    private static final JsonFactory JSON = new JsonFactory();

    @Override
    public String convertToDatabaseColumn(double[] values) {
        if (values == null) {
            return null;
        }
        StringWriter out = new StringWriter(values.length * 10 + 2);
        try (JsonGenerator json = JSON.createGenerator(out)) {
            json.writeStartArray();
            for (double v : values) {
                if (Double.isFinite(v)) {
                    json.writeNumber(Math.round(v * 1e6) / 1e6);
                } else {
                    json.writeNull();
                }
            }
            json.writeEndArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    @Override
    public double[] convertToEntityAttribute(String column) {
        if (column == null) {
            return null;
        }
        try (JsonParser json = JSON.createParser(column)) {
            if (json.nextToken() != JsonToken.START_ARRAY) {
                throw new IllegalStateException("a stored monthly series must be a JSON array, was: " + preview(column));
            }
            double[] values = new double[32];
            int n = 0;
            for (JsonToken token = json.nextToken(); token != JsonToken.END_ARRAY; token = json.nextToken()) {
                if (n == values.length) {
                    values = Arrays.copyOf(values, n * 2);
                }
                if (token == JsonToken.VALUE_NULL) {
                    values[n++] = Double.NaN;
                } else if (token == JsonToken.VALUE_NUMBER_INT || token == JsonToken.VALUE_NUMBER_FLOAT) {
                    values[n++] = json.getDoubleValue();
                } else {
                    throw new IllegalStateException("a stored monthly series holds only numbers and nulls, was: "
                            + preview(column));
                }
            }
            return Arrays.copyOf(values, n);
        } catch (IOException e) {
            throw new IllegalStateException("a stored monthly series is not valid JSON: " + preview(column), e);
        }
    }

    private static String preview(String column) {
        return column.length() <= 60 ? column : column.substring(0, 60) + "…";
    }
}
