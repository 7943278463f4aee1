package org.depotcast.forecasting;

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

import java.io.InputStream;
import java.util.List;

@Path("/api/forecast")
@Produces(MediaType.APPLICATION_JSON)
class ForecastResource {
    private final StatelessForecastService stateless;
    private final ForecastRunService runs;
    private final ForecastQueryService queries;

    ForecastResource(StatelessForecastService stateless, ForecastRunService runs, ForecastQueryService queries) {
        this.stateless = stateless;
        this.runs = runs;
        this.queries = queries;
    }

    @POST
    @Path("series")
    @Consumes(MediaType.APPLICATION_JSON)
    public SeriesResponse series(@Valid @NotNull SeriesRequest request) {
        return stateless.series(request);
    }

    @POST
    @Path("batch")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @Produces("text/csv")
    public Response batch(InputStream csv, @QueryParam("method") String method, @QueryParam("alpha") String alpha,
                          @QueryParam("beta") String beta, @QueryParam("horizon") String horizon) {
        return stateless.batch(csv, method, QueryParams.optionalDouble("alpha", alpha),
                QueryParams.optionalDouble("beta", beta), QueryParams.optionalInt("horizon", horizon));
    }

    @POST
    @Path("rate-fit")
    @Consumes(MediaType.APPLICATION_JSON)
    public RateFitResponse rateFit(@Valid @NotNull RateFitRequest request) {
        return stateless.rateFit(request);
    }

    /**
     * Starts a recomputation of every stored forecast; 202 with the run to poll for progress. {@code origin}
     * (yyyy-mm-dd, default the first of this month) forecasts as of a past date from the records before it only.
     */
    @POST
    @Path("runs")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response startRun(UriInfo uri, @QueryParam("origin") String origin) {
        long id = runs.start("request", QueryParams.optionalDate("origin", origin));
        return Response.accepted(RunResponse.from(runs.run(id)))
                .location(uri.getAbsolutePathBuilder().path(Long.toString(id)).build()).build();
    }

    /**
     * Recent runs, newest first: {@code status=DONE&planning=true&limit=1} is the run whose forecasts planning uses
     * now ({@code planning=true} leaves out runs as of a past origin, which are kept for checking accuracy).
     */
    @GET
    @Path("runs")
    public List<RunResponse> runs(@QueryParam("status") String status, @QueryParam("planning") String planning,
                                  @QueryParam("limit") String limit) {
        return runs.recent(QueryParams.optionalEnum("status", status, ForecastRun.Status.class),
                QueryParams.optionalBoolean("planning", planning),
                QueryParams.intInRange("limit", limit, 10, 1, 100)).stream().map(RunResponse::from).toList();
    }

    @GET
    @Path("runs/{id}")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public RunResponse run(@PathParam("id") long id) {
        return RunResponse.from(runs.run(id));
    }

    @GET
    @Path("parts/{partNumber}")
    public StoredForecastResponse part(@PathParam("partNumber") String partNumber, @QueryParam("location") String location) {
        return queries.forPart(partNumber, location);
    }

    @GET
    @Path("locations/{code}")
    public List<StoredForecastResponse> location(@PathParam("code") String code) {
        return queries.atLocation(code);
    }

    @GET
    @Path("fleet-models/{family}")
    public FleetModelResponse fleetModel(@PathParam("family") String family) {
        return queries.fleetModel(family);
    }
}
