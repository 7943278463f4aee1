package org.depotcast.repairs;

import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import org.eclipse.microprofile.openapi.annotations.Operation;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;

@Path("/api/pumps/service-due")
@Produces(MediaType.APPLICATION_JSON)
class ServiceDueResource {
    private final ServiceDueService service;
    private final Clock clock;

    ServiceDueResource(ServiceDueService service, Clock clock) {
        this.service = service;
        this.clock = clock;
    }

    /**
     * Preventive services due on the caller's pumps (a mechanic: the pumps assigned to them), soonest first: hours
     * since the last service against the model's interval, counted as the sensor service plan counts them.
     */
    @GET
    @Operation(summary = "Preventive services due", description = "Per pump in service that the caller may see: hours "
            + "since the last preventive service (or installation), at its recorded daily loads or, for a pump with a "
            + "sensor, the hours read on the days read (the recorded estimate for the days not read), the model's "
            + "interval, hours left and the day it falls due at today's load (the last 28 days read for a pump with a "
            + "sensor); overdue first. Optional depot filter.")
    public List<ServiceDue> due(@QueryParam("depot") String depot) {
        return service.dueAt(LocalDate.now(clock), depot);
    }
}
