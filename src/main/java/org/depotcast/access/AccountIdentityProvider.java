package org.depotcast.access;

import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.identity.AuthenticationRequestContext;
import io.quarkus.security.identity.IdentityProvider;
import io.quarkus.security.identity.SecurityIdentity;
import io.quarkus.security.identity.request.UsernamePasswordAuthenticationRequest;
import io.quarkus.security.runtime.QuarkusPrincipal;
import io.quarkus.security.runtime.QuarkusSecurityIdentity;
import io.smallrye.mutiny.Uni;
import jakarta.enterprise.context.ApplicationScoped;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Checks a username and password against the stored bcrypt hash. bcrypt is slow on purpose (~50 ms), so a verified
 * pair is remembered for a few minutes as a SHA-256 digest (never the password itself); a phone posting movements
 * one by one then costs one bcrypt check, not one per request. Any account change clears the memory.
 * Repeated failures slow an account's sign-in down: after {@link #FREE_FAILURES} failures in a row, each further
 * attempt is refused unchecked until a wait that doubles with every failure (1 s, 2 s, 4 s … at most 5 minutes)
 * has passed, which makes guessing a password by trying impractical.
 */
@ApplicationScoped
public class AccountIdentityProvider implements IdentityProvider<UsernamePasswordAuthenticationRequest> {
    private static final long REMEMBER_MILLIS = 5 * 60 * 1000L;
    static final int FREE_FAILURES = 5;
    private static final long MAX_WAIT_MILLIS = 5 * 60 * 1000L;

    private record Failures(int count, long lastAt) {
        long blockedUntil() {
            if (count < FREE_FAILURES) {
                return 0;
            }
            return lastAt + Math.min(MAX_WAIT_MILLIS, 1000L << Math.min(20, count - FREE_FAILURES));
        }
    }

    private final Map<String, Failures> failures = new ConcurrentHashMap<>();

    private record Verified(String digest, Set<String> roles, long until) {
    }

    private final Map<String, Verified> verified = new ConcurrentHashMap<>();
    private final AccountService accounts;

    AccountIdentityProvider(AccountService accounts) {
        this.accounts = accounts;
    }

    @Override
    public Class<UsernamePasswordAuthenticationRequest> getRequestType() {
        return UsernamePasswordAuthenticationRequest.class;
    }

    @Override
    public Uni<SecurityIdentity> authenticate(UsernamePasswordAuthenticationRequest request,
                                              AuthenticationRequestContext context) {
        String username = request.getUsername();
        String password = new String(request.getPassword().getPassword());
        Failures failed = failures.get(username);
        if (failed != null && System.currentTimeMillis() < failed.blockedUntil()) {
            return Uni.createFrom().failure(new AuthenticationFailedException("too many failed sign-ins; wait and retry"));
        }
        String digest = digest(username, password);
        Verified known = verified.get(username);
        if (known != null && known.digest().equals(digest) && known.until() > System.currentTimeMillis()) {
            return Uni.createFrom().item(identity(username, known.roles()));
        }
        return context.runBlocking(() -> {
            UserAccount account = accounts.findEnabled(username)
                    .filter(a -> PasswordHasher.matches(password, a.passwordHash)).orElse(null);
            if (account == null) {
                failures.merge(username, new Failures(1, System.currentTimeMillis()),
                        (old, one) -> new Failures(old.count() + 1, one.lastAt()));
                throw new AuthenticationFailedException("invalid credentials");
            }
            failures.remove(username);
            Set<String> roles = account.roleSet();
            verified.put(username, new Verified(digest, roles, System.currentTimeMillis() + REMEMBER_MILLIS));
            return identity(username, roles);
        });
    }

    /** Called on any account change so a changed password or role takes effect at once. */
    public void forgetAll() {
        verified.clear();
    }

    private static SecurityIdentity identity(String username, Set<String> roles) {
        return QuarkusSecurityIdentity.builder().setPrincipal(new QuarkusPrincipal(username)).addRoles(roles).build();
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
