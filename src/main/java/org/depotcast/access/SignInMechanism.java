package org.depotcast.access;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.quarkus.security.AuthenticationFailedException;
import io.quarkus.security.credential.PasswordCredential;
import io.quarkus.security.identity.IdentityProviderManager;
import io.quarkus.security.identity.SecurityIdentity;
import io.quarkus.security.identity.request.AuthenticationRequest;
import io.quarkus.security.identity.request.UsernamePasswordAuthenticationRequest;
import io.quarkus.vertx.http.runtime.security.ChallengeData;
import io.quarkus.vertx.http.runtime.security.HttpAuthenticationMechanism;
import io.quarkus.vertx.http.runtime.security.HttpCredentialTransport;
import io.quarkus.vertx.http.runtime.security.HttpSecurityUtils;
import io.smallrye.mutiny.Uni;
import io.vertx.core.http.Cookie;
import io.vertx.core.http.HttpMethod;
import io.vertx.core.http.HttpServerResponse;
import io.vertx.ext.web.RoutingContext;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.ProblemMapper;
import org.depotcast.common.TooManyAttemptsException;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.Map;
import java.util.Set;

/**
 * How every request signs in: HTTP basic (API clients) or the session cookie (browsers, see {@link SessionService}),
 * the same accounts, roles and scopes either way. Without a valid sign-in, the API answers 401 problem+json (with a
 * Basic challenge only for clients that are not pages, so a browser never pops up its own password box), a page
 * redirects to the sign-in form, and a paused sign-in answers 429 with Retry-After.
 */
@ApplicationScoped
public class SignInMechanism implements HttpAuthenticationMechanism {
    /** Pages send this header on every API call; it also marks them as not wanting a Basic challenge. */
    public static final String PAGE_HEADER = "X-Requested-With";
    private static final String PAUSED = "depotcast.sign-in-paused-seconds";
    private static final String STALE_SESSION = "depotcast.stale-session";
    private static final String BASIC_CHALLENGE = "Basic realm=\"depotcast\", charset=\"UTF-8\"";

    private final ObjectMapper json;

    SignInMechanism(ObjectMapper json) {
        this.json = json;
    }

    @Override
    public Uni<SecurityIdentity> authenticate(RoutingContext context, IdentityProviderManager identities) {
        String authorization = context.request().getHeader("Authorization");
        if (authorization != null) {
            return basic(context, identities, authorization);
        }
        Cookie cookie = context.request().getCookie(SessionCookie.NAME);
        if (cookie == null || cookie.getValue().isEmpty()) {
            return Uni.createFrom().nullItem();
        }
        AuthenticationRequest request = new SessionAuthenticationRequest(cookie.getValue());
        // An ended, expired or forged cookie signs in no one; public pages still open, and the cookie is cleared.
        return identities.authenticate(HttpSecurityUtils.setRoutingContextAttribute(request, context))
                .onFailure(AuthenticationFailedException.class).recoverWithItem(() -> {
                    context.put(STALE_SESSION, Boolean.TRUE);
                    return null;
                });
    }

    private Uni<SecurityIdentity> basic(RoutingContext context, IdentityProviderManager identities, String authorization) {
        if (!authorization.regionMatches(true, 0, "Basic ", 0, 6)) {
            return Uni.createFrom().failure(new AuthenticationFailedException("only HTTP basic is accepted"));
        }
        String pair;
        try {
            pair = new String(Base64.getDecoder().decode(authorization.substring(6).trim()), StandardCharsets.UTF_8);
        } catch (IllegalArgumentException e) {
            return Uni.createFrom().failure(new AuthenticationFailedException("malformed basic credentials"));
        }
        int colon = pair.indexOf(':');
        if (colon < 0) {
            return Uni.createFrom().failure(new AuthenticationFailedException("malformed basic credentials"));
        }
        AuthenticationRequest request = new UsernamePasswordAuthenticationRequest(pair.substring(0, colon),
                new PasswordCredential(pair.substring(colon + 1).toCharArray()));
        return identities.authenticate(HttpSecurityUtils.setRoutingContextAttribute(request, context))
                .onFailure(AuthenticationFailedException.class).invoke(e -> {
                    Object wait = ((AuthenticationFailedException) e).getAttribute(AccountIdentityProvider.RETRY_AFTER_SECONDS);
                    if (wait != null) {
                        context.put(PAUSED, wait);
                    }
                });
    }

    @Override
    public Uni<ChallengeData> getChallenge(RoutingContext context) {
        Object wait = context.get(PAUSED);
        if (wait != null) {
            return Uni.createFrom().item(new ChallengeData(429, "Retry-After", wait.toString()));
        }
        if (isPage(context)) {
            return Uni.createFrom().item(new ChallengeData(302, "Location", signInPage(context)));
        }
        return Uni.createFrom().item(context.request().getHeader(PAGE_HEADER) == null
                ? new ChallengeData(401, "WWW-Authenticate", BASIC_CHALLENGE) : new ChallengeData(401));
    }

    @Override
    public Uni<Boolean> sendChallenge(RoutingContext context) {
        return getChallenge(context).map(challenge -> {
            HttpServerResponse response = context.response();
            if (context.get(STALE_SESSION) != null) {
                response.headers().add("Set-Cookie", SessionCookie.header("", 0, context.request().isSSL()));
            }
            response.setStatusCode(challenge.status);
            for (Map.Entry<CharSequence, String> header : challenge.getHeaders().entrySet()) {
                response.headers().set(header.getKey(), header.getValue());
            }
            if (challenge.status == 302) {
                response.end();
            } else {
                RuntimeException cause = challenge.status == 429
                        ? new TooManyAttemptsException(Long.parseLong(context.get(PAUSED).toString()))
                        : new AuthenticationFailedException();
                response.headers().set("Content-Type", org.depotcast.common.Problem.MEDIA_TYPE);
                response.end(body(ProblemMapper.beforeEndpoint(cause, context.normalizedPath())));
            }
            return true;
        });
    }

    @Override
    public Set<Class<? extends AuthenticationRequest>> getCredentialTypes() {
        return Set.of(UsernamePasswordAuthenticationRequest.class, SessionAuthenticationRequest.class);
    }

    @Override
    public Uni<HttpCredentialTransport> getCredentialTransport(RoutingContext context) {
        return Uni.createFrom().item(new HttpCredentialTransport(HttpCredentialTransport.Type.AUTHORIZATION, "basic"));
    }

    private static boolean isPage(RoutingContext context) {
        String path = context.normalizedPath();
        return context.request().method() == HttpMethod.GET && (path.equals("/pages") || path.startsWith("/pages/"));
    }

    private static String signInPage(RoutingContext context) {
        return "/sign-in.html?next=" + URLEncoder.encode(context.request().uri(), StandardCharsets.UTF_8);
    }

    private String body(Object problem) {
        try {
            return json.writeValueAsString(problem);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
