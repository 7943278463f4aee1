package org.depotcast.sensors;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.eclipse.microprofile.openapi.annotations.media.Schema;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.HeaderParam;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.HttpHeaders;
import jakarta.ws.rs.core.MediaType;
import org.depotcast.access.Roles;
import org.depotcast.common.DateBounds;
import org.depotcast.common.QueryParams;

import java.io.InputStream;
import java.time.LocalDate;
import java.util.List;

@Path("/api/sensors")
@Produces(MediaType.APPLICATION_JSON)
class SensorResource {
    static final String NDJSON = "application/x-ndjson";

    private final SensorIntakeService intake;
    private final SensorConversionService conversions;
    private final SensorPumpService pumps;
    private final ProbablyDownService probablyDown;
    private final StopFlagService stopFlags;
    private final SensorServicePlanService servicePlan;
    private final StopCertaintyService certainty;

    SensorResource(SensorIntakeService intake, SensorConversionService conversions, SensorPumpService pumps,
                   ProbablyDownService probablyDown, StopFlagService stopFlags, SensorServicePlanService servicePlan,
                   StopCertaintyService certainty) {
        this.certainty = certainty;
        this.servicePlan = servicePlan;
        this.probablyDown = probablyDown;
        this.stopFlags = stopFlags;
        this.intake = intake;
        this.conversions = conversions;
        this.pumps = pumps;
    }

    @POST
    @Path("readings")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN, NDJSON})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public IntakeResult readings(@HeaderParam(HttpHeaders.CONTENT_TYPE) String contentType, InputStream body) {
        boolean ndjson = contentType != null && contentType.toLowerCase(java.util.Locale.ROOT).startsWith(NDJSON);
        return ndjson ? intake.intakeNdjson(body) : intake.intakeCsv(body);
    }

    @GET
    @Path("pumps/{assetId}/months")
    public PumpSensorUsage months(@PathParam("assetId") String assetId) {
        return pumps.usageOf(assetId);
    }

    @GET
    @Path("conversions")
    public List<SensorConversionResponse> conversions() {
        return conversions.all();
    }

    @PUT
    @Path("conversions/{modelCode}")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public SensorConversionResponse setConversion(@PathParam("modelCode") String modelCode,
                                                  @Valid @NotNull SensorConversionRequest request) {
        return conversions.set(modelCode, request);
    }

    @GET
    @Path("probably-down")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.MECHANIC})
    public ProbablyDownReport probablyDown(@QueryParam("depot") String depot) {
        return probablyDown.report(depot, DateBounds.today());
    }

    record StopCheckResult(LocalDate day, int probablyDown) {
    }

    @POST
    @Path("stop-check")
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public StopCheckResult stopCheck(@QueryParam("day") String day) {
        // The day judged is a day the readings are in: as an event's date, at most a day ahead (422 beyond).
        LocalDate asOf = DateBounds.requireEvent("day", QueryParams.optionalDate("day", day));
        LocalDate judged = asOf == null ? DateBounds.today() : asOf;
        return new StopCheckResult(judged, stopFlags.refreshAll(judged));
    }

    /** The least probability down at which a pump is flagged, as a fraction. */
    record StopCertaintyRequest(@Schema(description = "Least probability down at which a pump is flagged, as a "
                                        + "fraction (0.5 to 0.99; 0.8 means 80 %)")
                                @NotNull @DecimalMin(value = "0.5", message = StopCertaintyService.RANGE)
                                @DecimalMax(value = "0.99", message = StopCertaintyService.RANGE)
                                Double leastProbability) {
    }

    @GET
    @Path("stop-certainty")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.MECHANIC})
    public StopCertaintyService.StopCertainty stopCertainty() {
        return certainty.inForce();
    }

    /** The programme lead sets how sure the sensors must be before a pump is flagged; flags open from then on. */
    @PUT
    @Path("stop-certainty")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public StopCertaintyService.StopCertainty setStopCertainty(@Valid @NotNull StopCertaintyRequest request) {
        return certainty.set(request.leastProbability());
    }

    @GET
    @Path("service-plan")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.MECHANIC})
    public ServicePlanReport servicePlan(@QueryParam("depot") String depot) {
        return servicePlan.planAt(depot, DateBounds.today());
    }
}
