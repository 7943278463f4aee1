package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.util.Set;

import static io.restassured.RestAssured.given;

@QuarkusTest
class SignInThrottleTest {
    @Inject
    AccountService accounts;

    @Test
    void repeatedFailuresSlowSignInDown() throws InterruptedException {
        String name = TestData.unique("throttle").toLowerCase();
        accounts.create(name, "a-proper-secret", Set.of(Roles.PROGRAMME_LEAD), null);
        given().auth().preemptive().basic(name, "a-proper-secret").get("/api/parts").then().statusCode(200);
        for (int i = 0; i < AccountIdentityProvider.FREE_FAILURES; i++) {
            given().auth().preemptive().basic(name, "guess-" + i).get("/api/parts").then().statusCode(401);
        }
        // Even the right password is refused while the wait runs (1 s after the fifth failure) ...
        given().auth().preemptive().basic(name, "a-proper-secret").get("/api/parts").then().statusCode(401);
        Thread.sleep(1_200);
        // ... and accepted once it has passed.
        given().auth().preemptive().basic(name, "a-proper-secret").get("/api/parts").then().statusCode(200);
    }
}
