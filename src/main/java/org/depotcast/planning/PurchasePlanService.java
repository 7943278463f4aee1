package org.depotcast.planning;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.EntityMissingException;
import org.depotcast.core.policy.MarginalAllocation;
import org.depotcast.core.policy.OrderQuantity;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.PurchaseOrderRequest;
import org.depotcast.stock.PurchaseOrderService;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns a budget into a supplier order by marginal analysis (see {@link MarginalAllocation}): each next purchase
 * step of a part — whole packs, at least its minimum order quantity — goes where it removes the most expected
 * pump-days without water per unit of money, up to the part's order-up-to level. Proposing changes no stock;
 * accepting places one purchase order per supplier, delivered to the central store.
 */
@ApplicationScoped
public class PurchasePlanService {
    private final PlanningService planning;
    private final PartService parts;
    private final PurchaseOrderService orders;
    private final LocationService locations;
    private final CurrentUser currentUser;
    private final Plans plans;
    private final org.depotcast.access.AccessScope scope;
    private final org.depotcast.access.AuditService audit;
    private final Clock clock;

    @ApplicationScoped
    static class Plans implements PanacheRepository<PurchasePlan> {
    }

    PurchasePlanService(PlanningService planning, PartService parts, PurchaseOrderService orders, LocationService locations,
                        CurrentUser currentUser, Plans plans, org.depotcast.access.AccessScope scope,
                        org.depotcast.access.AuditService audit, Clock clock) {
        this.scope = scope;
        this.audit = audit;
        this.planning = planning;
        this.parts = parts;
        this.orders = orders;
        this.locations = locations;
        this.currentUser = currentUser;
        this.plans = plans;
        this.clock = clock;
    }

    @Transactional
    public PurchasePlanResponse propose(BigDecimal budget, LocalDate planningDate) {
        List<StockPolicy> policies = planning.programmePolicies();
        String currency = programmeCurrency(policies);
        List<StockPolicy> priced = policies.stream().filter(p -> p.currency().equals(currency)
                && !AlertRules.NO_FORECAST.equals(p.forecastMethod())).toList();
        List<MarginalAllocation.Item> items = new ArrayList<>();
        for (StockPolicy p : priced) {
            int step = step(p);
            items.add(new MarginalAllocation.Item(PolicyCalculator.distribution(p.demandMean(), p.demandVariance()),
                    p.position(), step, step * p.unitCost() + 1e-9, p.protectionDays() / 2.0, wanted(p)));
        }
        MarginalAllocation.Plan allocation = MarginalAllocation.allocate(items, budget.doubleValue());
        PurchasePlan plan = new PurchasePlan();
        plan.createdAt = OffsetDateTime.now(clock);
        plan.createdBy = currentUser.name();
        plan.planningDate = planningDate;
        plan.budget = budget;
        plan.currency = currency;
        plan.pumpDaysBefore = allocation.backordersBefore();
        plan.pumpDaysAfter = allocation.backordersAfter();
        plan.status = PurchasePlan.Status.PROPOSED;
        plan.horizonDaysMin = priced.stream().mapToInt(StockPolicy::protectionDays).min().orElse(0);
        plan.horizonDaysMax = priced.stream().mapToInt(StockPolicy::protectionDays).max().orElse(0);
        plan.spent = addFundedLines(plan, priced, allocation.unitsPerItem());
        addUnweighedLines(plan, policies, currency);
        plans.persist(plan);
        return PurchasePlanResponse.from(plan, partsById());
    }

    /** The priced parts' lines (skipping those bought nothing and above their reorder point); returns their cost. */
    private BigDecimal addFundedLines(PurchasePlan plan, List<StockPolicy> priced, long[] unitsPerItem) {
        BigDecimal spent = BigDecimal.ZERO;
        for (int i = 0; i < priced.size(); i++) {
            StockPolicy p = priced.get(i);
            long units = unitsPerItem[i];
            if (units == 0 && p.position() > p.reorderPoint()) {
                continue;
            }
            PurchasePlanLine line = line(plan, p, units);
            if (line.shortfallAfter > 0) {
                line.unfundedQuantity = BigDecimal.valueOf(Math.max(0, wanted(p) - units));
                line.leftOutReason = "BUDGET";
            }
            spent = spent.add(line.cost);
            plan.lines.add(line);
        }
        return spent;
    }

    /** Parts the plan could not weigh: priced in another currency (no rate is set), or with no forecast. */
    private void addUnweighedLines(PurchasePlan plan, List<StockPolicy> policies, String currency) {
        for (StockPolicy p : policies) {
            boolean noForecast = AlertRules.NO_FORECAST.equals(p.forecastMethod());
            if (noForecast || (!p.currency().equals(currency) && p.position() <= p.reorderPoint())) {
                PurchasePlanLine line = line(plan, p, 0);
                line.leftOutReason = noForecast ? "NO_FORECAST" : "OTHER_CURRENCY";
                line.unfundedQuantity = noForecast ? BigDecimal.ZERO : BigDecimal.valueOf(wanted(p));
                plan.lines.add(line);
            }
        }
    }

    /** Units up to the order-up-to level, rounded up to whole purchase steps. */
    private static long wanted(StockPolicy p) {
        return OrderQuantity.roundUpToPacks((long) Math.max(0, Math.ceil(p.orderUpTo() - p.position())), step(p));
    }

    private static int step(StockPolicy p) {
        return (int) OrderQuantity.roundUpToPacks(Math.max(p.packSize(), p.minOrderQty()), p.packSize());
    }

    private PurchasePlanLine line(PurchasePlan plan, StockPolicy p, long units) {
        PurchasePlanLine line = new PurchasePlanLine();
        line.plan = plan;
        line.partId = parts.requireSummary("partNumber", p.partNumber()).id();
        line.packs = (int) (units / p.packSize());
        line.quantity = BigDecimal.valueOf(units);
        line.cost = BigDecimal.valueOf(p.unitCost()).multiply(line.quantity).setScale(2, RoundingMode.HALF_UP);
        line.positionBefore = p.position();
        line.reorderPoint = p.reorderPoint();
        line.orderUpTo = p.orderUpTo();
        line.shortfallAfter = Math.max(0, p.reorderPoint() - (p.position() + units));
        return line;
    }

    @Transactional
    public PurchasePlanResponse get(long id) {
        scope.requireProgramme();
        return PurchasePlanResponse.from(require(id), partsById());
    }

    /** Places one purchase order per supplier for the plan's lines, in one transaction; a plan is accepted once. */
    @Transactional
    public PurchasePlanResponse accept(long id) {
        scope.requireProgramme();
        PurchasePlan plan = plans.findById(id, jakarta.persistence.LockModeType.PESSIMISTIC_WRITE);
        if (plan == null) {
            throw new EntityMissingException(null, "purchase plan", id);
        }
        if (plan.status == PurchasePlan.Status.ACCEPTED) {
            throw new ConflictException("id", "purchase plan " + id + " was already accepted");
        }
        String central = locations.summariesOfKind(LocationKind.CENTRAL_STORE).get(0).code();
        Map<Long, PartSummary> parts = partsById();
        Map<String, List<PurchasePlanLine>> bySupplier = new LinkedHashMap<>();
        plan.lines.stream().filter(l -> l.packs > 0).forEach(l -> bySupplier
                .computeIfAbsent(parts.get(l.partId).supplier(), k -> new ArrayList<>()).add(l));
        if (bySupplier.isEmpty()) {
            throw new BusinessRuleException("id", "purchase plan " + id + " buys nothing");
        }
        int n = 0;
        for (Map.Entry<String, List<PurchasePlanLine>> supplier : bySupplier.entrySet()) {
            int leadDays = supplier.getValue().stream().mapToInt(l -> parts.get(l.partId).leadTimeDays()).max()
                    .orElse(0);
            orders.place(new PurchaseOrderRequest("PP" + id + "-" + (++n), supplier.getKey(), central, plan.planningDate,
                    plan.planningDate.plusDays(leadDays), supplier.getValue().stream()
                    .map(l -> new PurchaseOrderRequest.Line(parts.get(l.partId).partNumber(), l.quantity)).toList()));
        }
        plan.status = PurchasePlan.Status.ACCEPTED;
        PurchasePlanResponse accepted = PurchasePlanResponse.from(plan, parts);
        audit.record("PURCHASE_PLAN_ACCEPTED", "purchase_plan", Long.toString(id), null, accepted);
        return accepted;
    }

    /** The lines bought, then the objective and the caution as two labelled rows, so a spreadsheet shows them. */
    @Transactional
    public CsvExport exportCsv(long id) {
        scope.requireProgramme();
        PurchasePlan plan = require(id);
        Map<Long, PartSummary> parts = partsById();
        PurchasePlanResponse response = PurchasePlanResponse.from(plan, parts);
        List<String> columns = List.of("part_number", "description", "supplier", "packs", "quantity", "unit_cost", "cost",
                "currency");
        List<List<?>> rows = new ArrayList<>();
        for (PurchasePlanLine l : plan.lines) {
            PartSummary part = parts.get(l.partId);
            if (l.packs > 0) {
                rows.add(List.of(part.partNumber(), part.description(), part.supplier(), l.packs,
                        l.quantity.toPlainString(), part.unitCost().toPlainString(), l.cost.toPlainString(), plan.currency));
            }
        }
        rows.add(List.of("objective", response.objective().statement(), "", "", "", "", "", ""));
        rows.add(List.of("caution", response.caution(), "", "", "", "", "", ""));
        return new CsvExport("purchase-plan-" + id + ".csv", columns, rows);
    }

    private Map<Long, PartSummary> partsById() {
        Map<Long, PartSummary> byId = new HashMap<>();
        parts.summaries().forEach(p -> byId.put(p.id(), p));
        return byId;
    }

    private PurchasePlan require(long id) {
        PurchasePlan plan = plans.findById(id);
        if (plan == null) {
            throw new EntityMissingException(null, "purchase plan", id);
        }
        return plan;
    }

    /** The currency most parts are priced in; parts priced otherwise stay out of the plan (no rate is set). */
    private static String programmeCurrency(List<StockPolicy> policies) {
        Map<String, Integer> counts = new LinkedHashMap<>();
        policies.forEach(p -> counts.merge(p.currency(), 1, Integer::sum));
        return counts.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey)
                .orElseThrow(() -> new BusinessRuleException("budget", "the catalogue has no priced parts"));
    }
}
