package org.depotcast.repairs;

import jakarta.annotation.security.RolesAllowed;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.MediaType;
import org.depotcast.access.Roles;

import java.util.List;

/**
 * Repairs refused for parts the kit's books did not hold, for the stores officers of the kits' depots; the mechanic
 * whose repair it was may withdraw its notice.
 */
@Path("/api/refused-repairs")
@Produces(MediaType.APPLICATION_JSON)
@RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN, Roles.PROGRAMME_LEAD})
class RefusedRepairResource {
    private final RefusedRepairService service;

    RefusedRepairResource(RefusedRepairService service) {
        this.service = service;
    }

    /** The open notices at the kits of one depot (every kit the caller sees without {@code depot}). */
    @GET
    public List<RefusedRepairNotice> open(@QueryParam("depot") String depot) {
        return service.open(depot);
    }

    @POST
    @Path("{id}/dismiss")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public RefusedRepairNotice dismiss(@PathParam("id") long id) {
        return service.dismiss(id);
    }

    /** The mechanic discarded the refused repair on the phone: its notice is withdrawn. */
    @POST
    @Path("by-repair/{repairRef}/withdraw")
    @RolesAllowed(Roles.MECHANIC)
    public RefusedRepairNotice withdraw(@PathParam("repairRef") String repairRef) {
        return service.withdraw(repairRef);
    }
}
