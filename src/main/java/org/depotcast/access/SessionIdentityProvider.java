package org.depotcast.access;

import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.identity.AuthenticationRequestContext;
import io.quarkus.security.identity.IdentityProvider;
import io.quarkus.security.identity.SecurityIdentity;
import io.quarkus.security.runtime.QuarkusPrincipal;
import io.quarkus.security.runtime.QuarkusSecurityIdentity;
import io.smallrye.mutiny.Uni;
import jakarta.enterprise.context.ApplicationScoped;

/**
 * Restores a browser's identity from its session cookie: the session must be genuine, live and of an enabled
 * account; the roles are read afresh. The identity is marked as signed in by session, which the cross-site guard
 * needs to know.
 */
@ApplicationScoped
public class SessionIdentityProvider implements IdentityProvider<SessionAuthenticationRequest> {
    /** Identity attribute present (the session's id hash) when the request was signed in by the session cookie. */
    public static final String SESSION_ATTRIBUTE = "depotcast.session";

    private final SessionService sessions;

    SessionIdentityProvider(SessionService sessions) {
        this.sessions = sessions;
    }

    @Override
    public Class<SessionAuthenticationRequest> getRequestType() {
        return SessionAuthenticationRequest.class;
    }

    @Override
    public Uni<SecurityIdentity> authenticate(SessionAuthenticationRequest request, AuthenticationRequestContext context) {
        return context.runBlocking(() -> sessions.resolve(request.cookieValue())
                .map(live -> (SecurityIdentity) QuarkusSecurityIdentity.builder()
                        .setPrincipal(new QuarkusPrincipal(live.username())).addRoles(live.roles())
                        .addAttribute(SESSION_ATTRIBUTE, live.idHash()).build())
                .orElseThrow(() -> new AuthenticationFailedException("no live session for this cookie")));
    }
}
