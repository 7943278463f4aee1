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
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.ImportResult;
import org.depotcast.common.QueryParams;
import org.depotcast.access.Roles;

import java.io.InputStream;
import java.util.List;

@Path("/api/parts")
@Produces(MediaType.APPLICATION_JSON)
class PartResource {
    private final PartService service;

    PartResource(PartService service) {
        this.service = service;
    }

    @GET
    public List<PartResponse> list(@QueryParam("family") String familyParam) {
        ComponentFamily family = QueryParams.optionalEnum("family", familyParam, ComponentFamily.class);
        List<Part> found = family == null ? service.all() : service.inFamily(family);
        return found.stream().map(PartResponse::from).toList();
    }

    @GET
    @Path("{partNumber}")
    public PartResponse get(@PathParam("partNumber") String partNumber) {
        return service.find(partNumber).map(PartResponse::from)
                .orElseThrow(() -> new EntityMissingException(null, "part", partNumber));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public Response create(@Valid @NotNull PartRequest request, UriInfo uri) {
        Part part = service.create(request);
        return Response.created(uri.getAbsolutePathBuilder().path(part.partNumber).build())
                .entity(PartResponse.from(part)).build();
    }

    @PUT
    @Path("{partNumber}")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public PartResponse update(@PathParam("partNumber") String partNumber, @Valid @NotNull PartRequest request) {
        return PartResponse.from(service.update(partNumber, request));
    }

    record SubstituteRequest(@jakarta.validation.constraints.NotBlank @jakarta.validation.constraints.Size(max = 40) String partNumber) {
    }

    @GET
    @Path("{partNumber}/substitutes")
    public java.util.Set<String> substitutes(@PathParam("partNumber") String partNumber) {
        return service.substitutesOf(partNumber);
    }

    @POST
    @Path("{partNumber}/substitutes")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public java.util.Set<String> addSubstitute(@PathParam("partNumber") String partNumber,
                                               @Valid @NotNull SubstituteRequest request) {
        service.addSubstitute(partNumber, request.partNumber());
        return service.substitutesOf(partNumber);
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
