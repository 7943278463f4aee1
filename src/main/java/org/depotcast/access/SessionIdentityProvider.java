package org.depotcast.access;

import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.identity.AuthenticationRequestContext;
import io.quarkus.security.identity.IdentityProvider;
import io.quarkus.security.identity.SecurityIdentity;
import io.quarkus.security.identity.request.TrustedAuthenticationRequest;
import io.quarkus.security.runtime.QuarkusPrincipal;
import io.quarkus.security.runtime.QuarkusSecurityIdentity;
import io.smallrye.mutiny.Uni;
import jakarta.enterprise.context.ApplicationScoped;

/**
 * Restores a page visitor's identity from the form sign-in's encrypted session cookie: the cookie names the account,
 * the roles are read afresh, and a disabled or removed account is refused.
 */
@ApplicationScoped
public class SessionIdentityProvider implements IdentityProvider<TrustedAuthenticationRequest> {
    private final AccountService accounts;

    SessionIdentityProvider(AccountService accounts) {
        this.accounts = accounts;
    }

    @Override
    public Class<TrustedAuthenticationRequest> getRequestType() {
        return TrustedAuthenticationRequest.class;
    }

    @Override
    public Uni<SecurityIdentity> authenticate(TrustedAuthenticationRequest request, AuthenticationRequestContext context) {
        return context.runBlocking(() -> accounts.findEnabled(request.getPrincipal())
                .map(a -> (SecurityIdentity) QuarkusSecurityIdentity.builder().setPrincipal(new QuarkusPrincipal(a.username))
                        .addRoles(a.roleSet()).build())
                .orElseThrow(() -> new AuthenticationFailedException("the account of this session no longer exists")));
    }
}
