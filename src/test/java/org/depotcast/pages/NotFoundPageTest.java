package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;

/** An address with no page behind it: a browser reads a page in words, an API client still a problem. */
@QuarkusTest
class NotFoundPageTest {
    private static final String BROWSER = "text/html,application/xhtml+xml,application/xml;q=0.9,*/*;q=0.8";

    @Test
    void aBrowserOpeningAnUnknownPageAddressReadsWhereToGo() {
        given().accept(BROWSER).get("/app/officer/no-such-page.html").then().statusCode(404)
                .contentType(containsString("text/html"))
                .body(containsString("There is no page at this address"))
                .body(containsString("/app/officer/no-such-page.html"))
                .body(containsString("href=\"/\""))
                .body(not(containsString("\"status\"")));
        given().accept(BROWSER).get("/app/nosuch").then().statusCode(404).contentType(containsString("text/html"));
    }

    @Test
    void theAddressIsShownAsTextNeverAsMarkup() {
        given().accept(BROWSER).urlEncodingEnabled(false).get("/app/%3Cb%3Ebold%3C%2Fb%3E").then().statusCode(404)
                .body(containsString("&lt;b&gt;bold&lt;/b&gt;")).body(not(containsString("<b>bold")));
    }

    @Test
    void apiClientsAndTheApiKeepTheProblemAnswer() {
        given().accept("application/json").get("/app/nosuch").then().statusCode(404)
                .contentType("application/problem+json").body("status", equalTo(404));
        as("officer").accept(BROWSER).get("/api/no-such-thing").then().statusCode(404)
                .contentType("application/problem+json");
        given().get("/app/nosuch").then().statusCode(404).contentType("application/problem+json");
    }
}
