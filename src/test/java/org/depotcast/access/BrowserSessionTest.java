package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.RestAssured;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.UnitOfIssue;
import org.junit.jupiter.api.Test;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Browsers sign in with the form and then use the API with the session cookie, with the same roles and scopes as
 * HTTP basic; API clients keep HTTP basic. Cookie flags, forged cookies, cross-site writes and sign-out.
 */
@QuarkusTest
class BrowserSessionTest {
    private static final String COOKIE = "depotcast-session";

    @Inject
    TestData data;

    static String signIn(String user) {
        Response signIn = given().redirects().follow(false).formParam("username", user)
                .formParam("password", user + "-demo").post("/sign-in");
        signIn.then().statusCode(303).header("Location", containsString("/pages/"));
        String cookie = signIn.getCookie(COOKIE);
        assertNotNull(cookie, "a session cookie is set");
        return cookie;
    }

    private static String origin() {
        return "http://localhost:" + RestAssured.port;
    }

    @Test
    void formSignInOpensThePagesAndItsCookieCarriesTheFlags() {
        given().redirects().follow(false).get("/pages/index.html").then().statusCode(302)
                .header("Location", containsString("/sign-in.html?next=%2Fpages%2Findex.html"));
        Response signIn = given().redirects().follow(false).formParam("username", "lead")
                .formParam("password", "lead-demo").formParam("next", "/pages/index.html").post("/sign-in");
        signIn.then().statusCode(303).header("Location", containsString("/pages/index.html"));
        String setCookie = signIn.getHeader("Set-Cookie");
        assertTrue(setCookie.contains("HttpOnly"), setCookie);
        assertTrue(setCookie.contains("SameSite=Lax"), setCookie);
        assertTrue(setCookie.contains("Path=/"), setCookie);
        assertTrue(setCookie.contains("Max-Age=43200"), "a 12-hour lifetime: " + setCookie);
        assertFalse(setCookie.contains("Secure"), "plain HTTP in demo mode: " + setCookie);
        given().cookie(COOKIE, signIn.getCookie(COOKIE)).get("/pages/index.html").then().statusCode(200)
                .body(containsString("signed in"));
    }

    @Test
    void cookieIsSecureWhenServedOverHttps() {
        String setCookie = given().redirects().follow(false).header("X-Forwarded-Proto", "https")
                .formParam("username", "lead").formParam("password", "lead-demo").post("/sign-in").getHeader("Set-Cookie");
        assertTrue(setCookie.contains("; Secure"), setCookie);
    }

    @Test
    void failedFormSignInReturnsToTheFormWithoutABasicChallenge() {
        Response refused = given().redirects().follow(false).formParam("username", "lead")
                .formParam("password", "wrong-password").header("X-Forwarded-For", "10.9.0.1").post("/sign-in");
        refused.then().statusCode(303).header("Location", containsString("/sign-in.html?failed"))
                .header("WWW-Authenticate", nullValue());
        assertNull(refused.getCookie(COOKIE), "no session for a wrong password");
        given().accept("application/json").formParam("username", "lead").formParam("password", "wrong-password")
                .header("X-Forwarded-For", "10.9.0.1").post("/sign-in")
                .then().statusCode(401).contentType("application/problem+json")
                .body("type", equalTo("/problems/sign-in-refused")).header("WWW-Authenticate", nullValue());
        given().get("/sign-in.html").then().statusCode(200).body(containsString("Sign-in failed"));
    }

    @Test
    void sessionCookieSignsInToTheApiWithTheAccountsScope() {
        String cookie = signIn("officer2");
        given().cookie(COOKIE, cookie).get("/api/session").then().statusCode(200)
                .body("username", equalTo("officer2")).body("roles", org.hamcrest.Matchers.hasItem(Roles.STORES_OFFICER));
        given().cookie(COOKIE, cookie).get("/api/stock/balances?location=DEP-PELLOWDENE").then().statusCode(200);
        given().cookie(COOKIE, cookie).get("/api/stock/balances?location=DEP-TESHVALE").then().statusCode(403)
                .contentType("application/problem+json");
        given().cookie(COOKIE, cookie).get("/api/accounts").then().statusCode(403);
    }

    @Test
    void anonymousApiCallsGetA401ProblemAndPagesNoBasicChallenge() {
        given().get("/api/parts").then().statusCode(401).contentType("application/problem+json")
                .body("type", equalTo("/problems/unauthorized")).header("WWW-Authenticate", containsString("Basic"));
        given().header("X-Requested-With", "depotcast").get("/api/parts").then().statusCode(401)
                .contentType("application/problem+json").header("WWW-Authenticate", nullValue());
    }

    @Test
    void forgedOrGarbageCookiesSignInNoOne() {
        String cookie = signIn("lead");
        int dot = cookie.indexOf('.');
        char last = cookie.charAt(cookie.length() - 1);
        String alteredMac = cookie.substring(0, cookie.length() - 1) + (last == 'A' ? 'B' : 'A');
        String otherId = (cookie.charAt(0) == 'A' ? 'B' : 'A') + cookie.substring(1);
        for (String forged : new String[]{alteredMac, otherId, cookie.substring(0, dot), "garbage", "a.b", "lead",
                "x".repeat(500)}) {
            given().cookie(COOKIE, forged).get("/api/session").then().statusCode(401)
                    .contentType("application/problem+json");
        }
        // A public page still opens with a stale cookie, and a protected one sends the browser to sign in.
        given().cookie(COOKIE, "garbage").get("/sign-in.html").then().statusCode(200);
        given().redirects().follow(false).cookie(COOKIE, "garbage").get("/pages/index.html").then().statusCode(302)
                .header("Set-Cookie", containsString("Max-Age=0"));
        given().cookie(COOKIE, cookie).get("/api/session").then().statusCode(200);
    }

    @Test
    void signOutEndsTheSession() {
        String cookie = signIn("officer");
        given().cookie(COOKIE, cookie).get("/api/session").then().statusCode(200);
        given().redirects().follow(false).cookie(COOKIE, cookie).header("Origin", origin()).post("/sign-out")
                .then().statusCode(303).header("Location", containsString("/sign-in.html?signed-out"))
                .header("Set-Cookie", containsString("Max-Age=0"));
        // The old cookie, replayed by whoever kept a copy, no longer signs in.
        given().cookie(COOKIE, cookie).get("/api/session").then().statusCode(401);
        given().redirects().follow(false).cookie(COOKIE, cookie).get("/pages/index.html").then().statusCode(302);
    }

    @Test
    void crossSiteWritesWithTheCookieAreRefused() {
        String part = data.part(UnitOfIssue.EACH);
        String depot = data.depot();
        String cookie = signIn("officer");
        String movement = "{\"kind\":\"COUNT_ADJUSTMENT\",\"partNumber\":\"" + part + "\",\"to\":\"" + depot
                + "\",\"quantity\":2}";
        // Another site's form or script: no page header, or an Origin that is not this server.
        given().cookie(COOKIE, cookie).contentType("application/json").body(movement).post("/api/stock/movements")
                .then().statusCode(403).contentType("application/problem+json").body("detail", containsString("X-Requested-With"));
        given().cookie(COOKIE, cookie).header("X-Requested-With", "depotcast").header("Origin", "https://elsewhere.example")
                .contentType("application/json").body(movement).post("/api/stock/movements")
                .then().statusCode(403).contentType("application/problem+json").body("detail", containsString("cross-site"));
        given().cookie(COOKIE, cookie).header("X-Requested-With", "depotcast").header("Origin", "null")
                .contentType("application/json").body(movement).post("/api/stock/movements").then().statusCode(403);
        given().cookie(COOKIE, cookie).header("X-Requested-With", "depotcast")
                .header("Referer", "https://elsewhere.example/page").contentType("application/json").body(movement)
                .post("/api/stock/movements").then().statusCode(403);
        given().redirects().follow(false).cookie(COOKIE, cookie).header("Origin", "https://elsewhere.example")
                .post("/sign-out").then().statusCode(403);
        given().header("Origin", "https://elsewhere.example").formParam("username", "officer")
                .formParam("password", "officer-demo").post("/sign-in").then().statusCode(403);
        // The pages themselves: same origin and the header.
        given().cookie(COOKIE, cookie).header("X-Requested-With", "depotcast").header("Origin", origin())
                .contentType("application/json").body(movement).post("/api/stock/movements").then().statusCode(201);
        // API clients on HTTP basic are not affected.
        given().auth().preemptive().basic("officer", "officer-demo").header("Origin", "https://elsewhere.example")
                .contentType("application/json").body(movement).post("/api/stock/movements").then().statusCode(201);
        given().cookie(COOKIE, cookie).get("/api/stock/balances?location=" + depot).then().statusCode(200)
                .body("find { it.partNumber == '" + part + "' }.onHand", not(nullValue()));
    }
}
