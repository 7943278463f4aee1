package org.depotcast.planning;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.core.MediaType;

/** Stateless reorder-point arithmetic for a planner's own numbers. */
@Path("/api/policy")
@Produces(MediaType.APPLICATION_JSON)
class PolicyResource {
    private final ReorderPointService reorderPoints;

    PolicyResource(ReorderPointService reorderPoints) {
        this.reorderPoints = reorderPoints;
    }

    @POST
    @Path("reorder-point")
    @Consumes(MediaType.APPLICATION_JSON)
    public PlanningRequests.ReorderPointResponse reorderPoint(@Valid @NotNull PlanningRequests.ReorderPointRequest r) {
        return reorderPoints.reorderPoint(r);
    }
}
