package org.depotcast.common;

import com.fasterxml.jackson.databind.JsonNode;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A body of a type an operation does not read is a 415 problem naming the Content-Type header and quoting what was
 * sent, not a bare "Unsupported Media Type": for every operation with a body in the API document.
 */
@QuarkusTest
class UnreadableMediaTypeTest {
    @Test
    void plainTextToAJsonEndpointNamesTheHeaderAndWhatWasSent() {
        as("officer").contentType("text/plain").body("{}").post("/api/stock/movements").then().statusCode(415)
                .contentType("application/problem+json").body("type", equalTo("/problems/unsupported-media-type"))
                .body("errors[0].field", equalTo("Content-Type"))
                .body("errors[0].message", containsString("'text/plain"))
                .body("detail", containsString("application/json"));
    }

    @Test
    void everyOperationWithABodyRefusesAnotherTypeNamingTheHeader() throws Exception {
        List<String> failures = new ArrayList<>();
        int sent = 0;
        for (ApiOperations.Operation op : ApiOperations.all(ApiOperations.document())) {
            JsonNode content = op.node().at("/requestBody/content");
            if (content.isMissingNode() || content.has("application/x-www-form-urlencoded")) {
                continue;
            }
            // XML is read by none; a JSON operation also gets text/plain, an upload JSON.
            String other = content.has("application/json") ? "text/plain" : "application/json";
            for (String type : List.of("application/xml", other)) {
                sent++;
                check(op.method(), op.path().replaceAll("\\{[^}]+}", "1"), type, failures);
            }
        }
        assertTrue(sent > 60, "sent " + sent);
        assertTrue(failures.isEmpty(), failures.size() + " mishandled:\n" + String.join("\n", failures));
    }

    private static void check(String method, String url, String type, List<String> failures) {
        Response answer = ApiOperations.asFirstAllowed(r -> r.contentType(type).body("{}").request(method, url));
        String what = method + " " + url + " as " + type + " → " + answer.statusCode();
        if (answer.statusCode() != 415 || !answer.contentType().startsWith("application/problem+json")) {
            failures.add(what + " " + answer.asString());
        } else if (!List.of("Content-Type").equals(answer.jsonPath().getList("errors.field"))
                || !answer.jsonPath().getString("errors[0].message").contains("'" + type)) {
            failures.add(what + " " + answer.asString());
        }
    }
}
