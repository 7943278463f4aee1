package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.junit.jupiter.api.Assertions.assertNotNull;

/**
 * After an upgrade a browser must not keep yesterday's page modules beside today's page: page files may be kept but
 * are checked with the server at every load (max-age 0), and an unchanged file costs a 304 without its body.
 */
@QuarkusTest
class PageFilesRevalidatedTest {

    @Test
    void pageFilesAreCheckedWithTheServerAtEveryLoad() {
        for (String file : new String[] {"/app/officer/", "/app/js/format.js", "/app/css/app.css"}) {
            given().get(file).then().statusCode(200).header("Cache-Control", containsString("max-age=0"));
        }
    }

    @Test
    void anUnchangedFileIsAnsweredNotModified() {
        String lastModified = given().get("/app/js/format.js").then().statusCode(200).extract()
                .header("Last-Modified");
        assertNotNull(lastModified, "a page file carries its Last-Modified date");
        given().header("If-Modified-Since", lastModified).get("/app/js/format.js").then().statusCode(304);
    }
}
