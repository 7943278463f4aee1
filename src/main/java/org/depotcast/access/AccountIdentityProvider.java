package org.depotcast.access;

import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.identity.AuthenticationRequestContext;
import io.quarkus.security.identity.IdentityProvider;
import io.quarkus.security.identity.SecurityIdentity;
import io.quarkus.security.identity.request.UsernamePasswordAuthenticationRequest;
import io.quarkus.security.runtime.QuarkusPrincipal;
import io.quarkus.security.runtime.QuarkusSecurityIdentity;
import io.quarkus.vertx.http.runtime.security.HttpSecurityUtils;
import io.smallrye.mutiny.Uni;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.TooManyAttemptsException;

import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Signs in an HTTP basic request: a pair remembered from a recent check answers at once, anything else runs the
 * full {@link PasswordCheck} on a worker thread. A paused sign-in fails with {@link #RETRY_AFTER_SECONDS} set, which
 * {@link SignInMechanism} answers with 429.
 */
@ApplicationScoped
public class AccountIdentityProvider implements IdentityProvider<UsernamePasswordAuthenticationRequest> {
    static final String RETRY_AFTER_SECONDS = "depotcast.retry-after-seconds";

    private final PasswordCheck check;

    AccountIdentityProvider(PasswordCheck check) {
        this.check = check;
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
        String address = ClientAddress.of(HttpSecurityUtils.getRoutingContextAttribute(request));
        try {
            Optional<Set<String>> known = check.remembered(username, password, address);
            if (known.isPresent()) {
                return Uni.createFrom().item(identity(username, known.get()));
            }
        } catch (TooManyAttemptsException e) {
            return Uni.createFrom().failure(paused(e));
        }
        return context.runBlocking(() -> {
            try {
                return identity(username, check.check(username, password, address));
            } catch (TooManyAttemptsException e) {
                throw paused(e);
            }
        });
    }

    private static AuthenticationFailedException paused(TooManyAttemptsException e) {
        return new AuthenticationFailedException(e.getMessage(), Map.of(RETRY_AFTER_SECONDS, e.retryAfterSeconds()));
    }

    private static SecurityIdentity identity(String username, Set<String> roles) {
        return QuarkusSecurityIdentity.builder().setPrincipal(new QuarkusPrincipal(username)).addRoles(roles).build();
    }
}
