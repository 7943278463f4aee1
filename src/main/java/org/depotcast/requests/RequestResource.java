package org.depotcast.requests;

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
import org.depotcast.common.QueryParams;

import java.util.List;

@Path("/api/requests")
@Produces(MediaType.APPLICATION_JSON)
class RequestResource {
    private final RequestService service;
    private final RequestReportService reports;
    private final RequestRaisingService raising;

    RequestResource(RequestService service, RequestReportService reports, RequestRaisingService raising) {
        this.service = service;
        this.raising = raising;
        this.reports = reports;
    }

    /** 201 for a new request; 200 with the stored one when the phone resends the same client reference. */
    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed(Roles.MECHANIC)
    public Response raise(@Valid @NotNull RequestDtos.Raise body, UriInfo uri) {
        RequestRaisingService.Raised raised = raising.raise(body);
        return raised.replayed() ? Response.ok(raised.request()).build()
                : Response.created(uri.getAbsolutePathBuilder().path(Long.toString(raised.request().id())).build())
                .entity(raised.request()).build();
    }

    @GET
    public List<RequestDtos.View> list(@QueryParam("status") String status) {
        return service.list(QueryParams.optionalEnum("status", status, RequestStatus.class));
    }

    @GET
    @Path("{id}")
    public RequestDtos.View get(@PathParam("id") long id) {
        return service.get(id);
    }

    @POST
    @Path("{id}/approve")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public RequestDtos.View approve(@PathParam("id") long id, @Valid @NotNull RequestDtos.Approve body) {
        return service.approve(id, body);
    }

    @POST
    @Path("{id}/refuse")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public RequestDtos.View refuse(@PathParam("id") long id, @Valid @NotNull RequestDtos.Reason body) {
        return service.refuse(id, body.reason());
    }

    @POST
    @Path("{id}/issue")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public RequestDtos.View issue(@PathParam("id") long id) {
        return service.issue(id);
    }

    @POST
    @Path("{id}/cancel")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed(Roles.MECHANIC)
    public RequestDtos.View cancel(@PathParam("id") long id, @Valid @NotNull RequestDtos.Reason body) {
        return service.cancel(id, body.reason());
    }

    @POST
    @Path("{id}/close")
    @RolesAllowed({Roles.MECHANIC, Roles.STORES_OFFICER, Roles.ADMIN})
    public RequestDtos.View close(@PathParam("id") long id) {
        return service.close(id);
    }

    @GET
    @Path("report")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public List<RequestDtos.DepotReport> report() {
        return reports.perDepot();
    }
}
