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
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.ImportResult;
import org.depotcast.common.QueryParams;

import java.io.InputStream;
import java.util.List;

@Path("/api/locations")
@Produces(MediaType.APPLICATION_JSON)
class LocationResource {
    private final LocationService service;

    LocationResource(LocationService service) {
        this.service = service;
    }

    @GET
    public List<LocationResponse> list(@QueryParam("kind") String kindParam) {
        LocationKind kind = QueryParams.optionalEnum("kind", kindParam, LocationKind.class);
        return (kind == null ? service.all() : service.ofKind(kind)).stream().map(LocationResponse::from).toList();
    }

    @GET
    @Path("{code}")
    public LocationResponse get(@PathParam("code") String code) {
        return service.find(code).map(LocationResponse::from)
                .orElseThrow(() -> new EntityMissingException(null, "location", code));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed(Roles.ADMIN)
    public Response create(@Valid @NotNull LocationRequest request, UriInfo uri) {
        Location location = service.create(request);
        return Response.created(uri.getAbsolutePathBuilder().path(location.code).build())
                .entity(LocationResponse.from(location)).build();
    }

    @POST
    @Path("import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed(Roles.ADMIN)
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
