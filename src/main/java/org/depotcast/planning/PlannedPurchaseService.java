package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.Quantities;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.PurchaseOrderRequest;
import org.depotcast.stock.PurchaseOrderService;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The purchase plan of each store: parts an officer put aside to buy (from an alert, say), shared by everyone who
 * looks after the store, until a purchase order to one supplier takes them. Ordering places the order and empties
 * its lines from the plan in one transaction, so a line is never both planned and ordered.
 */
@ApplicationScoped
public class PlannedPurchaseService {
    private final PlannedPurchaseRepository plans;
    private final PartService parts;
    private final LocationService locations;
    private final PurchaseOrderService orders;
    private final AccessScope scope;
    private final CurrentUser currentUser;
    private final AuditService audit;
    private final Clock clock;

    PlannedPurchaseService(PlannedPurchaseRepository plans, PartService parts, LocationService locations,
                           PurchaseOrderService orders, AccessScope scope, CurrentUser currentUser, AuditService audit,
                           Clock clock) {
        this.plans = plans;
        this.parts = parts;
        this.locations = locations;
        this.orders = orders;
        this.scope = scope;
        this.currentUser = currentUser;
        this.audit = audit;
        this.clock = clock;
    }

    /** Created is true when the part was not in the plan before. */
    public record Saved(PlannedPurchases.Line line, boolean created) {
    }

    /** A row of the plan with its line as answered (the part and store read as records). */
    private record Planned(PlannedPurchase row, PlannedPurchases.Line line) {
    }

    /** The plan of one store, or of every store in the caller's scope. */
    @Transactional
    public List<PlannedPurchases.Line> list(String locationCode) {
        if (locationCode != null) {
            return named(plans.at(store(locationCode).id())).stream().map(Planned::line).toList();
        }
        AccessScope.Scope mine = scope.current();
        return named(plans.listAll().stream().filter(p -> mine.sees(p.locationId)).toList()).stream()
                .map(Planned::line).toList();
    }

    @Transactional
    public Saved put(String locationCode, String partNumber, PlannedPurchases.Put request) {
        LocationSummary location = store(locationCode);
        PartSummary part = parts.requireSummary(null, partNumber);
        PlannedPurchase line = plans.of(part.id(), location.id()).orElse(null);
        PlannedPurchases.Line before = line == null ? null : PlannedPurchases.Line.from(line, part, location.code());
        boolean created = line == null;
        if (created) {
            line = new PlannedPurchase();
            line.partId = part.id();
            line.locationId = location.id();
        }
        line.quantity = Quantities.requirePositive("quantity", request.quantity(), part.unitOfIssue().wholeUnits());
        line.note = request.note();
        line.addedBy = currentUser.name();
        line.addedAt = OffsetDateTime.now(clock);
        if (created) {
            plans.persist(line);
        }
        PlannedPurchases.Line after = PlannedPurchases.Line.from(line, part, location.code());
        audit.record("PURCHASE_PLANNED", "planned_purchase", location.code() + "/" + part.partNumber(), before, after);
        return new Saved(after, created);
    }

    @Transactional
    public void remove(String locationCode, String partNumber) {
        LocationSummary location = store(locationCode);
        PartSummary part = parts.requireSummary(null, partNumber);
        PlannedPurchase line = plans.of(part.id(), location.id()).orElseThrow(() ->
                new EntityMissingException(null, "planned purchase", part.partNumber() + " at " + location.code()));
        audit.record("PURCHASE_UNPLANNED", "planned_purchase", location.code() + "/" + part.partNumber(),
                PlannedPurchases.Line.from(line, part, location.code()), null);
        plans.delete(line);
    }

    /** Places a purchase order for the plan's lines of one supplier at the store and takes them out of the plan. */
    @Transactional
    public PlannedPurchases.Ordered order(String locationCode, PlannedPurchases.Order request) {
        LocationSummary location = store(locationCode);
        List<Planned> lines = named(plans.at(location.id())).stream()
                .filter(p -> p.line().supplier().equals(request.supplier())).toList();
        if (lines.isEmpty()) {
            throw new BusinessRuleException("supplier", "no part from '" + request.supplier() + "' is in the purchase plan of "
                    + location.code());
        }
        LocalDate today = LocalDate.now(clock);
        orders.place(new PurchaseOrderRequest(request.orderNumber(), request.supplier(), location.code(), today,
                request.expectedOn(), lines.stream().map(p -> new PurchaseOrderRequest.Line(p.line().partNumber(),
                p.row().quantity)).toList()));
        List<PlannedPurchases.Line> taken = lines.stream().map(Planned::line).toList();
        lines.forEach(p -> plans.delete(p.row()));
        audit.record("PURCHASE_PLAN_ORDERED", "planned_purchase", location.code() + "/" + request.orderNumber(), taken,
                null);
        return new PlannedPurchases.Ordered(request.orderNumber(), request.supplier(), location.code(), today,
                request.expectedOn(), taken);
    }

    /**
     * A store in the caller's scope: suppliers deliver to the central store and depots, never to a kit. The store and
     * the part are named in the path, so a missing one is a 404 (the mapper's rule for path names).
     */
    private LocationSummary store(String code) {
        LocationSummary location = locations.requireSummary(null, code);
        scope.require(location.id(), location.code());
        if (location.kind() != LocationKind.CENTRAL_STORE && location.kind() != LocationKind.DEPOT) {
            throw new BusinessRuleException("location", "a purchase plan belongs to the central store or a depot, not '"
                    + location.code() + "'");
        }
        return location;
    }

    /** Rows with their parts and store codes, by store, supplier and part number. */
    private List<Planned> named(List<PlannedPurchase> rows) {
        Map<Long, PartSummary> partsById = new HashMap<>();
        parts.summaries().forEach(p -> partsById.put(p.id(), p));
        Map<Long, LocationSummary> stores = locations.summariesById();
        return rows.stream().map(p -> new Planned(p, PlannedPurchases.Line.from(p, partsById.get(p.partId),
                        stores.get(p.locationId).code())))
                .sorted(Comparator.comparing((Planned p) -> p.line().location())
                        .thenComparing(p -> p.line().supplier()).thenComparing(p -> p.line().partNumber()))
                .toList();
    }
}
