package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The API document describes every operation, tags it by feature, and gives request numbers their units and bounds. */
@QuarkusTest
class ApiDocumentTest {
    private JsonNode document;

    @Test
    void everyOperationHasASummaryADescriptionAndAFeatureTag() throws Exception {
        document = ApiOperations.document();
        List<String> missing = new ArrayList<>();
        int operations = 0;
        for (ApiOperations.Operation op : ApiOperations.all(document)) {
            operations++;
            String name = op.method() + " " + op.path();
            if (op.node().path("summary").asText().isBlank()) {
                missing.add(name + ": summary");
            }
            if (op.node().path("description").asText().isBlank()) {
                missing.add(name + ": description");
            }
            if (op.node().path("tags").isEmpty()) {
                missing.add(name + ": tag");
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
        document = ApiOperations.document();
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

    /**
     * A service level's words agree with the bounds its schema gives: "strictly between 0 and 1" only where 0 and 1 are
     * its exclusive bounds (the calculators), and its own range where the service refuses more (a spend scenario's
     * 0.5 to 0.999).
     */
    @Test
    void serviceLevelsAreDescribedByTheBoundsTheirSchemasGive() throws Exception {
        document = ApiOperations.document();
        List<String> wrong = new ArrayList<>();
        int levels = 0;
        for (Iterator<Map.Entry<String, JsonNode>> schemas = document.at("/components/schemas").fields(); schemas.hasNext(); ) {
            Map.Entry<String, JsonNode> schema = schemas.next();
            for (String name : List.of("serviceLevel", "level")) {
                JsonNode level = schema.getValue().at("/properties/" + name);
                if (!level.isMissingNode() && (level.has("minimum") || level.has("exclusiveMinimum"))) {
                    levels += checkLevel(schema.getKey() + "." + name, level, wrong);
                }
            }
        }
        assertTrue(levels >= 3, "read " + levels + " bounded service levels");
        assertTrue(wrong.isEmpty(), String.join("\n", wrong));
        assertTrue(document.at("/components/schemas/ScenarioDefinition/properties/serviceLevel/description").asText()
                .contains("0.5 to 0.999"), "the spend scenario's level");
    }

    /** 1 after checking one level's words against its bounds (a mismatch is added to {@code wrong}). */
    private static int checkLevel(String name, JsonNode level, List<String> wrong) {
        String words = level.path("description").asText();
        String least = level.has("minimum") ? level.get("minimum").asText() : level.get("exclusiveMinimum").asText();
        String most = level.has("maximum") ? level.get("maximum").asText() : level.path("exclusiveMaximum").asText();
        boolean open01 = !level.has("minimum") && "0".equals(least) && !level.has("maximum") && "1".equals(most);
        if (open01 != words.contains("strictly between 0 and 1") || !open01 && !(words.contains(least) && words.contains(most))) {
            wrong.add(name + ": [" + least + ", " + most + "] described as '" + words + "'");
        }
        return 1;
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
