package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;

/** The API document the service serves, as the tests that walk every operation read it. */
final class ApiOperations {
    /** Each demo role, tried in turn until one is let in. */
    private static final List<String> ROLES = List.of("admin", "officer", "lead", "mechanic1");

    /** One operation: its method in capitals, its path as documented ({id} and all) and its document node. */
    record Operation(String method, String path, JsonNode node) {
    }

    private ApiOperations() {
    }

    static JsonNode document() throws IOException {
        return new ObjectMapper().readTree(given().accept("application/json").get("/q/openapi?format=json").asString());
    }

    static List<Operation> all(JsonNode document) {
        List<Operation> operations = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> paths = document.get("paths").fields(); paths.hasNext(); ) {
            Map.Entry<String, JsonNode> path = paths.next();
            for (Iterator<Map.Entry<String, JsonNode>> ops = path.getValue().fields(); ops.hasNext(); ) {
                Map.Entry<String, JsonNode> op = ops.next();
                operations.add(new Operation(op.getKey().toUpperCase(), path.getKey(), op.getValue()));
            }
        }
        return operations;
    }

    /** The answer to {@code send} as the first role not refused with 403 (the last role's answer if all are). */
    static Response asFirstAllowed(Function<RequestSpecification, Response> send) {
        Response answer = null;
        for (String role : ROLES) {
            answer = send.apply(as(role));
            if (answer.statusCode() != 403) {
                break;
            }
        }
        return answer;
    }
}
