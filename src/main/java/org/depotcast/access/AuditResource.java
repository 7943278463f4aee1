package org.depotcast.access;

import jakarta.annotation.security.RolesAllowed;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import org.depotcast.common.QueryParams;

import java.util.List;

@Path("/api/audit")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
class AuditResource {
    private final AuditService audit;

    AuditResource(AuditService audit) {
        this.audit = audit;
    }

    @GET
    public List<AuditEntry> recent(@QueryParam("entityType") String entityType, @QueryParam("limit") String limit) {
        return audit.recent(entityType, QueryParams.intInRange("limit", limit, 200, 1, 10_000));
    }

    @GET
    @Path("export")
    @Produces("text/csv")
    public jakarta.ws.rs.core.Response export(@QueryParam("entityType") String entityType) {
        return audit.exportCsv(entityType).response();
    }
}
