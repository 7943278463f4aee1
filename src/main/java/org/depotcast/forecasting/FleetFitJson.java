package org.depotcast.forecasting;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import jakarta.persistence.AttributeConverter;
import jakarta.persistence.Converter;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The stored fleet model's lists as JSON, so a reader needs no agreement on separators: the terms as an array of
 * strings, coefficients and standard errors as arrays of numbers (full precision; a non-finite value as
 * {@code null}, read back as NaN), the coefficients' covariance as an array of rows, and the depot ratios as an
 * object keyed by depot id. The lists hold a handful of numbers, so Jackson's tree model is cheap enough.
 */
final class FleetFitJson {
    private static final ObjectMapper JSON = new ObjectMapper();

    private FleetFitJson() {
    }

    /** Terms after the intercept, e.g. {@code ["log_depth","age_years"]}. */
    @Converter
    static class Terms implements AttributeConverter<List<String>, String> {
        @Override
        public String convertToDatabaseColumn(List<String> terms) {
            return terms == null ? null : write(JSON.valueToTree(terms));
        }

        @Override
        public List<String> convertToEntityAttribute(String column) {
            if (column == null) {
                return null;
            }
            List<String> terms = new ArrayList<>();
            for (JsonNode term : array(column)) {
                if (!term.isTextual()) {
                    throw new IllegalStateException("stored terms must be strings, were: " + column);
                }
                terms.add(term.textValue());
            }
            return terms;
        }
    }

    /** Numbers in order, e.g. {@code [-7.2,0.41]}. */
    @Converter
    static class Numbers implements AttributeConverter<double[], String> {
        @Override
        public String convertToDatabaseColumn(double[] values) {
            return values == null ? null : write(numbers(values));
        }

        @Override
        public double[] convertToEntityAttribute(String column) {
            return column == null ? null : numbers(array(column), column);
        }
    }

    /** A square matrix as rows, e.g. {@code [[0.01,-0.002],[-0.002,0.003]]}. */
    @Converter
    static class Matrix implements AttributeConverter<double[][], String> {
        @Override
        public String convertToDatabaseColumn(double[][] rows) {
            if (rows == null) {
                return null;
            }
            ArrayNode out = JSON.createArrayNode();
            for (double[] row : rows) {
                out.add(numbers(row));
            }
            return write(out);
        }

        @Override
        public double[][] convertToEntityAttribute(String column) {
            if (column == null) {
                return null;
            }
            ArrayNode rows = array(column);
            double[][] matrix = new double[rows.size()][];
            for (int i = 0; i < matrix.length; i++) {
                if (!rows.get(i).isArray()) {
                    throw new IllegalStateException("a stored matrix must be an array of rows, was: " + column);
                }
                matrix[i] = numbers((ArrayNode) rows.get(i), column);
            }
            return matrix;
        }
    }

    /** Shrunk ratio per depot id, e.g. {@code {"12":0.8,"14":1.3}}. */
    @Converter
    static class DepotRatios implements AttributeConverter<Map<Long, Double>, String> {
        @Override
        public String convertToDatabaseColumn(Map<Long, Double> ratios) {
            if (ratios == null) {
                return null;
            }
            ObjectNode out = JSON.createObjectNode();
            new TreeMap<>(ratios).forEach((depot, ratio) -> out.put(Long.toString(depot), ratio));
            return write(out);
        }

        @Override
        public Map<Long, Double> convertToEntityAttribute(String column) {
            if (column == null) {
                return null;
            }
            JsonNode node = read(column);
            if (!node.isObject()) {
                throw new IllegalStateException("stored depot ratios must be a JSON object, were: " + column);
            }
            Map<Long, Double> ratios = new LinkedHashMap<>();
            node.fields().forEachRemaining(e -> {
                if (!e.getValue().isNumber()) {
                    throw new IllegalStateException("a stored depot ratio must be a number, was: " + column);
                }
                ratios.put(Long.parseLong(e.getKey()), e.getValue().doubleValue());
            });
            return ratios;
        }
    }

    private static ArrayNode numbers(double[] values) {
        ArrayNode out = JSON.createArrayNode();
        for (double v : values) {
            if (Double.isFinite(v)) {
                out.add(v);
            } else {
                out.addNull();
            }
        }
        return out;
    }

    private static double[] numbers(ArrayNode array, String column) {
        double[] values = new double[array.size()];
        for (int i = 0; i < values.length; i++) {
            JsonNode v = array.get(i);
            if (v.isNull()) {
                values[i] = Double.NaN;
            } else if (v.isNumber()) {
                values[i] = v.doubleValue();
            } else {
                throw new IllegalStateException("a stored list of numbers holds only numbers and nulls, was: " + column);
            }
        }
        return values;
    }

    private static ArrayNode array(String column) {
        JsonNode node = read(column);
        if (!node.isArray()) {
            throw new IllegalStateException("a stored list must be a JSON array, was: " + column);
        }
        return (ArrayNode) node;
    }

    private static JsonNode read(String column) {
        try {
            return JSON.readTree(column);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a stored fleet model list is not valid JSON: " + column, e);
        }
    }

    private static String write(JsonNode node) {
        try {
            return JSON.writeValueAsString(node);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write a fleet model list as JSON", e);
        }
    }
}
