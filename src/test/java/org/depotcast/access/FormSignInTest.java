package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import org.junit.jupiter.api.Test;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;

/** Pages sign in with a form and a session cookie; the API keeps HTTP basic and answers 401, not a redirect. */
@QuarkusTest
class FormSignInTest {
    @Test
    void formSignInGivesASessionForThePages() {
        given().redirects().follow(false).get("/pages/index.html").then().statusCode(302)
                .header("Location", containsString("sign-in.html"));
        Response signIn = given().redirects().follow(false).formParam("j_username", "lead")
                .formParam("j_password", "lead-demo").post("/j_security_check");
        signIn.then().statusCode(302);
        String cookie = signIn.getCookie("quarkus-credential");
        given().cookie("quarkus-credential", cookie).get("/pages/index.html").then().statusCode(200)
                .body(containsString("signed in"));
        Response refused = given().redirects().follow(false).formParam("j_username", "lead").formParam("j_password", "wrong")
                .post("/j_security_check");
        org.junit.jupiter.api.Assertions.assertTrue(refused.statusCode() == 401 || refused.statusCode() == 302);
        org.junit.jupiter.api.Assertions.assertNull(refused.getCookie("quarkus-credential"), "no session for a wrong password");
        given().redirects().follow(false).get("/api/parts").then().statusCode(401);
    }
}
