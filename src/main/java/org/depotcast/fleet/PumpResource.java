package org.depotcast.fleet;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PATCH;
import jakarta.ws.rs.PUT;
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

import java.math.BigDecimal;
import java.time.LocalDate;
import java.io.InputStream;
import java.util.List;

@Path("/api/pumps")
@Produces(MediaType.APPLICATION_JSON)
class PumpResource {
    private final PumpService pumps;
    private final PumpStatusService status;
    private final UsageService usage;
    private final PumpCsv csv;

    PumpResource(PumpService pumps, PumpStatusService status, UsageService usage, PumpCsv csv) {
        this.pumps = pumps;
        this.csv = csv;
        this.status = status;
        this.usage = usage;
    }

    record UsageReadingResponse(LocalDate readOn, BigDecimal hoursPerDay, UsageSource source) {
        static UsageReadingResponse from(UsageReading r) {
            return new UsageReadingResponse(r.readOn, r.hoursPerDay, r.source);
        }
    }

    @GET
    public List<PumpResponse> list(@QueryParam("depot") String depot, @QueryParam("status") String status) {
        return pumps.responses(pumps.search(depot, QueryParams.optionalEnum("status", status, PumpStatus.class)));
    }

    @GET
    @Path("{assetId}")
    public PumpResponse get(@PathParam("assetId") String assetId) {
        return pumps.response(pumps.requireVisible(null, assetId));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public Response register(@Valid @NotNull PumpRequest request, UriInfo uri) {
        Pump pump = pumps.register(request);
        return Response.created(uri.getAbsolutePathBuilder().path(pump.assetId).build())
                .entity(pumps.response(pump)).build();
    }

    /** Changes only the fields sent; fields left out keep their values (PUT and PATCH alike). */
    @PUT
    @Path("{assetId}")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public PumpResponse update(@PathParam("assetId") String assetId, @Valid @NotNull PumpUpdate request) {
        return pumps.response(pumps.update(assetId, request));
    }

    @PATCH
    @Path("{assetId}")
    @Consumes({MediaType.APPLICATION_JSON, "application/merge-patch+json"})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public PumpResponse patch(@PathParam("assetId") String assetId, @Valid @NotNull PumpUpdate request) {
        return pumps.response(pumps.update(assetId, request));
    }

    /** A mechanic's report that an assigned pump is broken or working again, without the whole pump record. */
    @POST
    @Path("{assetId}/status")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.MECHANIC, Roles.STORES_OFFICER, Roles.ADMIN})
    public PumpResponse reportStatus(@PathParam("assetId") String assetId, @Valid @NotNull StatusReport report) {
        return pumps.response(status.report(assetId, report));
    }

    @GET
    @Path("{assetId}/usage")
    public List<UsageReadingResponse> usage(@PathParam("assetId") String assetId) {
        return usage.of(assetId).stream().map(UsageReadingResponse::from).toList();
    }

    @POST
    @Path("{assetId}/usage")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.MECHANIC, Roles.ADMIN})
    public Response recordUsage(@PathParam("assetId") String assetId, @Valid @NotNull UsageReadingRequest request,
                                UriInfo uri) {
        // The reading is read back in the pump's usage history.
        return Response.created(uri.getAbsolutePath()).entity(UsageReadingResponse.from(usage.record(assetId, request)))
                .build();
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

    @POST
    @Path("usage/import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public ImportResult importUsage(InputStream csv) {
        return new ImportResult(usage.importCsv(csv));
    }

    @GET
    @Path("usage/export")
    @Produces("text/csv")
    public Response exportUsage() {
        return usage.exportCsv().response();
    }
}
