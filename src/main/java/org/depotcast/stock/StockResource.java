package org.depotcast.stock;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.depotcast.access.Roles;
import org.depotcast.common.ImportResult;
import org.depotcast.common.QueryParams;

import java.io.InputStream;
import java.util.List;

@Path("/api/stock")
@Produces(MediaType.APPLICATION_JSON)
class StockResource {
    private final StockLedgerService ledger;
    private final StockQueryService queries;
    private final StockCountService counts;

    StockResource(StockLedgerService ledger, StockQueryService queries, StockCountService counts) {
        this.ledger = ledger;
        this.queries = queries;
        this.counts = counts;
    }

    /** 201 for a new movement; 200 with the earlier movement when the idempotency key was seen before. */
    @POST
    @Path("movements")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.MECHANIC, Roles.ADMIN})
    public Response post(@Valid @NotNull MovementRequest request, UriInfo uri) {
        PostedMovement posted = ledger.post(request.toCommand());
        MovementResponse body = posted.movement();
        return posted.replayed() ? Response.ok(body).build()
                : Response.created(uri.getBaseUriBuilder().path("api/stock/movements").path(Long.toString(body.id())).build())
                .entity(body).build();
    }

    @GET
    @Path("movements")
    public List<MovementResponse> movements(@QueryParam("part") String part, @QueryParam("location") String location,
                                            @QueryParam("since") String since, @QueryParam("limit") String limit) {
        return queries.movements(part, location, QueryParams.optionalInstant("since", since),
                QueryParams.intInRange("limit", limit, 200, 1, 10_000));
    }

    @GET
    @Path("movements/{id}")
    public MovementResponse movement(@PathParam("id") long id) {
        return queries.movement(id);
    }

    @GET
    @Path("balances")
    public List<BalanceView> balances(@QueryParam("location") String location) {
        return queries.balances(location);
    }

    @GET
    @Path("reconcile")
    public ReconcileReport reconcile() {
        return queries.reconcile();
    }

    @POST
    @Path("counts/import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public ImportResult importCounts(InputStream csv) {
        return new ImportResult(counts.importCsv(csv));
    }

    @GET
    @Path("counts/export")
    @Produces("text/csv")
    public Response exportCounts(@QueryParam("location") String location) {
        return counts.exportCsv(location).response();
    }
}
