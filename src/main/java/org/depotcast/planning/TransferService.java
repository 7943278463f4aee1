package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.core.policy.DemandDistribution;
import org.depotcast.core.policy.ShortageReduction;
import org.depotcast.core.policy.TransferPlanner;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Transfers between depots before buying: suggestions from the transportation LP of {@link TransferPlanner}
 * (donors give only what they hold above their own reorder point; receivers at or below their reorder point ask up
 * to their order-up-to level, but only the units whose pump-days removed are worth the cheapest trip to them; cost per
 * unit = distance × cost per unit-km; a unit short is worth the pump-days it would cost). A suggestion's benefit is
 * the receiver's reduction in expected pump-days without water over its protection period
 * ({@link ShortageReduction}), counted after the units earlier suggestions already bring it. Dispatching and receiving are
 * {@link TransferOrderService}'s and {@link TransferReceiptService}'s.
 */
@ApplicationScoped
public class TransferService {
    private final PlanningService planning;
    private final LocationService locations;
    private final PartService parts;
    private final PlanningSettings settings;
    private final LaneCostRepository laneCosts;
    private final org.depotcast.access.AccessScope scope;
    private final org.depotcast.access.AuditService audit;
    private final SystemWork system;

    TransferService(PlanningService planning, LocationService locations, PartService parts,
                    PlanningSettings settings, LaneCostRepository laneCosts, org.depotcast.access.AccessScope scope,
                    org.depotcast.access.AuditService audit, SystemWork system) {
        this.system = system;
        this.scope = scope;
        this.audit = audit;
        this.planning = planning;
        this.locations = locations;
        this.parts = parts;
        this.settings = settings;
        this.laneCosts = laneCosts;
    }

    @Transactional
    public List<TransferResponses.Suggestion> suggest(String partNumber) {
        if (partNumber != null) {
            parts.require("part", partNumber);
        }
        List<LocationSummary> depots = locations.summariesOfKind(LocationKind.DEPOT);
        var visible = scope.current();
        // The plan balances every depot against every other, so it is made over all of them, as the system; an
        // officer then sees the moves that touch the depots assigned to them.
        List<TransferResponses.Suggestion> suggestions = system.call("transfer-suggestions", () -> {
            Map<String, Map<String, StockPolicy>> byPart = new HashMap<>();
            for (LocationSummary depot : depots) {
                for (StockPolicy p : planning.policies(depot.code())) {
                    if (partNumber == null || partNumber.equals(p.partNumber())) {
                        byPart.computeIfAbsent(p.partNumber(), k -> new HashMap<>()).put(depot.code(), p);
                    }
                }
            }
            List<TransferResponses.Suggestion> all = new ArrayList<>();
            byPart.keySet().stream().sorted().forEach(part -> all.addAll(suggestFor(part, depots, byPart.get(part))));
            return all;
        });
        Map<String, Long> ids = new HashMap<>();
        depots.forEach(d -> ids.put(d.code(), d.id()));
        return suggestions.stream().filter(s -> visible.sees(ids.get(s.from())) || visible.sees(ids.get(s.to()))).toList();
    }

    private List<TransferResponses.Suggestion> suggestFor(String part, List<LocationSummary> depots,
                                                          Map<String, StockPolicy> policies) {
        Sides sides = sides(depots, policies);
        if (sides.donors().isEmpty() || sides.receivers().isEmpty()) {
            return List.of();
        }
        LaneMatrix lanes = laneMatrix(sides);
        Map<String, DemandDistribution> demand = trimToWorthwhileUnits(sides, policies, lanes);
        // The LP's value of a unit short removed: its pump-days if it meets a breakdown (half the protection period).
        double penalty = settings.pumpDayValue() * (settings.depotTransferLeadDays() + settings.depotReviewDays()) / 2.0;
        List<TransferResponses.Suggestion> out = new ArrayList<>();
        Map<String, Double> received = new HashMap<>();
        for (TransferPlanner.Move move : TransferPlanner.plan(sides.surplus().stream().mapToLong(Long::longValue).toArray(),
                sides.deficit().stream().mapToLong(Long::longValue).toArray(), lanes.cost(), penalty)) {
            StockPolicy to = policies.get(sides.receivers().get(move.to()).code());
            double before = to.position() + received.getOrDefault(to.locationCode(), 0.0);
            received.merge(to.locationCode(), (double) move.units(), Double::sum);
            out.add(new TransferResponses.Suggestion(part, sides.donors().get(move.from()).code(), to.locationCode(),
                    move.units(), lanes.km()[move.from()][move.to()], move.unitCost(),
                    ShortageReduction.pumpDaysAvoided(demand.get(to.locationCode()), before, move.units(), to.protectionDays()),
                    to.protectionDays()));
        }
        out.sort(Comparator.comparing(TransferResponses.Suggestion::from).thenComparing(TransferResponses.Suggestion::to));
        return out;
    }

    /** Donors (units above their reorder point) and receivers (at or below it, with demand) of one part. */
    private record Sides(List<LocationSummary> donors, List<LocationSummary> receivers, List<Long> surplus,
                         List<Long> deficit) {
    }

    private static Sides sides(List<LocationSummary> depots, Map<String, StockPolicy> policies) {
        Sides sides = new Sides(new ArrayList<>(), new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        for (LocationSummary depot : depots) {
            StockPolicy p = policies.get(depot.code());
            if (p == null) {
                continue;
            }
            long spare = p.spareToGive();
            if (spare > 0) {
                sides.donors().add(depot);
                sides.surplus().add(spare);
            } else if (p.position() <= p.reorderPoint() && p.dailyDemand() > 0) {
                sides.receivers().add(depot);
                sides.deficit().add((long) Math.ceil(p.orderUpTo() - p.position()));
            }
        }
        return sides;
    }

    /** Distance and cost per unit of every donor-receiver lane, and the cheapest trip to each receiver. */
    private record LaneMatrix(double[][] km, double[][] cost, Map<LocationSummary, Double> cheapestIn) {
    }

    private LaneMatrix laneMatrix(Sides sides) {
        List<LocationSummary> donors = sides.donors(), receivers = sides.receivers();
        LaneMatrix matrix = new LaneMatrix(new double[donors.size()][receivers.size()],
                new double[donors.size()][receivers.size()], new HashMap<>());
        Map<String, Double> lanes = laneCosts.costsSet();
        for (int i = 0; i < donors.size(); i++) {
            for (int j = 0; j < receivers.size(); j++) {
                matrix.km()[i][j] = distanceKm(donors.get(i), receivers.get(j));
                Double set = lanes.get(LaneCostRepository.lane(donors.get(i).id(), receivers.get(j).id()));
                matrix.cost()[i][j] = set != null ? set : matrix.km()[i][j] * settings.transferCostPerUnitKm();
                matrix.cheapestIn().merge(receivers.get(j), matrix.cost()[i][j], Math::min);
            }
        }
        return matrix;
    }

    /**
     * A receiver asks only for the units whose pump-days removed are worth at least the cheapest trip to it: trims
     * each deficit in place and returns each receiver's demand distribution by location code.
     */
    private Map<String, DemandDistribution> trimToWorthwhileUnits(Sides sides, Map<String, StockPolicy> policies,
                                                                  LaneMatrix lanes) {
        Map<String, DemandDistribution> demand = new HashMap<>();
        for (int j = 0; j < sides.receivers().size(); j++) {
            StockPolicy p = policies.get(sides.receivers().get(j).code());
            DemandDistribution d = PolicyCalculator.distribution(p.demandMean(), p.demandVariance());
            demand.put(p.locationCode(), d);
            sides.deficit().set(j, ShortageReduction.worthwhileUnits(d, p.position(), sides.deficit().get(j),
                    p.protectionDays(), lanes.cheapestIn().get(sides.receivers().get(j)) / settings.pumpDayValue()));
        }
        return demand;
    }

    /** Every lane between two depots: its distance, the distance-based cost per unit, and the cost set for it, if any. */
    @Transactional
    public List<TransferResponses.Lane> lanes() {
        List<LocationSummary> depots = locations.summariesOfKind(LocationKind.DEPOT);
        Map<String, Double> set = laneCosts.costsSet();
        List<TransferResponses.Lane> out = new ArrayList<>();
        for (LocationSummary from : depots) {
            for (LocationSummary to : depots) {
                if (from.id() != to.id()) {
                    double km = distanceKm(from, to);
                    out.add(new TransferResponses.Lane(from.code(), to.code(), km,
                            km * settings.transferCostPerUnitKm(),
                            set.get(LaneCostRepository.lane(from.id(), to.id()))));
                }
            }
        }
        out.sort(Comparator.comparing(TransferResponses.Lane::from).thenComparing(TransferResponses.Lane::to));
        return out;
    }

    /** Sets the per-unit transport cost of one lane (programme lead or admin). */
    @Transactional
    public void setLaneCost(String fromCode, String toCode, BigDecimal unitCost) {
        LocationSummary from = locations.requireSummary("from", fromCode);
        LocationSummary to = locations.requireSummary("to", toCode);
        if (from.id() == to.id()) {
            throw new BusinessRuleException("to", "a lane joins two different stores");
        }
        laneCosts.set(from.id(), to.id(), unitCost);
        audit.record("LANE_COST_SET", "transfer_lane", fromCode + ">" + toCode, null, java.util.Map.of("unitCost", unitCost));
    }

    private static double distanceKm(LocationSummary a, LocationSummary b) {
        if (a.latitude() == null || a.longitude() == null || b.latitude() == null || b.longitude() == null) {
            return 0;
        }
        return TransferPlanner.distanceKm(a.latitude().doubleValue(), a.longitude().doubleValue(),
                b.latitude().doubleValue(), b.longitude().doubleValue());
    }
}
