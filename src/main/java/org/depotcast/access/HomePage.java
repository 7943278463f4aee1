package org.depotcast.access;

import io.quarkus.security.identity.SecurityIdentity;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.core.Response;

import java.net.URI;
import java.util.Set;

/**
 * The root address: the signed-in user's own page, or the sign-in form. An account with several roles goes to the
 * first of lead, stores officer, mechanic, admin (the lead's pages link to the others it may open).
 */
@Path("/")
class HomePage {
    static final String SIGN_IN = "/sign-in.html";

    private final SecurityIdentity identity;

    HomePage(SecurityIdentity identity) {
        this.identity = identity;
    }

    @GET
    public Response open() {
        String target = identity.isAnonymous() ? SIGN_IN : of(identity.getRoles());
        return Response.seeOther(URI.create(target)).header("Cache-Control", "no-store").build();
    }

    /** The home page of an account with these roles. */
    static String of(Set<String> roles) {
        if (roles.contains(Roles.PROGRAMME_LEAD)) {
            return "/app/lead/";
        }
        if (roles.contains(Roles.STORES_OFFICER)) {
            return "/app/officer/";
        }
        if (roles.contains(Roles.MECHANIC)) {
            return "/app/mechanic/";
        }
        return roles.contains(Roles.ADMIN) ? "/app/admin/" : SIGN_IN;
    }
}
