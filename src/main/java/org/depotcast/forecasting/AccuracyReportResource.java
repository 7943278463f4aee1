package org.depotcast.forecasting;

import jakarta.annotation.security.RolesAllowed;
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

/** How the forecasts held up on a year they had not seen: started by the lead, read by officers too. */
@Path("/api/forecast/accuracy-reports")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.STORES_OFFICER})
class AccuracyReportResource {
    private final AccuracyReportService reports;

    AccuracyReportResource(AccuracyReportService reports) {
        this.reports = reports;
    }

    /** Earlier reports, newest first, with their job's state: the page lists them to reopen one. */
    @GET
    public java.util.List<AccuracyReportService.ReportListing> recent(@QueryParam("limit") String limit) {
        return reports.recent(QueryParams.intInRange("limit", limit, 20, 1, 100));
    }

    /** 202 with the report to poll (its job's state and progress, then its results). */
    @POST
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response start(UriInfo uri, @QueryParam("origin") String origin) {
        long id = reports.start(QueryParams.optionalDate("origin", origin));
        return Response.accepted(reports.report(id))
                .location(uri.getAbsolutePathBuilder().path(Long.toString(id)).build()).build();
    }

    @GET
    @Path("{id}")
    public AccuracyReportService.ReportView report(@PathParam("id") long id) {
        return reports.report(id);
    }

    @GET
    @Path("{id}/rows.csv")
    @Produces("text/csv")
    public Response csv(@PathParam("id") long id) {
        return reports.csv(id).response();
    }
}
