package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A numeric identifier in the path that is not a whole number is the client's malformed value: a 400 problem naming
 * the parameter, not the bare 404 Quarkus REST gives when it cannot convert a path parameter. A well-formed id that
 * matches nothing stays a 404.
 */
@QuarkusTest
class MalformedPathTest {
    private static final List<String> MALFORMED = List.of("abc", "1.5", "9223372036854775808");

    @Test
    void everyNumericPathParameterRefusesAMalformedValueNamingIt() throws Exception {
        List<String> failures = new ArrayList<>();
        int sent = 0;
        for (ApiOperations.Operation op : ApiOperations.all(ApiOperations.document())) {
            for (JsonNode parameter : op.node().path("parameters")) {
                if (!"path".equals(parameter.path("in").asText())
                        || !"integer".equals(parameter.at("/schema/type").asText())) {
                    continue;
                }
                String name = parameter.get("name").asText();
                for (String bad : MALFORMED) {
                    sent++;
                    check(op.method(), op.path().replace("{" + name + "}", bad), name, failures);
                }
            }
        }
        assertTrue(sent > 40, "sent " + sent);
        assertTrue(failures.isEmpty(), failures.size() + " mishandled:\n" + String.join("\n", failures));
    }

    @Test
    void aWellFormedIdThatMatchesNothingIsStillNotFound() {
        as("officer").get("/api/stock/movements/999999999").then().statusCode(404)
                .contentType("application/problem+json").body("type", equalTo("/problems/not-found"));
        as("officer").get("/api/stock/movements/abc").then().statusCode(400)
                .contentType("application/problem+json").body("type", equalTo("/problems/invalid-input"))
                .body("errors[0].field", equalTo("id"))
                .body("errors[0].message", equalTo("must be a whole number, was 'abc'"));
    }

    private static void check(String method, String url, String name, List<String> failures) {
        Response answer = ApiOperations.asFirstAllowed(r -> r.contentType("application/json").body("{}")
                .request(method, url));
        String what = method + " " + url + " → " + answer.statusCode();
        if (answer.statusCode() != 400 || !answer.contentType().startsWith("application/problem+json")) {
            failures.add(what + " " + answer.asString());
        } else if (!List.of(name).equals(answer.jsonPath().getList("errors.field"))) {
            failures.add(what + " named " + answer.jsonPath().getList("errors.field") + ", not " + name);
        }
    }
}
