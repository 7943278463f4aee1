package org.depotcast.planning;

import jakarta.annotation.security.RolesAllowed;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.ws.rs.Consumes;
import jakarta.ws.rs.GET;
import jakarta.ws.rs.NotSupportedException;
import jakarta.ws.rs.POST;
import jakarta.ws.rs.PUT;
import jakarta.ws.rs.Path;
import jakarta.ws.rs.PathParam;
import jakarta.ws.rs.Produces;
import jakarta.ws.rs.QueryParam;
import jakarta.ws.rs.core.Context;
import jakarta.ws.rs.core.HttpHeaders;
import jakarta.ws.rs.core.MediaType;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.core.UriInfo;
import org.depotcast.access.Roles;
import org.depotcast.common.QueryParams;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;

@Path("/api/planning")
@Produces(MediaType.APPLICATION_JSON)
class PlanningResource {
    private final PlanningService planning;
    private final AlertService alerts;
    private final PurchasePlanService purchasePlans;
    private final TransferService transfers;
    private final TransferOrderService transferOrders;
    private final TransferReceiptService transferReceipts;
    private final Clock clock;

    PlanningResource(PlanningService planning, AlertService alerts, PurchasePlanService purchasePlans,
                     TransferService transfers, TransferOrderService transferOrders,
                     TransferReceiptService transferReceipts, Clock clock) {
        this.planning = planning;
        this.alerts = alerts;
        this.purchasePlans = purchasePlans;
        this.transfers = transfers;
        this.transferOrders = transferOrders;
        this.transferReceipts = transferReceipts;
        this.clock = clock;
    }

    @GET
    @Path("policies")
    public List<StockPolicy> policies(@QueryParam("location") String location) {
        return location == null ? planning.programmePolicies() : planning.policies(location);
    }

    /**
     * One alert per part and location (the named one, or every depot and the central store), with every reason that
     * applies, worst expected pump-days without water first; {@code kind} keeps those carrying that reason.
     */
    @GET
    @Path("alerts")
    public List<ReorderAlert> alerts(@QueryParam("location") String location, @QueryParam("kind") String kind,
                                     @QueryParam("includeSnoozed") String includeSnoozed) {
        return alerts.alerts(location, QueryParams.optionalEnum("kind", kind, AlertKind.class),
                QueryParams.optionalBoolean("includeSnoozed", includeSnoozed));
    }

    @POST
    @Path("alerts/actions")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response act(@Valid @NotNull PlanningRequests.AlertActionRequest r, UriInfo uri) {
        AlertAction a = alerts.act(r.partNumber(), r.location(), r.kind(), r.action(), r.snoozeUntil(), r.note());
        return Response.created(uri.getAbsolutePathBuilder().path(Long.toString(a.id)).build()).entity(actionResponse(a))
                .build();
    }

    @GET
    @Path("alerts/actions/{id}")
    public PlanningRequests.AlertActionResponse action(@PathParam("id") long id) {
        return actionResponse(alerts.action(id));
    }

    private static PlanningRequests.AlertActionResponse actionResponse(AlertAction a) {
        return new PlanningRequests.AlertActionResponse(a.id, a.action, a.actor, List.of(a.reasons.split(",")),
                a.snoozedUntil);
    }

    @POST
    @Path("purchase-plans")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response propose(@Valid @NotNull PlanningRequests.PurchasePlanRequest r, UriInfo uri) {
        LocalDate date = r.planningDate() == null ? LocalDate.now(clock) : r.planningDate();
        PurchasePlanResponse plan = purchasePlans.propose(r.budget(), date);
        return Response.created(uri.getAbsolutePathBuilder().path(Long.toString(plan.id())).build()).entity(plan).build();
    }

    @GET
    @Path("purchase-plans/{id}")
    public PurchasePlanResponse plan(@PathParam("id") long id) {
        return purchasePlans.get(id);
    }

    @POST
    @Path("purchase-plans/{id}/accept")
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public PurchasePlanResponse accept(@PathParam("id") long id) {
        return purchasePlans.accept(id);
    }

    @GET
    @Path("purchase-plans/{id}/export")
    @Produces("text/csv")
    public Response export(@PathParam("id") long id) {
        return purchasePlans.exportCsv(id).response();
    }

    @GET
    @Path("transfers/suggestions")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public List<TransferResponses.Suggestion> suggestions(@QueryParam("part") String part) {
        return transfers.suggest(part);
    }

    @GET
    @Path("service-levels")
    public PlanningService.ServiceLevelsInForce serviceLevels() {
        return planning.serviceLevelsInForce();
    }

    @GET
    @Path("transfer-costs")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public List<TransferResponses.Lane> laneCosts() {
        return transfers.lanes();
    }

    @PUT
    @Path("service-levels")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response serviceLevel(@Valid @NotNull PlanningRequests.ServiceLevelRequest r) {
        planning.setServiceLevel(r.partClass(), r.level());
        return Response.noContent().build();
    }

    /** Overrides the distance-based transport cost of one lane; a negative cost is refused. */
    @PUT
    @Path("transfer-costs")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response laneCost(@Valid @NotNull PlanningRequests.LaneCostRequest r) {
        transfers.setLaneCost(r.from(), r.to(), r.unitCost());
        return Response.noContent().build();
    }

    /** 201 with the new transfer; 200 with the first one when the same dispatch is sent again under its key. */
    @POST
    @Path("transfers")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public Response dispatch(@Valid @NotNull PlanningRequests.TransferRequest r, UriInfo uri) {
        TransferOrderService.Dispatched d = transferOrders.dispatch(r);
        return d.replayed() ? Response.ok(d.order()).build()
                : Response.created(uri.getAbsolutePathBuilder().path(Long.toString(d.order().id())).build())
                .entity(d.order()).build();
    }

    /** Transfers touching the caller's locations, in transit first; filters {@code from}, {@code to}, {@code state}. */
    @GET
    @Path("transfers")
    public List<TransferResponses.Order> transfers(@QueryParam("from") String from, @QueryParam("to") String to,
                                                   @QueryParam("state") String state) {
        return transferOrders.list(from, to, QueryParams.optionalEnum("state", state, TransferOrder.Status.class));
    }

    @GET
    @Path("transfers/{id}")
    public TransferResponses.Order transfer(@PathParam("id") long id) {
        return transferOrders.get(id);
    }

    /**
     * Books an arrival: everything outstanding without a body, or {@code receivedQuantity} and/or
     * {@code writtenOffQuantity} with a {@code writeOffReason}. A transfer that has ended answers 200 as it is.
     */
    @POST
    @Path("transfers/{id}/receive")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public TransferResponses.Order receive(@PathParam("id") long id, @Valid PlanningRequests.ReceiveRequest r) {
        return transferReceipts.receive(id, r);
    }

    /**
     * Without a body: everything still outstanding arrived. A body of another type than JSON ({"receivedQuantity":2}
     * sent as text/plain) is refused as one the operation does not read, never taken for "everything arrived".
     */
    @POST
    @Path("transfers/{id}/receive")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public TransferResponses.Order receiveAll(@PathParam("id") long id, @Context HttpHeaders headers) {
        if (headers.getLength() > 0 || headers.getHeaderString("Transfer-Encoding") != null) {
            throw new NotSupportedException();
        }
        return transferReceipts.receive(id, null);
    }
}
