package org.depotcast.repairs;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.PATCH;
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

@Path("/api/repairs")
@Produces(MediaType.APPLICATION_JSON)
class RepairResource {
    private final RepairService service;
    private final RepairHistoryCsv csv;

    RepairResource(RepairService service, RepairHistoryCsv csv) {
        this.service = service;
        this.csv = csv;
    }

    /** Newest report first; {@code open=true} keeps the repairs not fixed yet. */
    @GET
    public List<RepairResponse> list(@QueryParam("asset") String asset, @QueryParam("since") String since,
                                     @QueryParam("limit") String limit, @QueryParam("open") String open) {
        return service.search(asset, QueryParams.optionalDate("since", since),
                QueryParams.intInRange("limit", limit, 200, 1, 10_000), QueryParams.optionalBoolean("open", open));
    }

    @GET
    @Path("{repairRef}")
    public RepairResponse get(@PathParam("repairRef") String repairRef) {
        return service.get(repairRef);
    }

    /** 201 for a new repair; 200 with the stored one when the phone resends the same reference. */
    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.MECHANIC, Roles.STORES_OFFICER, Roles.ADMIN})
    public Response record(@Valid @NotNull RepairRequest request, UriInfo uri) {
        RepairService.Recorded recorded = service.record(request);
        RepairResponse body = recorded.repair();
        return recorded.replayed() ? Response.ok(body).build()
                : Response.created(uri.getAbsolutePathBuilder().path(body.repairRef()).build()).entity(body).build();
    }

    /** Dates reached and parts needed since the repair was reported; fields left out keep their values. */
    @PATCH
    @Path("{repairRef}")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.MECHANIC, Roles.STORES_OFFICER, Roles.ADMIN})
    public RepairResponse progress(@PathParam("repairRef") String repairRef, @Valid @NotNull RepairProgress progress) {
        return service.progress(repairRef, progress);
    }

    @POST
    @Path("import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public ImportResult importCsv(InputStream csv) {
        return new ImportResult(this.csv.importCsv(csv));
    }

    @GET
    @Path("export")
    @Produces("text/csv")
    public Response exportCsv() {
        return csv.exportCsv().response();
    }
}
