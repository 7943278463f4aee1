package org.depotcast.catalogue;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
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
import org.depotcast.access.Roles;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.ImportResult;

import java.io.InputStream;
import java.util.List;

@Path("/api/pump-models")
@Produces(MediaType.APPLICATION_JSON)
class PumpModelResource {
    private final PumpModelService service;

    PumpModelResource(PumpModelService service) {
        this.service = service;
    }

    @GET
    public List<PumpModelResponse> list() {
        return service.all().stream().map(PumpModelResponse::from).toList();
    }

    @GET
    @Path("{code}")
    public PumpModelResponse get(@PathParam("code") String code) {
        return service.find(code).map(PumpModelResponse::from)
                .orElseThrow(() -> new EntityMissingException(null, "pump model", code));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public Response create(@Valid @NotNull PumpModelRequest request, UriInfo uri) {
        PumpModel model = service.create(request);
        return Response.created(uri.getAbsolutePathBuilder().path(model.code).build())
                .entity(PumpModelResponse.from(model)).build();
    }

    @PUT
    @Path("{code}")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public PumpModelResponse update(@PathParam("code") String code, @Valid @NotNull PumpModelRequest request) {
        return PumpModelResponse.from(service.update(code, request));
    }

    @POST
    @Path("import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public ImportResult importCsv(InputStream csv) {
        return new ImportResult(service.importCsv(csv));
    }

    @GET
    @Path("export")
    @Produces("text/csv")
    public Response exportCsv() {
        return service.exportCsv().response();
    }
}
