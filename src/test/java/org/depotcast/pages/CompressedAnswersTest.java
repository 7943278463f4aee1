package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.config.DecoderConfig;
import io.restassured.config.RestAssuredConfig;
import org.junit.jupiter.api.Test;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;

/**
 * The mechanic's first load on a phone connection is the page, its modules and the JSON of the pumps and kit: all
 * are sent gzip-compressed to a browser that says it accepts gzip, and uncompressed to one that does not.
 */
@QuarkusTest
class CompressedAnswersTest {

    @Test
    void pagesModulesAndStylesAreSentCompressed() {
        for (String file : new String[] {"/app/mechanic/", "/app/mechanic/forms.js", "/app/css/app.css"}) {
            given().header("Accept-Encoding", "gzip").get(file).then().statusCode(200)
                    .header("Content-Encoding", equalTo("gzip"));
        }
    }

    @Test
    void jsonAnswersAreSentCompressed() {
        as("mechanic3").header("Accept-Encoding", "gzip").get("/api/pumps").then().statusCode(200)
                .header("Content-Encoding", equalTo("gzip"));
    }

    @Test
    void aClientThatDoesNotAcceptGzipGetsThePlainAnswer() {
        // REST Assured asks for gzip on its own unless its decoders are off.
        given().config(RestAssuredConfig.config().decoderConfig(DecoderConfig.decoderConfig().noContentDecoders()))
                .header("Accept-Encoding", "identity").get("/app/mechanic/forms.js").then().statusCode(200)
                .header("Content-Encoding", not(equalTo("gzip")));
    }
}
