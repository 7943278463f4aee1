package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.EntityMissingException;
import io.quarkus.security.ForbiddenException;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/** Read side of the stock ledger: balances with on-order, movement history, and reconciliation. */
@ApplicationScoped
public class StockQueryService {
    private final StockBalanceRepository balances;
    private final StockMovementRepository movements;
    private final LocationService locations;
    private final PartService parts;
    private final PurchaseOrderService orders;
    private final AccessScope scope;

    StockQueryService(StockBalanceRepository balances, StockMovementRepository movements, LocationService locations,
                      PartService parts, PurchaseOrderService orders, AccessScope scope) {
        this.scope = scope;
        this.balances = balances;
        this.movements = movements;
        this.locations = locations;
        this.parts = parts;
        this.orders = orders;
    }

    /** Every part with stock or stock on order at the location (or everywhere when {@code locationCode} is null). */
    @Transactional
    public List<BalanceView> balances(String locationCode) {
        Long locationId = locationCode == null ? null : visibleLocation(locationCode).id;
        AccessScope.Scope visible = scope.current();
        Map<Long, PartSummary> partsById = parts.summariesById();
        Map<Long, String> codes = new HashMap<>();
        locations.all().forEach(l -> codes.put(l.id, l.code));
        Map<Long, Map<Long, BigDecimal>> onOrder = orders.onOrder(locationId);
        Map<List<Long>, BigDecimal[]> cells = new HashMap<>();
        for (Object[] row : balances.onHand(locationId)) {
            cells.put(List.of((Long) row[0], (Long) row[1]), new BigDecimal[]{(BigDecimal) row[2], BigDecimal.ZERO});
        }
        onOrder.forEach((partId, byLocation) -> byLocation.forEach((locId, qty) -> cells
                .computeIfAbsent(List.of(partId, locId), k -> new BigDecimal[]{BigDecimal.ZERO, BigDecimal.ZERO})[1] = qty));
        List<BalanceView> views = new ArrayList<>(cells.size());
        cells.forEach((key, value) -> {
            if (!visible.sees(key.get(1))) {
                return;
            }
            PartSummary part = partsById.get(key.get(0));
            views.add(new BalanceView(part.partNumber(), part.description(), codes.get(key.get(1)), value[0], value[1]));
        });
        views.sort(Comparator.comparing(BalanceView::locationCode).thenComparing(BalanceView::partNumber));
        return views;
    }

    /** On hand of one part at one location; zero when it never had any. */
    @Transactional
    public BigDecimal onHand(String partNumber, String locationCode) {
        PartSummary part = parts.requireSummary("partNumber", partNumber);
        Location location = locations.require("location", locationCode);
        return balances.find("partId = ?1 and location.id = ?2", part.id(), location.id).firstResultOptional()
                .map(b -> b.onHand).orElse(BigDecimal.ZERO);
    }

    @Transactional
    public List<MovementResponse> movements(String partNumber, String locationCode, OffsetDateTime since, int limit) {
        Long partId = partNumber == null ? null : parts.requireSummary("part", partNumber).id();
        Long locationId = locationCode == null ? null : visibleLocation(locationCode).id;
        AccessScope.Scope visible = scope.current();
        Map<Long, PartSummary> partsById = parts.summariesById();
        return movements.search(partId, locationId, visible.locationIds(), since, limit).stream()
                .map(m -> MovementResponse.from(m, partsById.get(m.partId).partNumber())).toList();
    }

    /** One movement, when it touches a location the caller sees: 404 when unknown, 403 when outside their locations. */
    @Transactional
    public MovementResponse movement(long id) {
        StockMovement movement = movements.findByIdOptional(id)
                .orElseThrow(() -> new EntityMissingException(null, "movement", id));
        AccessScope.Scope visible = scope.current();
        boolean seen = (movement.fromLocation != null && visible.sees(movement.fromLocation.id))
                || (movement.toLocation != null && visible.sees(movement.toLocation.id));
        if (!seen) {
            throw new ForbiddenException("movement " + id + " touches no location assigned to you");
        }
        return MovementResponse.from(movement, parts.summariesById().get(movement.partId).partNumber());
    }

    @Transactional
    public ReconcileReport reconcile() {
        Map<List<Long>, BigDecimal> ledger = new HashMap<>();
        for (Object[] row : movements.ledgerSums()) {
            ledger.put(List.of(((Number) row[0]).longValue(), ((Number) row[1]).longValue()), toDecimal(row[2]));
        }
        AccessScope.Scope visible = scope.current();
        ledger.keySet().removeIf(key -> !visible.sees(key.get(1)));
        List<ReconcileReport.Mismatch> mismatches = new ArrayList<>();
        List<Object[]> stored = balances.onHand(null).stream().filter(row -> visible.sees((Long) row[1])).toList();
        for (Object[] row : stored) {
            List<Long> key = List.of((Long) row[0], (Long) row[1]);
            BigDecimal sum = Objects.requireNonNullElse(ledger.remove(key), BigDecimal.ZERO);
            if (sum.compareTo((BigDecimal) row[2]) != 0) {
                mismatches.add(mismatch(key, (BigDecimal) row[2], sum));
            }
        }
        // Ledger lines with no balance row at all are mismatches too, unless they net to zero.
        ledger.forEach((key, sum) -> {
            if (sum.signum() != 0) {
                mismatches.add(mismatch(key, BigDecimal.ZERO, sum));
            }
        });
        return new ReconcileReport(stored.size(), movements.count(), mismatches.isEmpty(), mismatches);
    }

    private Location visibleLocation(String code) {
        Location location = locations.require("location", code);
        scope.require(location.id, location.code);
        return location;
    }

    private ReconcileReport.Mismatch mismatch(List<Long> key, BigDecimal balance, BigDecimal sum) {
        return new ReconcileReport.Mismatch(parts.summariesById().get(key.get(0)).partNumber(),
                locations.byId(key.get(1)).code, balance, sum);
    }

    private static BigDecimal toDecimal(Object value) {
        return value instanceof BigDecimal d ? d : new BigDecimal(value.toString());
    }
}
