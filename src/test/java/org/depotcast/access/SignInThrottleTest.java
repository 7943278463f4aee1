package org.depotcast.access;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.common.TooManyAttemptsException;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.notNullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Password guessing is paced per account and per client address, counted before the password is checked. Each test
 * poses as its own client address (X-Forwarded-For from the trusted local proxy), so tests do not pace each other.
 */
@QuarkusTest
class SignInThrottleTest {
    private static final AtomicInteger ADDRESSES = new AtomicInteger();

    @Inject
    AccountService accounts;
    @Inject
    PasswordCheck passwords;

    private static String newAddress() {
        return "10.77." + (ADDRESSES.incrementAndGet() / 250) + "." + (1 + ADDRESSES.get() % 250);
    }

    private String newAccount() {
        String name = TestData.unique("throttle").toLowerCase();
        accounts.create(name, "a-proper-secret", Set.of(Roles.PROGRAMME_LEAD), null);
        return name;
    }

    private static Response basic(String name, String password, String address) {
        return given().auth().preemptive().basic(name, password).header("X-Forwarded-For", address).get("/api/parts");
    }

    @Test
    void fortySimultaneousGuessesDoNotAllReachThePasswordCheck() throws Exception {
        String name = newAccount();
        String address = newAddress();
        int guesses = 40;
        ExecutorService pool = Executors.newFixedThreadPool(guesses);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<Response>> answers = new ArrayList<>();
        for (int i = 0; i < guesses; i++) {
            String password = "guess-" + i;
            answers.add(pool.submit(() -> {
                start.await();
                return basic(name, password, address);
            }));
        }
        long started = System.nanoTime();
        start.countDown();
        int checked = 0;
        for (Future<Response> answer : answers) {
            Response response = answer.get(120, TimeUnit.SECONDS);
            if (response.statusCode() == 429) {
                response.then().contentType("application/problem+json").header("Retry-After", notNullValue())
                        .body("type", equalTo("/problems/too-many-attempts"));
            } else {
                checked++;
            }
        }
        pool.shutdown();
        // On a loaded machine the 40 may take longer than the first pauses (1 s, then 2 s, 4 s …): each pause that
        // ended while they ran lets one more through, 2^k − 1 seconds for k of them.
        double seconds = (System.nanoTime() - started) / 1e9;
        int pausesEnded = (int) Math.floor(Math.log(seconds + 1) / Math.log(2));
        assertTrue(checked <= SignInThrottle.ACCOUNT_FREE_FAILURES + pausesEnded,
                checked + " of 40 simultaneous guesses reached the password check in " + seconds + " s");
    }

    @Test
    void theRightPasswordDuringThePauseGetsThe429AndAfterItGetsIn() throws InterruptedException {
        String name = newAccount();
        String address = newAddress();
        basic(name, "a-proper-secret", address).then().statusCode(200);
        for (int i = 0; i < SignInThrottle.ACCOUNT_FREE_FAILURES; i++) {
            basic(name, "guess-" + i, address).then().statusCode(401);
        }
        Response paused = basic(name, "a-proper-secret", address);
        paused.then().statusCode(429).contentType("application/problem+json").header("Retry-After", "1");
        // The browser form is paused alike, and answers 429 too rather than "wrong password".
        given().accept("application/json").header("X-Forwarded-For", newAddress()).formParam("username", name)
                .formParam("password", "a-proper-secret").post("/sign-in").then().statusCode(429)
                .header("Retry-After", notNullValue());
        // Refused attempts during the pause do not lengthen it: after the stated second the right password gets in.
        Thread.sleep(1_200);
        basic(name, "a-proper-secret", address).then().statusCode(200);
    }

    @Test
    void oneAddressGuessingAtManyAccountsIsPaused() {
        String address = newAddress();
        String real = newAccount();
        for (int i = 0; i < SignInThrottle.ADDRESS_FREE_FAILURES; i++) {
            basic("nobody-" + TestData.unique("x"), "guess", address).then().statusCode(401);
        }
        basic(real, "a-proper-secret", address).then().statusCode(429).header("Retry-After", notNullValue());
        basic(real, "a-proper-secret", newAddress()).then().statusCode(200);
    }

    @Test
    void aPauseIsNeverLongerThanStated() {
        SignInThrottle throttle = new SignInThrottle();
        for (int i = 0; i < 40; i++) {
            try {
                throttle.begin("someone", "10.1.1.1").failed();
            } catch (TooManyAttemptsException paused) {
                assertTrue(paused.retryAfterSeconds() <= SignInThrottle.MAX_PAUSE_MILLIS / 1000);
            }
        }
        TooManyAttemptsException paused = assertThrows(TooManyAttemptsException.class,
                () -> throttle.begin("someone", "10.1.1.2"));
        assertEquals(1, paused.retryAfterSeconds(), "refused attempts were not counted: the first pause still runs");
    }

    @Test
    void anUnknownAccountCostsAsMuchTimeAsAKnownOne() {
        int rounds = 7;
        List<String> known = new ArrayList<>();
        for (int i = 0; i < rounds; i++) {
            known.add(newAccount());
        }
        long[] knownNanos = new long[rounds];
        long[] unknownNanos = new long[rounds];
        for (int i = 0; i < rounds; i++) {
            knownNanos[i] = timeWrongPassword(known.get(i));
            unknownNanos[i] = timeWrongPassword("nobody-" + TestData.unique("t"));
        }
        Arrays.sort(knownNanos);
        Arrays.sort(unknownNanos);
        double ratio = (double) unknownNanos[rounds / 2] / knownNanos[rounds / 2];
        // Without the dummy bcrypt check an unknown account answered in about a twentieth of the time.
        assertTrue(ratio > 0.5, "unknown/known median time " + ratio);
    }

    private long timeWrongPassword(String name) {
        long start = System.nanoTime();
        assertThrows(io.quarkus.security.AuthenticationFailedException.class,
                () -> passwords.check(name, "wrong-password", newAddress()));
        return System.nanoTime() - start;
    }
}
