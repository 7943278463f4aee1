package org.depotcast.access;

import io.quarkus.security.identity.SecurityIdentity;
import io.vertx.core.http.HttpServerRequest;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.CookieParam;
import jakarta.ws.rs.FormParam;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.HeaderParam;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.Context;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import org.depotcast.common.SignInRefusedException;
import org.eclipse.microprofile.openapi.annotations.Operation;

import java.net.URI;
import java.util.Optional;
import java.util.Set;

/**
 * Browser sign-in and sign-out. The form at /sign-in.html posts here; a script may post the same fields with
 * {@code Accept: application/json} and gets 200/401 instead of redirects. Either way a paused sign-in is a 429 with
 * Retry-After.
 */
@Path("/")
class SignInResource {
    private static final String LANDING = "/pages/";

    private final SessionService sessions;
    private final SecurityIdentity identity;

    SignInResource(SessionService sessions, SecurityIdentity identity) {
        this.sessions = sessions;
        this.identity = identity;
    }

    record SignedIn(String username, Set<String> roles) {
    }

    @POST
    @Path("sign-in")
    @Consumes(MediaType.APPLICATION_FORM_URLENCODED)
    @Operation(summary = "Sign in a browser", description = "Checks the account and password and sets the session "
            + "cookie. A form post is redirected to 'next' (or the pages) or back to the form with ?failed; with "
            + "Accept: application/json the answer is 200 or 401. Too many attempts: 429 with Retry-After.")
    public Response signIn(@FormParam("username") String username, @FormParam("password") String password,
                           @FormParam("next") String next, @HeaderParam("Accept") String accept,
                           @Context HttpServerRequest request) {
        boolean script = wantsJson(accept);
        Optional<SessionService.Started> started = sessions.signIn(username, password, ClientAddress.of(request));
        if (started.isEmpty()) {
            if (script) {
                throw new SignInRefusedException();
            }
            return Response.seeOther(URI.create("/sign-in.html?failed" + nextQuery(next))).build();
        }
        SessionService.Started session = started.get();
        Response.ResponseBuilder answer = script
                ? Response.ok(new SignedIn(session.username(), session.roles()), MediaType.APPLICATION_JSON)
                : Response.seeOther(URI.create(safeNext(next)));
        return answer.header("Set-Cookie", SessionCookie.header(session.cookieValue(), session.lifetime().toSeconds(),
                sessions.secureCookie(overHttps(request)))).header("Cache-Control", "no-store").build();
    }

    @POST
    @Path("sign-out")
    @Operation(summary = "Sign out a browser", description = "Ends the session of the cookie sent (it no longer "
            + "signs anyone in) and clears the cookie. A form post is redirected to the sign-in form; with "
            + "Accept: application/json the answer is 204.")
    public Response signOut(@CookieParam(SessionCookie.NAME) String cookie, @HeaderParam("Accept") String accept,
                            @Context HttpServerRequest request) {
        if (cookie != null) {
            sessions.signOut(cookie);
        }
        Response.ResponseBuilder answer = wantsJson(accept) ? Response.noContent()
                : Response.seeOther(URI.create("/sign-in.html?signed-out"));
        return answer.header("Set-Cookie", SessionCookie.header("", 0, sessions.secureCookie(overHttps(request))))
                .build();
    }

    @GET
    @Path("api/session")
    @Produces(MediaType.APPLICATION_JSON)
    @Operation(summary = "Who is signed in", description = "The account and roles of the caller, signed in by the "
            + "session cookie or by HTTP basic.")
    public SignedIn whoAmI() {
        return new SignedIn(identity.getPrincipal().getName(), identity.getRoles());
    }

    private static boolean wantsJson(String accept) {
        return accept != null && accept.contains(MediaType.APPLICATION_JSON) && !accept.contains(MediaType.TEXT_HTML);
    }

    private static boolean overHttps(HttpServerRequest request) {
        return "https".equalsIgnoreCase(request.scheme());
    }

    /** Only a path on this server: never another site (an open redirect would lend our name to phishing). */
    static String safeNext(String next) {
        if (next == null || !next.startsWith("/") || next.startsWith("//") || next.contains("\\")
                || next.chars().anyMatch(Character::isISOControl)) {
            return LANDING;
        }
        return next;
    }

    private static String nextQuery(String next) {
        return next == null ? "" : "&next=" + java.net.URLEncoder.encode(safeNext(next), java.nio.charset.StandardCharsets.UTF_8);
    }
}
