package org.depotcast.pages;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.lessThanOrEqualTo;
import static org.hamcrest.Matchers.nullValue;

/** What the server does for the pages: who is signed in, the root address, the static files, the latest run. */
@QuarkusTest
class PagesServerTest {
    private static final String PROBLEM = "application/problem+json";

    @Inject
    ForecastRunService runs;

    @Test
    void meNamesTheAccountItsLocationsItsKitAndItsHomePage() {
        as("officer2").get("/api/me").then().statusCode(200).body("username", equalTo("officer2"))
                .body("roles", contains("stores-officer")).body("locationCodes", contains("DEP-PELLOWDENE"))
                .body("kitCode", nullValue()).body("home", equalTo("/app/officer/"));
        as("mechanic1").get("/api/me").then().statusCode(200).body("kitCode", equalTo("KIT-M01"))
                .body("locationCodes", empty()).body("home", equalTo("/app/mechanic/"));
        as("lead").get("/api/me").then().statusCode(200).body("home", equalTo("/app/lead/"));
        as("admin").get("/api/me").then().statusCode(200).body("home", equalTo("/app/admin/"));
        given().get("/api/me").then().statusCode(401).contentType(PROBLEM);
    }

    @Test
    void rootOpensTheSignedInUsersHomePageOrTheSignInPage() {
        given().redirects().follow(false).get("/").then().statusCode(303)
                .header("Location", containsString("/sign-in.html"));
        as("mechanic1").redirects().follow(false).get("/").then().statusCode(303)
                .header("Location", containsString("/app/mechanic/"));
        as("officer").redirects().follow(false).get("/").then().statusCode(303)
                .header("Location", containsString("/app/officer/"));
    }

    @Test
    void pagesAndTheirFilesAreServedWithoutSignIn() {
        given().get("/app/mechanic/").then().statusCode(200).contentType(containsString("text/html"))
                .body(containsString("My kit and pumps"));
        given().get("/app/js/api.js").then().statusCode(200).contentType(containsString("javascript"));
        given().get("/app/css/app.css").then().statusCode(200).contentType(containsString("text/css"));
        given().get("/app/favicon.svg").then().statusCode(200).contentType(containsString("svg"));
        given().get("/favicon.ico").then().statusCode(200);
        given().get("/app/refused.html").then().statusCode(200).body(containsString("not open to your account"));
    }

    @Test
    void recentRunsListTheLatestFinishedRunFirst() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", LocalDate.of(2026, 12, 2));
        }
        long latest = runs.latestFinished().orElseThrow().id;
        as("officer2").get("/api/forecast/runs?status=DONE&limit=1").then().statusCode(200)
                .body("$", hasSize(1)).body("[0].id", equalTo((int) latest)).body("[0].status", equalTo("DONE"));
        as("lead").get("/api/forecast/runs").then().statusCode(200).body("size()", lessThanOrEqualTo(10))
                .body("status", everyItem(org.hamcrest.Matchers.oneOf("RUNNING", "DONE", "FAILED")));
        as("lead").get("/api/forecast/runs?status=finished").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("status"));
        as("lead").get("/api/forecast/runs?limit=0").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("limit"));
    }
}
