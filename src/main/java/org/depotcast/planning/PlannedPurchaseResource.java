package org.depotcast.planning;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.DELETE;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.depotcast.access.Roles;
import org.eclipse.microprofile.openapi.annotations.Operation;

import java.util.List;

@Path("/api/planning/planned-purchases")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
class PlannedPurchaseResource {
    private final PlannedPurchaseService service;

    PlannedPurchaseResource(PlannedPurchaseService service) {
        this.service = service;
    }

    @GET
    @Operation(summary = "A store's purchase plan", description = "Parts put aside to buy and not yet ordered, at the "
            + "store named by `location`, or at every store the caller looks after; by supplier, then part.")
    public List<PlannedPurchases.Line> list(@QueryParam("location") String location) {
        return service.list(location);
    }

    @PUT
    @Path("{location}/{partNumber}")
    @Consumes(MediaType.APPLICATION_JSON)
    @Operation(summary = "Put a part into a store's purchase plan", description = "Sets how many to buy (units of issue, "
            + "whole for parts counted by the piece, at most 1,000,000), replacing an earlier quantity: 201 when the "
            + "part was not in the plan, 200 when it was.")
    public Response put(@PathParam("location") String location, @PathParam("partNumber") String partNumber,
                        @Valid @NotNull PlannedPurchases.Put body, UriInfo uri) {
        PlannedPurchaseService.Saved saved = service.put(location, partNumber, body);
        // The new line is read back in the store's plan.
        return saved.created() ? Response.created(uri.getBaseUriBuilder().path("api/planning/planned-purchases")
                .queryParam("location", saved.line().location()).build()).entity(saved.line()).build()
                : Response.ok(saved.line()).build();
    }

    @DELETE
    @Path("{location}/{partNumber}")
    @Operation(summary = "Take a part out of a store's purchase plan", description = "204; 404 when it was not in the plan.")
    public Response remove(@PathParam("location") String location, @PathParam("partNumber") String partNumber) {
        service.remove(location, partNumber);
        return Response.noContent().build();
    }

    @POST
    @Path("{location}/orders")
    @Consumes(MediaType.APPLICATION_JSON)
    @Operation(summary = "Order a supplier's lines of the plan", description = "Places one purchase order, dated today, "
            + "to the store for every planned part of that supplier, and takes those lines out of the plan in the same "
            + "transaction. 201 with the order; its Location is the purchase order.")
    public Response order(@PathParam("location") String location, @Valid @NotNull PlannedPurchases.Order body, UriInfo uri) {
        PlannedPurchases.Ordered ordered = service.order(location, body);
        return Response.created(uri.getBaseUriBuilder().path("api/purchase-orders").path(ordered.orderNumber()).build())
                .entity(ordered).build();
    }
}
