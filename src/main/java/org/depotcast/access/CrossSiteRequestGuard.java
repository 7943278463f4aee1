package org.depotcast.access;

import io.quarkus.security.ForbiddenException;
import io.quarkus.security.identity.SecurityIdentity;
import io.vertx.core.http.HttpServerRequest;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.inject.Instance;
import jakarta.ws.rs.container.ContainerRequestContext;
import org.jboss.resteasy.reactive.server.ServerRequestFilter;

import java.net.URI;
import java.util.Locale;
import java.util.Set;

/**
 * Refuses writes that another site could make with the browser's session cookie. The cookie is SameSite=Lax, so
 * browsers do not send it with other sites' forms or scripts; in addition a write (POST, PUT, PATCH, DELETE)
 * signed in by the cookie must come from this server: the Origin header (or, without one, the Referer) names this
 * host, and writes to /api carry the {@link SignInMechanism#PAGE_HEADER} header, which another site's page cannot
 * add without this server allowing it (no CORS is configured). The sign-in form itself is checked the same way, so
 * another site cannot sign a browser in to an account of its choosing. Clients signed in by HTTP basic are not
 * affected: a browser never adds basic credentials to another site's request on its own.
 */
@ApplicationScoped
class CrossSiteRequestGuard {
    private static final Set<String> SAFE = Set.of("GET", "HEAD", "OPTIONS");

    private final Instance<SecurityIdentity> identity;

    CrossSiteRequestGuard(Instance<SecurityIdentity> identity) {
        this.identity = identity;
    }

    @ServerRequestFilter
    void refuseCrossSiteWrites(ContainerRequestContext request, HttpServerRequest http) {
        if (SAFE.contains(request.getMethod())) {
            return;
        }
        String path = http.path();
        boolean signInForm = "/sign-in".equals(path);
        SecurityIdentity current = identity.get();
        boolean bySession = current != null && current.getAttribute(SessionIdentityProvider.SESSION_ATTRIBUTE) != null;
        if (!bySession && !signInForm) {
            return;
        }
        String source = http.getHeader("Origin");
        if (source == null) {
            source = http.getHeader("Referer");
        }
        if (source != null && !sameHost(source, http.getHeader("Host"))) {
            throw new ForbiddenException("cross-site request refused: it comes from another site than this one");
        }
        if (bySession && path.startsWith("/api/") && http.getHeader(SignInMechanism.PAGE_HEADER) == null) {
            throw new ForbiddenException("a write signed in by the session cookie must send the header "
                    + SignInMechanism.PAGE_HEADER);
        }
        if (bySession && source == null && http.getHeader(SignInMechanism.PAGE_HEADER) == null) {
            throw new ForbiddenException("cross-site request refused: neither Origin nor Referer names this site");
        }
    }

    /** Compares host and port, a missing port counting as the scheme's default. */
    static boolean sameHost(String origin, String host) {
        if (host == null) {
            return false;
        }
        try {
            URI from = URI.create(origin.trim());
            if (from.getHost() == null) {
                return false;
            }
            int port = from.getPort() >= 0 ? from.getPort() : "https".equalsIgnoreCase(from.getScheme()) ? 443 : 80;
            URI to = URI.create("//" + host.trim());
            int hostPort = to.getPort() >= 0 ? to.getPort() : port == 443 || port == 80 ? port : -1;
            return from.getHost().toLowerCase(Locale.ROOT).equals(to.getHost() == null ? null
                    : to.getHost().toLowerCase(Locale.ROOT)) && port == hostPort;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }
}
