package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Walks the API document and sends bad values of each type to every field of every JSON body and to every query
 * parameter, signed in with a role the operation allows. Every answer must be a 4xx problem naming the field (a
 * filter that finds nothing may answer 200 with an empty list), and nothing may be written.
 */
@QuarkusTest
class HostileInputTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** Tried in turn until one is allowed to call the operation. */
    private static final List<String> ROLES = List.of("admin", "officer", "lead", "mechanic1");
    /** Query parameters that are numbers or dates: a bad value must be a 400 naming the parameter. */
    private static final Set<String> TYPED_PARAMETERS = Set.of("limit", "years", "horizon", "alpha", "beta", "since",
            "status", "kind", "state", "family", "runs");

    /** Refused by every numeric field; 1e-3000000 only by decimals (a double reads it as 0, an integer as 0). */
    private static final List<String> BAD_NUMBERS = List.of("1e400", "-1e3000000", "\"NaN\"", "1e15", "\"twelve\"",
            "9".repeat(2000));
    private static final List<String> BAD_DECIMALS = concat(BAD_NUMBERS, List.of("1e-3000000"));
    /** 64-bit identifiers, versions and seeds take any whole number that fits. */
    private static final List<String> BAD_LONGS = List.of("1e400", "99999999999999999999", "\"NaN\"", "\"twelve\"",
            "9".repeat(2000));
    private static final List<String> BAD_DATES = List.of("\"0000-01-01\"", "\"-999999999-01-01\"", "\"31/12/2020\"",
            "\"" + LocalDate.now(ZoneOffset.UTC).plusYears(20) + "\"");
    private static final List<String> BAD_DATE_TIMES = List.of("\"0000-01-01T00:00:00Z\"",
            "\"-999999999-01-01T00:00:00Z\"", "\"yesterday\"", "\"" + OffsetDateTime.now(ZoneOffset.UTC).plusYears(20) + "\"");
    private static final List<String> BAD_STRINGS = List.of("\"" + "x".repeat(10_000) + "\"");
    private static final List<String> BAD_QUERY_VALUES = List.of("1e400", "-1", "0000-01-01", "x".repeat(2_000));

    private JsonNode document;

    @Test
    void everyBadValueIsRefusedNamingItsFieldAndNothingIsWritten() throws Exception {
        document = JSON.readTree(given().accept("application/json").get("/q/openapi?format=json").asString());
        String before = ledgerState();
        int bodies = 0, parameters = 0;
        Set<String> schemasWalked = new java.util.HashSet<>();
        List<String> failures = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> paths = document.get("paths").fields(); paths.hasNext(); ) {
            Map.Entry<String, JsonNode> path = paths.next();
            for (Iterator<Map.Entry<String, JsonNode>> ops = path.getValue().fields(); ops.hasNext(); ) {
                Map.Entry<String, JsonNode> op = ops.next();
                String method = op.getKey().toUpperCase();
                String url = path.getKey().replaceAll("\\{[^}]+}", "1");
                JsonNode schema = op.getValue().at("/requestBody/content/application~1json/schema");
                if (!schema.isMissingNode()) {
                    ObjectNode base = (ObjectNode) example(resolve(schema));
                    // A body another operation has already taken gets one bad value per field: the same record
                    // validates the same way, and the suite stays fast.
                    boolean seen = !schemasWalked.add(schema.path("$ref").asText(method + url));
                    for (Map.Entry<String, List<String>> field : hostileFields(resolve(schema), "").entrySet()) {
                        for (String bad : seen ? field.getValue().subList(0, 1) : field.getValue()) {
                            bodies++;
                            checkBody(method, url, base, field.getKey(), bad, failures);
                        }
                    }
                }
                for (JsonNode parameter : op.getValue().path("parameters")) {
                    if (!"query".equals(parameter.path("in").asText())) {
                        continue;
                    }
                    // A free-text filter (a location, a part) gets the long string only: other values would just
                    // filter to nothing, at the cost of a whole computation each.
                    String name = parameter.get("name").asText();
                    for (String bad : TYPED_PARAMETERS.contains(name) ? BAD_QUERY_VALUES : BAD_QUERY_VALUES.subList(3, 4)) {
                        parameters++;
                        checkQuery(method, url, name, bad, failures);
                    }
                }
            }
        }
        assertTrue(bodies > 200 && parameters > 30, "walked " + bodies + " bodies and " + parameters + " parameters");
        assertTrue(failures.isEmpty(), failures.size() + " mishandled:\n" + String.join("\n", failures));
        assertEquals(before, ledgerState(), "nothing written");
    }

    private void checkBody(String method, String url, ObjectNode base, String field, String bad, List<String> failures) {
        String body = withValue(base, field, bad);
        Response answer = allowed(spec -> spec.contentType("application/json").body(body).request(method, url));
        String what = method + " " + url + " " + field + "=" + shorten(bad) + " → " + answer.statusCode();
        if (answer.statusCode() >= 500 || answer.statusCode() < 400) {
            failures.add(what);
            return;
        }
        if (!answer.contentType().startsWith("application/problem+json")) {
            failures.add(what + " without a problem body");
            return;
        }
        List<String> fields = answer.jsonPath().getList("errors.field");
        if (fields == null || fields.stream().noneMatch(f -> f.equals(field) || f.startsWith(field + "[")
                || field.startsWith(f + "."))) {
            failures.add(what + " named " + fields + ", not " + field);
        }
    }

    private void checkQuery(String method, String url, String name, String bad, List<String> failures) {
        Response answer = allowed(spec -> spec.queryParam(name, bad).request(method, url));
        String what = method + " " + url + "?" + name + "=" + shorten(bad) + " → " + answer.statusCode();
        int status = answer.statusCode();
        if (status >= 500 || (TYPED_PARAMETERS.contains(name) && status < 400)) {
            failures.add(what);
            return;
        }
        if (status == 400 || status == 422) {
            List<String> fields = answer.jsonPath().getList("errors.field");
            if (fields == null || fields.isEmpty()) {
                failures.add(what + " without a field");
            } else if (TYPED_PARAMETERS.contains(name) && !fields.contains(name)) {
                failures.add(what + " named " + fields + ", not " + name);
            }
        }
    }

    /** The answer for the first role allowed to call the operation (the last role's answer if none is). */
    private static Response allowed(java.util.function.Function<RequestSpecification, Response> call) {
        Response answer = null;
        for (String role : ROLES) {
            answer = call.apply(as(role));
            if (answer.statusCode() != 403) {
                return answer;
            }
        }
        return answer;
    }

    /** Each field (dotted, with [0] into arrays) and the bad values for its type. */
    private Map<String, List<String>> hostileFields(JsonNode schema, String prefix) {
        Map<String, List<String>> fields = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = schema.path("properties").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> property = it.next();
            String name = prefix + property.getKey();
            JsonNode type = resolve(property.getValue());
            switch (type.path("type").asText()) {
                case "number", "integer" -> fields.put(name, switch (type.path("format").asText()) {
                    case "int64" -> BAD_LONGS;
                    case "double", "float", "int32" -> BAD_NUMBERS;
                    default -> BAD_DECIMALS;
                });
                case "string" -> fields.put(name, "date".equals(type.path("format").asText()) ? BAD_DATES
                        : "date-time".equals(type.path("format").asText()) ? BAD_DATE_TIMES
                        : type.has("enum") ? List.of("\"NOT-A-VALUE\"", "12") : BAD_STRINGS);
                case "array" -> {
                    JsonNode items = resolve(type.path("items"));
                    if (items.has("properties")) {
                        fields.putAll(hostileFields(items, name + "[0]."));
                    } else {
                        fields.put(name, List.of("12", "\"x\"", "{\"a\": 1}"));
                    }
                }
                case "object" -> {
                    if (type.has("properties")) {
                        fields.putAll(hostileFields(type, name + "."));
                    } else {
                        fields.put(name, List.of("12", "\"x\"", "[1]"));
                    }
                }
                default -> fields.put(name, List.of("{\"a\": [1]}"));
            }
        }
        return fields;
    }

    /** A plausible value of each field, so that the bad one is what the answer is about. */
    private JsonNode example(JsonNode schema) {
        JsonNode type = resolve(schema);
        if (type.has("enum")) {
            return type.get("enum").get(0);
        }
        return switch (type.path("type").asText()) {
            case "object" -> {
                ObjectNode object = NODES.objectNode();
                type.path("properties").fields().forEachRemaining(p -> object.set(p.getKey(), example(p.getValue())));
                yield object;
            }
            case "array" -> NODES.arrayNode().add(example(type.path("items")));
            case "number", "integer" -> NODES.numberNode(1);
            case "boolean" -> NODES.booleanNode(false);
            case "string" -> switch (type.path("format").asText()) {
                case "date" -> NODES.textNode(LocalDate.now(ZoneOffset.UTC).minusDays(1).toString());
                case "date-time" -> NODES.textNode(OffsetDateTime.now(ZoneOffset.UTC).minusDays(1).toString());
                default -> NODES.textNode("HOSTILE-1");
            };
            default -> NODES.nullNode();
        };
    }

    private JsonNode resolve(JsonNode schema) {
        JsonNode current = schema;
        for (int i = 0; i < 10 && current.has("$ref"); i++) {
            current = document.at(current.get("$ref").asText().substring(1));
        }
        if (current.has("allOf") && current.get("allOf").size() == 1) {
            return resolve(current.get("allOf").get(0));
        }
        return current;
    }

    private static String withValue(ObjectNode base, String field, String bad) {
        // Written as text, so values Jackson would not write (1e3000000, a 2,000-digit number) reach the server as sent.
        ObjectNode copy = base.deepCopy();
        String marker = "\"@@HOSTILE@@\"";
        JsonNode node = copy;
        String[] steps = field.split("\\.");
        for (int i = 0; i < steps.length; i++) {
            String step = steps[i].replace("[0]", "");
            boolean intoArray = steps[i].endsWith("[0]");
            boolean last = i == steps.length - 1;
            ObjectNode object = (ObjectNode) node;
            if (last) {
                object.put(step, "@@HOSTILE@@");
            } else if (intoArray) {
                node = ((ArrayNode) object.get(step)).get(0);
            } else {
                node = object.get(step);
            }
        }
        return copy.toString().replace(marker, bad);
    }

    private static List<String> concat(List<String> a, List<String> b) {
        List<String> all = new ArrayList<>(a);
        all.addAll(b);
        return List.copyOf(all);
    }

    private static String shorten(String value) {
        return value.length() > 40 ? value.substring(0, 40) + "…(" + value.length() + ")" : value;
    }

    /** The reconcile report and the number of movements, repairs, requests, orders and pumps. */
    private static String ledgerState() {
        StringBuilder state = new StringBuilder(as("admin").get("/api/stock/reconcile").asString());
        for (String list : List.of("/api/stock/movements?limit=10000", "/api/repairs?limit=10000", "/api/requests",
                "/api/purchase-orders", "/api/pumps", "/api/parts", "/api/locations", "/api/planning/transfers",
                "/api/spend/scenarios", "/api/accounts")) {
            Response answer = as("admin").get(list);
            assertFalse(answer.statusCode() >= 400, list + " answered " + answer.statusCode());
            state.append('\n').append(list).append(' ').append(answer.jsonPath().getList("$").size());
        }
        return state.toString();
    }
}
