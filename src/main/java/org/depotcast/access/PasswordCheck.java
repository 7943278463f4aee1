package org.depotcast.access;

import io.quarkus.security.AuthenticationFailedException;
import jakarta.enterprise.context.ApplicationScoped;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Checks a username and password for HTTP basic and for the sign-in form alike. Each check first takes its place
 * in the {@link SignInThrottle}. An unknown or disabled account costs one bcrypt check against a dummy hash, so the
 * answer takes as long as for a known account and its timing does not tell which accounts exist. bcrypt is slow on
 * purpose (~50 ms), so a verified pair is remembered for a few minutes as a SHA-256 digest (never the password
 * itself); a phone posting movements one by one then costs one bcrypt check, not one per request. Any account change
 * clears the memory. Simultaneous checks of the same name and password (a phone sending its queue at once) wait for
 * one bcrypt check and share its outcome, so they take one place in the throttle, not one each.
 */
@ApplicationScoped
public class PasswordCheck {
    private static final long REMEMBER_MILLIS = 5 * 60 * 1000L;

    private record Verified(String digest, Set<String> roles, long until) {
    }

    private final Map<String, Verified> verified = new ConcurrentHashMap<>();
    private final Map<String, CompletableFuture<Set<String>>> checking = new ConcurrentHashMap<>();
    private final AccountService accounts;
    private final SignInThrottle throttle;
    private final String dummyHash;

    PasswordCheck(AccountService accounts, SignInThrottle throttle) {
        this.accounts = accounts;
        this.throttle = throttle;
        byte[] random = new byte[24];
        new SecureRandom().nextBytes(random);
        this.dummyHash = PasswordHasher.hash(Base64.getEncoder().encodeToString(random));
    }

    /**
     * The roles of a pair verified in the last few minutes, without a bcrypt check; empty when the full check is
     * needed. Refused (429) while the account or the address is paused, right password or not.
     */
    public Optional<Set<String>> remembered(String username, String password, String address) {
        throttle.requireNotPaused(username, address);
        Verified known = verified.get(username);
        if (known != null && known.until() > System.currentTimeMillis()
                && MessageDigest.isEqual(known.digest().getBytes(StandardCharsets.UTF_8),
                digest(username, password).getBytes(StandardCharsets.UTF_8))) {
            return Optional.of(known.roles());
        }
        return Optional.empty();
    }

    /** The full check (blocking: reads the account and runs bcrypt). */
    public Set<String> check(String username, String password, String address) {
        String digest = digest(username, password);
        CompletableFuture<Set<String>> mine = new CompletableFuture<>();
        CompletableFuture<Set<String>> running = checking.putIfAbsent(username + "\u0000" + digest, mine);
        if (running != null) {
            return outcomeOf(running);
        }
        try {
            Set<String> roles = checkOnce(username, password, digest, address);
            mine.complete(roles);
            return roles;
        } catch (RuntimeException e) {
            mine.completeExceptionally(e);
            throw e;
        } finally {
            checking.remove(username + "\u0000" + digest, mine);
        }
    }

    private Set<String> checkOnce(String username, String password, String digest, String address) {
        SignInThrottle.Attempt attempt = throttle.begin(username, address);
        try {
            Optional<UserAccount> account = accounts.findEnabled(username);
            boolean matches = PasswordHasher.matches(password, account.map(a -> a.passwordHash).orElse(dummyHash));
            if (account.isEmpty() || !matches) {
                attempt.failed();
                throw new AuthenticationFailedException("invalid credentials");
            }
            attempt.succeeded();
            Set<String> roles = account.get().roleSet();
            verified.put(username, new Verified(digest, roles, System.currentTimeMillis() + REMEMBER_MILLIS));
            return roles;
        } finally {
            attempt.abandoned();
        }
    }

    private static Set<String> outcomeOf(CompletableFuture<Set<String>> running) {
        try {
            return running.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException cause) {
                throw cause;
            }
            throw e;
        }
    }

    /** Called on any account change so a changed password or role takes effect at once. */
    void forgetAll() {
        verified.clear();
    }

    private static String digest(String username, String password) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(username.getBytes(StandardCharsets.UTF_8));
            sha.update((byte) 0);
            return HexFormat.of().formatHex(sha.digest(password.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
