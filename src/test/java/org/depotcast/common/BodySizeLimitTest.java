package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;

/** A body over the limit (10 MB by default) is answered with a 413 problem naming the body, declared or chunked. */
@QuarkusTest
class BodySizeLimitTest {
    private static final int OVER_LIMIT = 10 * 1024 * 1024 + 1;

    private static byte[] jsonOf(int bytes) {
        byte[] body = new byte[bytes];
        Arrays.fill(body, (byte) ' ');
        byte[] start = "{\"note\":\"".getBytes(StandardCharsets.US_ASCII);
        System.arraycopy(start, 0, body, 0, start.length);
        Arrays.fill(body, start.length, bytes - 2, (byte) 'a');
        body[bytes - 2] = '"';
        body[bytes - 1] = '}';
        return body;
    }

    @Test
    void aDeclaredLengthOverTheLimitIsRefusedWithAProblem() {
        as("officer").contentType("application/json").body(jsonOf(OVER_LIMIT)).post("/api/stock/movements")
                .then().statusCode(413).contentType("application/problem+json")
                .body("type", equalTo("/problems/body-too-large")).body("errors[0].field", equalTo("body"))
                .body("detail", containsString("10485760"));
    }

    @Test
    void aChunkedBodyOverTheLimitIsRefusedWithAProblem() {
        // An input stream of unknown length is sent chunked, without a Content-Length.
        as("officer").contentType("text/csv").body(new ByteArrayInputStream(jsonOf(OVER_LIMIT)))
                .post("/api/parts/import")
                .then().statusCode(413).contentType("application/problem+json")
                .body("type", equalTo("/problems/body-too-large")).body("errors[0].field", equalTo("body"));
    }

    @Test
    void aBodyJustUnderTheLimitIsRead() {
        // read and judged on its content (a movement without kind, part or quantity): a 400, not a 413
        as("officer").contentType("application/json").body(jsonOf(OVER_LIMIT - 2)).post("/api/stock/movements")
                .then().statusCode(400).contentType("application/problem+json")
                .body("type", equalTo("/problems/invalid-input"));
    }
}
