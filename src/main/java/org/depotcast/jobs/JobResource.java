package org.depotcast.jobs;

import jakarta.annotation.security.RolesAllowed;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import org.depotcast.access.Roles;
import org.depotcast.common.QueryParams;

import java.util.List;

/** One poll shape for every background job, answered by any instance (the state is in the database). */
@Path("/api/jobs")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN, Roles.STORES_OFFICER})
class JobResource {
    private final JobService jobs;

    JobResource(JobService jobs) {
        this.jobs = jobs;
    }

    @GET
    @Path("{id}")
    public JobView job(@PathParam("id") long id) {
        return jobs.job(id);
    }

    @GET
    public List<JobView> recent(@QueryParam("kind") String kind, @QueryParam("state") String state,
                                @QueryParam("limit") String limit) {
        return jobs.recent(QueryParams.optionalEnum("kind", kind, JobKind.class),
                QueryParams.optionalEnum("state", state, JobState.class),
                QueryParams.intInRange("limit", limit, 20, 1, 100));
    }
}
