package org.depotcast.forecasting;

import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import org.depotcast.common.QueryParams;

import java.util.List;

/** The forecast explorer's reads: one part's forecast with ranges and method scores, and the fleet models. */
@Path("/api/forecast/explorer")
@Produces(MediaType.APPLICATION_JSON)
class ForecastExplorerResource {
    private final ForecastExplorerService explorer;

    ForecastExplorerResource(ForecastExplorerService explorer) {
        this.explorer = explorer;
    }

    /** A part at a location; without {@code location}, the whole programme. */
    @GET
    @Path("parts/{partNumber}")
    public ForecastExplorerResponse part(@PathParam("partNumber") String partNumber, @QueryParam("location") String location) {
        return explorer.part(partNumber, location);
    }

    @GET
    @Path("fleet-models")
    public List<FleetModelResponse> fleetModels() {
        return explorer.fleetModels();
    }

    /** Rates against depth and daily use for a reference pump (defaults: 30 m, 6 hours a day, 5 years old). */
    @GET
    @Path("fleet-models/{family}")
    public FleetModelView fleetModel(@PathParam("family") String family, @QueryParam("depthM") String depthM,
                                     @QueryParam("hoursPerDay") String hoursPerDay, @QueryParam("ageYears") String ageYears) {
        return explorer.fleetModel(family, QueryParams.optionalDouble("depthM", depthM),
                QueryParams.optionalDouble("hoursPerDay", hoursPerDay), QueryParams.optionalDouble("ageYears", ageYears));
    }
}
