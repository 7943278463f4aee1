package org.depotcast.access;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;

import java.util.List;
import java.util.Set;

/** Account management: admins only. Passwords never leave the service, not even hashed. */
@Path("/api/accounts")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed(Roles.ADMIN)
class AccountResource {
    private final AccountService accounts;

    AccountResource(AccountService accounts) {
        this.accounts = accounts;
    }

    record AccountView(String username, Set<String> roles, boolean enabled, List<String> locationCodes, String kitCode) {
    }

    record RoleSet(@NotNull Set<@NotBlank String> roles) {
    }

    private AccountView view(UserAccount account) {
        AccountService.Profile profile = accounts.profile(account.username);
        return new AccountView(account.username, profile.roles(), account.enabled, profile.locationCodes(), profile.kitCode());
    }

    record CreateAccount(@NotBlank @Size(max = 60)
                         @Pattern(regexp = "[a-z0-9._-]+", message = "may hold lower-case letters, digits and . _ - only") String username,
                         @NotBlank @Size(min = 8, max = 200) String password,
                         @NotEmpty @Size(max = 10) Set<@NotBlank @Size(max = 40) String> roles,
                         @Size(max = 40) String kitCode,
                         @Size(max = 1000) List<@NotBlank @Size(max = 40) String> locationCodes) {
    }

    record LocationCodes(@NotNull @Size(max = 1000) List<@NotBlank @Size(max = 40) String> codes) {
    }

    @GET
    public List<AccountView> list() {
        return accounts.all().stream().map(this::view).toList();
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    public Response create(@Valid @NotNull CreateAccount body, UriInfo uri) {
        UserAccount account = accounts.create(new AccountService.NewAccount(body.username(), body.password(),
                body.roles(), body.kitCode(), body.locationCodes()));
        return Response.created(uri.getAbsolutePathBuilder().path(account.username).build()).entity(view(account)).build();
    }

    @GET
    @Path("{username}")
    public AccountView get(@PathParam("username") String username) {
        return view(accounts.require(username));
    }

    @PUT
    @Path("{username}/locations")
    @Consumes(MediaType.APPLICATION_JSON)
    public Response assign(@PathParam("username") String username, @Valid @NotNull LocationCodes body) {
        accounts.assignLocationCodes(username, body.codes());
        return Response.noContent().build();
    }

    @PUT
    @Path("{username}/roles")
    @Consumes(MediaType.APPLICATION_JSON)
    public AccountView setRoles(@PathParam("username") String username, @Valid @NotNull RoleSet body) {
        return view(accounts.setRoles(username, body.roles()));
    }
}
