package org.depotcast.access;

import io.quarkus.security.Authenticated;
import io.quarkus.security.identity.SecurityIdentity;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;
import org.eclipse.microprofile.openapi.annotations.Operation;

/** The signed-in account, so that pages can build their navigation and pick the user's locations. */
@Path("/api/me")
@Produces(MediaType.APPLICATION_JSON)
@Authenticated
class ProfileResource {
    private final AccountService accounts;
    private final SecurityIdentity identity;

    ProfileResource(AccountService accounts, SecurityIdentity identity) {
        this.accounts = accounts;
        this.identity = identity;
    }

    /** {@code home} is the page the root address opens for this account. */
    record Me(String username, java.util.Set<String> roles, java.util.List<String> locationCodes, String kitCode,
              String home) {
    }

    @GET
    @Operation(summary = "The signed-in account", description = "Username, roles, the codes of the locations "
            + "assigned to it (stores officers), its kit (mechanics) and its home page.")
    public Me me() {
        AccountService.Profile p = accounts.profile(identity.getPrincipal().getName());
        return new Me(p.username(), p.roles(), p.locationCodes(), p.kitCode(), HomePage.of(p.roles()));
    }
}
