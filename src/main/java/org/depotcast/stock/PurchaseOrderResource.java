package org.depotcast.stock;

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
import org.depotcast.common.ImportResult;
import org.depotcast.common.QueryParams;

import java.io.InputStream;
import java.util.List;

@Path("/api/purchase-orders")
@Produces(MediaType.APPLICATION_JSON)
class PurchaseOrderResource {
    private final PurchaseOrderService service;

    PurchaseOrderResource(PurchaseOrderService service) {
        this.service = service;
    }

    @GET
    public List<PurchaseOrderResponse> list(@QueryParam("status") String status) {
        return service.responses(service.list(QueryParams.optionalEnum("status", status, PurchaseOrderStatus.class)));
    }

    @GET
    @Path("{orderNumber}")
    public PurchaseOrderResponse get(@PathParam("orderNumber") String orderNumber) {
        return service.response(service.get(orderNumber));
    }

    @POST
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public Response place(@Valid @NotNull PurchaseOrderRequest request, UriInfo uri) {
        PurchaseOrder order = service.place(request);
        return Response.created(uri.getAbsolutePathBuilder().path(order.orderNumber).build())
                .entity(service.response(order)).build();
    }

    @POST
    @Path("{orderNumber}/receipts")
    @Consumes(MediaType.APPLICATION_JSON)
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public Response receive(@PathParam("orderNumber") String orderNumber, @Valid @NotNull ReceiptRequest request) {
        PostedMovement posted = service.receive(orderNumber, request);
        return Response.status(posted.replayed() ? 200 : 201).entity(posted.movement()).build();
    }

    @POST
    @Path("{orderNumber}/cancel")
    @RolesAllowed({Roles.STORES_OFFICER, Roles.PROGRAMME_LEAD, Roles.ADMIN})
    public PurchaseOrderResponse cancel(@PathParam("orderNumber") String orderNumber) {
        return service.cancel(orderNumber);
    }

    @POST
    @Path("import")
    @Consumes({"text/csv", MediaType.TEXT_PLAIN})
    @RolesAllowed({Roles.STORES_OFFICER, Roles.ADMIN})
    public ImportResult importCsv(InputStream csv) {
        return new ImportResult(service.importCsv(csv));
    }

    @GET
    @Path("export")
    @Produces("text/csv")
    public Response exportCsv() {
        return service.exportCsv().response();
    }
}
