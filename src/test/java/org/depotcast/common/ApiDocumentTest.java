package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The API document describes every operation, tags it by feature, and gives request numbers their units and bounds. */
@QuarkusTest
class ApiDocumentTest {
    private JsonNode document;

    @Test
    void everyOperationHasASummaryADescriptionAndAFeatureTag() throws Exception {
        document = new ObjectMapper().readTree(given().accept("application/json").get("/q/openapi?format=json").asString());
        List<String> missing = new ArrayList<>();
        int operations = 0;
        for (Iterator<Map.Entry<String, JsonNode>> paths = document.get("paths").fields(); paths.hasNext(); ) {
            Map.Entry<String, JsonNode> path = paths.next();
            for (Iterator<Map.Entry<String, JsonNode>> ops = path.getValue().fields(); ops.hasNext(); ) {
                Map.Entry<String, JsonNode> op = ops.next();
                operations++;
                String name = op.getKey().toUpperCase() + " " + path.getKey();
                if (op.getValue().path("summary").asText().isBlank()) {
                    missing.add(name + ": summary");
                }
                if (op.getValue().path("description").asText().isBlank()) {
                    missing.add(name + ": description");
                }
                if (op.getValue().path("tags").isEmpty()) {
                    missing.add(name + ": tag");
                }
            }
        }
        assertTrue(operations > 90, "walked " + operations + " operations");
        assertTrue(missing.isEmpty(), String.join("\n", missing));
        String description = document.at("/info/description").asText();
        assertTrue(description.contains("trained, licensed people") && description.contains("drinking water"),
                "the document carries the safety caution");
    }

    @Test
    void requestNumbersCarryUnitsAndAnUpperBound() throws Exception {
        document = new ObjectMapper().readTree(given().accept("application/json").get("/q/openapi?format=json").asString());
        List<String> missing = new ArrayList<>();
        for (JsonNode pathItem : document.get("paths")) {
            for (JsonNode op : pathItem) {
                JsonNode schema = op.at("/requestBody/content/application~1json/schema");
                if (!schema.isMissingNode()) {
                    check(resolve(schema), "", missing, 0);
                }
            }
        }
        assertTrue(missing.isEmpty(), String.join("\n", missing));
    }

    private void check(JsonNode schema, String prefix, List<String> missing, int depth) {
        if (depth > 5) {
            return;
        }
        schema.path("properties").fields().forEachRemaining(p -> {
            JsonNode type = resolve(p.getValue());
            String name = prefix + p.getKey();
            switch (type.path("type").asText()) {
                case "number", "integer" -> {
                    // A 64-bit identifier, version or seed is bounded by its format (int64), which Jackson enforces.
                    if (!type.has("maximum") && !type.has("exclusiveMaximum") && !"int64".equals(type.path("format").asText())) {
                        missing.add(name + ": maximum");
                    }
                    if (p.getValue().path("description").asText().isBlank() && type.path("description").asText().isBlank()) {
                        missing.add(name + ": units");
                    }
                }
                case "array" -> {
                    JsonNode items = resolve(type.path("items"));
                    check(items, name + "[].", missing, depth + 1);
                    if (!type.has("maxItems") && ("number".equals(items.path("type").asText()) || items.has("properties"))) {
                        missing.add(name + ": maxItems");
                    }
                    if ("number".equals(items.path("type").asText()) && !items.has("maximum") && !items.has("exclusiveMaximum")) {
                        missing.add(name + "[]: maximum");
                    }
                }
                case "object" -> check(type, name + ".", missing, depth + 1);
                default -> {
                }
            }
        });
    }

    private JsonNode resolve(JsonNode schema) {
        JsonNode current = schema;
        for (int i = 0; i < 10 && current.has("$ref"); i++) {
            current = document.at(current.get("$ref").asText().substring(1));
        }
        return current;
    }
}
