package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.catalogue.Part;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvOut;
import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvTable;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Purchase orders: placing them, receiving goods into the ledger, and the on-order quantities they imply. */
@ApplicationScoped
public class PurchaseOrderService {
    static final List<String> CSV_COLUMNS = List.of("order_number", "supplier", "destination_code", "ordered_on",
            "expected_on", "part_number", "quantity");

    private final PurchaseOrderRepository orders;
    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final org.depotcast.access.AccessScope scope;
    private final org.depotcast.access.AuditService audit;

    PurchaseOrderService(PurchaseOrderRepository orders, PartService parts, LocationService locations,
                         StockLedgerService ledger, org.depotcast.access.AccessScope scope,
                         org.depotcast.access.AuditService audit) {
        this.audit = audit;
        this.scope = scope;
        this.orders = orders;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
    }

    public List<PurchaseOrder> list(PurchaseOrderStatus status) {
        var visible = scope.current();
        return orders.withStatus(status).stream().filter(o -> visible.sees(o.destination.id)).toList();
    }

    public PurchaseOrder get(String orderNumber) {
        PurchaseOrder order = orders.byNumber(orderNumber)
                .orElseThrow(() -> new EntityMissingException(null, "purchase order", orderNumber));
        scope.require(order.destination.id, order.destination.code);
        return order;
    }

    /** Outstanding on open orders, keyed by part id then destination id. */
    public Map<Long, Map<Long, BigDecimal>> onOrder(Long destinationId) {
        Map<Long, Map<Long, BigDecimal>> result = new HashMap<>();
        for (Object[] row : orders.onOrder(destinationId)) {
            result.computeIfAbsent((Long) row[0], k -> new HashMap<>()).put((Long) row[1], (BigDecimal) row[2]);
        }
        return result;
    }

    @Transactional
    public PurchaseOrder place(PurchaseOrderRequest request) {
        if (orders.byNumber(request.orderNumber()).isPresent()) {
            throw new ConflictException("orderNumber", "purchase order '" + request.orderNumber() + "' already exists");
        }
        if (request.expectedOn() != null && request.expectedOn().isBefore(request.orderedOn())) {
            throw new InvalidInputException("expectedOn", "must not be before orderedOn");
        }
        PurchaseOrder order = new PurchaseOrder();
        order.orderNumber = request.orderNumber();
        order.supplier = request.supplier();
        order.destination = locations.require("destination", request.destination());
        scope.require(order.destination.id, order.destination.code);
        if (order.destination.kind == LocationKind.KIT) {
            throw new BusinessRuleException("destination", "suppliers deliver to the central store or a depot, not a kit");
        }
        order.orderedOn = request.orderedOn();
        order.expectedOn = request.expectedOn();
        order.status = PurchaseOrderStatus.OPEN;
        for (int i = 0; i < request.lines().size(); i++) {
            PurchaseOrderRequest.Line l = request.lines().get(i);
            String field = "lines[" + i + "]";
            Part part = parts.require(field + ".partNumber", l.partNumber());
            if (order.lines.stream().anyMatch(existing -> existing.part.id.equals(part.id))) {
                throw new InvalidInputException(field + ".partNumber", "part '" + l.partNumber() + "' is listed twice");
            }
            PurchaseOrderLine line = new PurchaseOrderLine();
            line.part = part;
            line.quantityOrdered = Quantities.requirePositive(field + ".quantity", l.quantity(), part.wholeUnits());
            line.quantityReceived = BigDecimal.ZERO;
            order.addLine(line);
        }
        orders.persist(order);
        audit.record("PURCHASE_ORDER_PLACED", "purchase_order", order.orderNumber, null, request);
        return order;
    }

    /** Receives goods: the order line and the ledger change together or not at all. */
    @Transactional
    public PostedMovement receive(String orderNumber, ReceiptRequest receipt) {
        PurchaseOrder order = orders.lockedByNumber(orderNumber)
                .orElseThrow(() -> new EntityMissingException(null, "purchase order", orderNumber));
        scope.require(order.destination.id, order.destination.code);
        if (order.status != PurchaseOrderStatus.OPEN && receipt.idempotencyKey() == null) {
            throw new BusinessRuleException("orderNumber", "purchase order '" + orderNumber + "' is " + order.status);
        }
        PurchaseOrderLine line = order.lines.stream().filter(l -> l.part.partNumber.equals(receipt.partNumber()))
                .findFirst().orElseThrow(() -> new BusinessRuleException("partNumber",
                        "part '" + receipt.partNumber() + "' is not on order '" + orderNumber + "'"));
        MovementCommand command = new MovementCommand(MovementKind.RECEIPT, receipt.partNumber(), null,
                order.destination.code, receipt.quantity(), receipt.occurredAt(), "goods received", orderNumber,
                IdempotencyKey.client("receipt", receipt.idempotencyKey()), line.id, null);
        PostedMovement posted = ledger.postWithin(command);
        if (!posted.replayed()) {
            line.receive(posted.movement().quantity());
            order.closeIfComplete();
        }
        return posted;
    }

    /** Answers the cancelled order read inside the transaction: its lines are lazy and gone once it commits. */
    @Transactional
    public PurchaseOrderResponse cancel(String orderNumber) {
        PurchaseOrder order = orders.lockedByNumber(orderNumber)
                .orElseThrow(() -> new EntityMissingException(null, "purchase order", orderNumber));
        scope.require(order.destination.id, order.destination.code);
        if (order.status != PurchaseOrderStatus.OPEN) {
            throw new BusinessRuleException("orderNumber", "only an open order can be cancelled; this one is " + order.status);
        }
        order.status = PurchaseOrderStatus.CANCELLED;
        audit.record("PURCHASE_ORDER_CANCELLED", "purchase_order", order.orderNumber, PurchaseOrderStatus.OPEN,
                PurchaseOrderStatus.CANCELLED);
        return PurchaseOrderResponse.from(order);
    }

    /** One row per order line; rows sharing an order number make one order. All or nothing; orders must be new. */
    @Transactional
    public int importCsv(String csv) {
        CsvTable table = CsvTable.parse(csv, CSV_COLUMNS);
        Map<String, PurchaseOrderRequest> byNumber = new LinkedHashMap<>();
        for (CsvRow row : table.rows()) {
            String number = row.text("order_number");
            if (number != null && orders.byNumber(number).isPresent()) {
                row.reject("order_number", "purchase order '" + number + "' already exists");
            }
            String destination = row.text("destination_code");
            Optional<Location> where = destination == null ? Optional.empty() : locations.find(destination);
            if (destination != null && (where.isEmpty() || where.get().kind == LocationKind.KIT)) {
                row.reject("destination_code", "must name the central store or a depot, was '" + destination + "'");
            }
            String partNumber = row.text("part_number");
            Optional<Part> part = partNumber == null ? Optional.empty() : parts.find(partNumber);
            if (partNumber != null && part.isEmpty()) {
                row.reject("part_number", "part '" + partNumber + "' does not exist");
            }
            BigDecimal quantity = row.decimal("quantity", BigDecimal.ZERO, true);
            if (quantity != null && part.isPresent() && part.get().wholeUnits() && !Quantities.isWhole(quantity)) {
                row.reject("quantity", "must be a whole number for part '" + partNumber + "'");
            }
            PurchaseOrderRequest.Line line = new PurchaseOrderRequest.Line(partNumber, quantity);
            if (number != null) {
                PurchaseOrderRequest earlier = byNumber.get(number);
                List<PurchaseOrderRequest.Line> lines = earlier == null ? new ArrayList<>() : new ArrayList<>(earlier.lines());
                lines.add(line);
                byNumber.put(number, new PurchaseOrderRequest(number, row.text("supplier"), destination,
                        row.date("ordered_on"), row.optionalDate("expected_on"), lines));
            }
        }
        table.problems().throwIfAny();
        byNumber.values().forEach(this::place);
        return table.rows().size();
    }

    public String exportCsv() {
        List<List<?>> rows = new ArrayList<>();
        for (PurchaseOrder o : list(PurchaseOrderStatus.OPEN)) {
            for (PurchaseOrderLine l : o.lines) {
                rows.add(List.of(o.orderNumber, o.supplier, o.destination.code, o.orderedOn,
                        o.expectedOn == null ? "" : o.expectedOn, l.part.partNumber,
                        l.outstanding().stripTrailingZeros().toPlainString()));
            }
        }
        return CsvOut.write(CSV_COLUMNS, rows, r -> r);
    }
}
