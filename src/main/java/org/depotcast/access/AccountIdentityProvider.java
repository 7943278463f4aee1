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
 */
@ApplicationScoped
public class AccountIdentityProvider implements IdentityProvider<UsernamePasswordAuthenticationRequest> {
    private static final long REMEMBER_MILLIS = 5 * 60 * 1000L;

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
        String digest = digest(username, password);
        Verified known = verified.get(username);
        if (known != null && known.digest().equals(digest) && known.until() > System.currentTimeMillis()) {
            return Uni.createFrom().item(identity(username, known.roles()));
        }
        return context.runBlocking(() -> {
            UserAccount account = accounts.findEnabled(username)
                    .filter(a -> PasswordHasher.matches(password, a.passwordHash))
                    .orElseThrow(() -> new AuthenticationFailedException("invalid credentials"));
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
