package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.IdempotencyKey;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;

import java.io.InputStream;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Purchase orders: placing them, receiving goods into the ledger, and the on-order quantities they imply. */
@ApplicationScoped
public class PurchaseOrderService {
    static final List<String> CSV_COLUMNS = List.of("order_number", "supplier", "destination_code", "ordered_on",
            "expected_on", "part_number", "quantity");
    /** The export says which quantity is which; its quantity_ordered reads back as an import's quantity. */
    private static final List<String> EXPORT_COLUMNS = List.of("order_number", "supplier", "destination_code",
            "ordered_on", "expected_on", "part_number", "quantity_ordered", "quantity_received", "quantity_outstanding");

    private final PurchaseOrderRepository orders;
    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final org.depotcast.access.AccessScope scope;
    private final org.depotcast.access.AuditService audit;
    private final CsvImporter importer;

    PurchaseOrderService(PurchaseOrderRepository orders, PartService parts, LocationService locations,
                         StockLedgerService ledger, org.depotcast.access.AccessScope scope,
                         org.depotcast.access.AuditService audit, CsvImporter importer) {
        this.importer = importer;
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

    /** Orders as the API shows them, the parts' numbers read once for the whole list. */
    public List<PurchaseOrderResponse> responses(List<PurchaseOrder> list) {
        Map<Long, String> partNumbers = partNumbers();
        return list.stream().map(o -> PurchaseOrderResponse.from(o, partNumbers)).toList();
    }

    public PurchaseOrderResponse response(PurchaseOrder order) {
        return PurchaseOrderResponse.from(order, partNumbers());
    }

    /** Every part's number by id (the catalogue's records; an order line holds the part's id). */
    private Map<Long, String> partNumbers() {
        Map<Long, String> numbers = new HashMap<>();
        parts.summaries().forEach(p -> numbers.put(p.id(), p.partNumber()));
        return numbers;
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
            PartSummary part = parts.requireSummary(field + ".partNumber", l.partNumber());
            if (order.lines.stream().anyMatch(existing -> existing.partId == part.id())) {
                throw new InvalidInputException(field + ".partNumber", "part '" + l.partNumber() + "' is listed twice");
            }
            PurchaseOrderLine line = new PurchaseOrderLine();
            line.partId = part.id();
            line.quantityOrdered = Quantities.requirePositive(field + ".quantity", l.quantity(),
                    part.unitOfIssue().wholeUnits());
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
        Map<Long, String> partNumbers = partNumbers();
        PurchaseOrderLine line = order.lines.stream().filter(l -> receipt.partNumber().equals(partNumbers.get(l.partId)))
                .findFirst().orElseThrow(() -> new BusinessRuleException("partNumber",
                        "part '" + receipt.partNumber() + "' is not on order '" + orderNumber + "'"));
        MovementCommand command = new MovementCommand(MovementKind.RECEIPT, receipt.partNumber(), null,
                order.destination.code, receipt.quantity(), receipt.occurredAt(), "goods received", orderNumber,
                IdempotencyKey.client("receipt", receipt.idempotencyKey()), line.id, null);
        PostedMovement posted = ledger.postWithin(command);
        if (!posted.replayed()) {
            line.receive(posted.movement().quantity(), receipt.partNumber());
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
        return response(order);
    }

    /**
     * One row per order line; rows sharing an order number make one order, placed as POST would place it. All or
     * nothing; orders must be new.
     */
    @Transactional
    public int importCsv(InputStream csv) {
        return importer.run(csv, CsvImport.of(CSV_COLUMNS.subList(0, 6), PurchaseOrderService::read)
                .identifiers("order_number", "destination_code", "part_number")
                .column("destination", "destination_code").scopeColumn("destination_code")
                .applyGrouped(PurchaseOrderRequest::orderNumber, PurchaseOrderService::joined, "lines",
                        PurchaseOrderRequest::lines, this::place));
    }

    private static PurchaseOrderRequest read(CsvRow row) {
        String quantityColumn = row.has("quantity") || !row.has("quantity_ordered") ? "quantity" : "quantity_ordered";
        return new PurchaseOrderRequest(row.text("order_number"), row.text("supplier"), row.text("destination_code"),
                row.date("ordered_on"), row.optionalDate("expected_on"),
                List.of(new PurchaseOrderRequest.Line(row.text("part_number"), row.decimal(quantityColumn))));
    }

    /** The order as its first row gives it, with every row's line. */
    private static PurchaseOrderRequest joined(PurchaseOrderRequest first, PurchaseOrderRequest next) {
        List<PurchaseOrderRequest.Line> lines = new ArrayList<>(first.lines());
        lines.addAll(next.lines());
        return new PurchaseOrderRequest(first.orderNumber(), first.supplier(), first.destination(), first.orderedOn(),
                first.expectedOn(), lines);
    }

    /** Open orders, one row per line, with what was ordered, what has come and what is still to come. */
    @Transactional
    public CsvExport exportCsv() {
        List<List<?>> rows = new ArrayList<>();
        Map<Long, String> partNumbers = partNumbers();
        for (PurchaseOrder o : list(PurchaseOrderStatus.OPEN)) {
            for (PurchaseOrderLine l : o.lines) {
                rows.add(List.of(o.orderNumber, o.supplier, o.destination.code, o.orderedOn,
                        o.expectedOn == null ? "" : o.expectedOn, partNumbers.get(l.partId), plain(l.quantityOrdered),
                        plain(l.quantityReceived), plain(l.outstanding())));
            }
        }
        return new CsvExport("purchase-orders.csv", EXPORT_COLUMNS, rows);
    }

    private static String plain(BigDecimal quantity) {
        return quantity.stripTrailingZeros().toPlainString();
    }
}
