package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.NoForecastYetException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.forecasting.ForecastQueryService;
import org.depotcast.stock.BalanceView;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.StockQueryService;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Stock policies per part and location, and the reorder alerts that follow from them. Reads only: planning never
 * changes stock on its own.
 */
@ApplicationScoped
public class PlanningService {
    static final String PROGRAMME = "PROGRAMME";

    private final PartService parts;
    private final LocationService locations;
    private final StockQueryService stock;
    private final ForecastQueryService forecasts;
    private final ServiceLevelRepository serviceLevelsSet;
    private final CurrentUser currentUser;
    private final PolicyCalculator calculator;
    private final PlanningSettings settings;
    private final org.depotcast.access.AccessScope scope;
    private final org.depotcast.access.AuditService audit;
    private final org.depotcast.requests.RequestService requests;
    private final Clock clock;
    private final org.depotcast.access.SystemWork system;
    private final TransferOrderService.Orders transfers;

    PlanningService(PartService parts, LocationService locations, StockQueryService stock, ForecastQueryService forecasts,
                    CurrentUser currentUser, PlanningSettings settings,
                    org.depotcast.access.AccessScope scope, org.depotcast.access.AuditService audit,
                    org.depotcast.requests.RequestService requests, ServiceLevelRepository serviceLevelsSet,
                    Clock clock, org.depotcast.access.SystemWork system, TransferOrderService.Orders transfers) {
        this.transfers = transfers;
        this.system = system;
        this.serviceLevelsSet = serviceLevelsSet;
        this.requests = requests;
        this.scope = scope;
        this.audit = audit;
        this.parts = parts;
        this.locations = locations;
        this.stock = stock;
        this.forecasts = forecasts;
        this.currentUser = currentUser;
        this.calculator = new PolicyCalculator(settings);
        this.settings = settings;
        this.clock = clock;
    }

    /**
     * Policies of every part with stock, stock on order or forecast demand at the location. A part held here with no
     * forecast in the latest run says so ({@code forecastMethod} "no forecast"); its demand is not taken as zero.
     * 409 before the first forecast run.
     */
    @Transactional
    public List<StockPolicy> policies(String locationCode) {
        requireForecasts();
        LocationSummary location = locations.requireSummary("location", locationCode);
        scope.require(location.id(), location.code());
        return policiesAt(location, false);
    }

    /** 409 (run the forecasts first) until a forecast run has finished: planning from no demand would mislead. */
    void requireForecasts() {
        if (!forecasts.anyRunFinished()) {
            throw new NoForecastYetException();
        }
    }

    /** Policies at a location in scope; with {@code breakdownsOnly}, from breakdown demand alone (no services). */
    List<StockPolicy> policiesAt(LocationSummary location, boolean breakdownsOnly) {
        if (location.kind() == LocationKind.IN_TRANSIT) {
            throw new InvalidInputException("location", "stock in transit has no reorder policy");
        }
        if (location.kind() == LocationKind.CENTRAL_STORE && !breakdownsOnly) {
            // The central store buys for the whole programme, so its reorder point is set against the echelon position
            // as the budget plan's: its own shelf alone would ask to buy again what the depots and kits already hold.
            return echelonPolicies(location, forecasts.demandAt(PROGRAMME, 3), serviceLevels(null)).stream()
                    .filter(p -> !AlertRules.NO_FORECAST.equals(p.forecastMethod()) || p.onHand() > 0 || p.onOrder() > 0)
                    .toList();
        }
        String forecastKey = location.kind() == LocationKind.CENTRAL_STORE ? PROGRAMME : location.code();
        int horizonMonths = location.kind() == LocationKind.KIT ? 2 : 3;
        Map<String, ForecastQueryService.DemandRate> demand = breakdownsOnly ? forecasts.breakdownsAt(forecastKey)
                : forecasts.demandAt(forecastKey, horizonMonths);
        Map<String, double[]> onHandOnOrder = new HashMap<>();
        for (BalanceView b : stock.balances(location.code())) {
            onHandOnOrder.put(b.partNumber(), new double[]{b.onHand().doubleValue(), b.onOrder().doubleValue()});
        }
        // A transfer dispatched here counts as on order until it is received: without it the store would be told
        // to buy, or be sent from another depot, what is already on the road to it.
        Map<Long, java.math.BigDecimal> onTheWay = transfers.onTheWayTo(location.id());
        Map<String, java.math.BigDecimal> committed = requests.committed();
        PolicyCalculator.ServiceLevels levels = serviceLevels(null);
        List<StockPolicy> policies = new ArrayList<>();
        for (PartSummary part : parts.summaries()) {
            ForecastQueryService.DemandRate rate = demand.get(part.partNumber());
            double[] held = onHandOnOrder.get(part.partNumber());
            double coming = onTheWay.getOrDefault(part.id(), java.math.BigDecimal.ZERO).doubleValue();
            if (rate == null && held == null && coming == 0) {
                continue;
            }
            policies.add(calculator.policy(part, location.code(), location.kind(),
                    rate == null ? 0 : rate.monthlyMean(), rate == null ? 0 : rate.monthlyVariance(),
                    rate == null ? AlertRules.NO_FORECAST : rate.method(), held == null ? 0 : held[0],
                    (held == null ? 0 : held[1]) + coming, committed.getOrDefault(location.code() + "|" + part.partNumber(),
                            java.math.BigDecimal.ZERO).doubleValue(), levels));
        }
        return policies;
    }

    /**
     * Programme-level policies for buying: programme-wide demand over the supplier lead time and central review,
     * against the echelon position (stock everywhere in the programme plus everything on order).
     */
    @Transactional
    public List<StockPolicy> programmePolicies() {
        return programmePolicies(null);
    }

    /** As {@link #programmePolicies()}, with one cycle service level for every part when {@code serviceLevel} is given. */
    @Transactional
    public List<StockPolicy> programmePolicies(Double serviceLevel) {
        scope.requireProgramme();
        requireForecasts();
        return echelonPolicies(central(), forecasts.demandAt(PROGRAMME, 3), serviceLevels(serviceLevel));
    }

    /**
     * As {@link #programmePolicies(Double)}, from the demand of forecast run {@code forecastRunId} whichever run has
     * finished since: a spend run reads its fleet models and its stock top-up from one run.
     */
    @Transactional
    public List<StockPolicy> programmePolicies(Double serviceLevel, long forecastRunId) {
        scope.requireProgramme();
        return echelonPolicies(central(), forecasts.demandOf(forecastRunId, PROGRAMME, 3), serviceLevels(serviceLevel));
    }

    /** Every part's policy at the central store against the echelon position (see {@link #programmePolicies()}). */
    private List<StockPolicy> echelonPolicies(LocationSummary central, Map<String, ForecastQueryService.DemandRate> demand,
                                              PolicyCalculator.ServiceLevels levels) {
        Map<String, double[]> echelon = new HashMap<>();
        // Every store and kit, whoever asks: a central-store officer buys for kits they do not see one by one.
        for (BalanceView b : system.call("echelon-position", () -> stock.balances(null))) {
            double[] cell = echelon.computeIfAbsent(b.partNumber(), k -> new double[3]);
            cell[0] += b.onHand().doubleValue();
            cell[1] += b.onOrder().doubleValue();
        }
        // Committed stock stays inside the programme (depot to kit), so the echelon position does not change.
        List<StockPolicy> policies = new ArrayList<>();
        for (PartSummary part : parts.summaries()) {
            ForecastQueryService.DemandRate rate = demand.get(part.partNumber());
            double[] held = echelon.getOrDefault(part.partNumber(), new double[3]);
            policies.add(calculator.policy(part, central.code(), LocationKind.CENTRAL_STORE,
                    rate == null ? 0 : rate.monthlyMean(), rate == null ? 0 : rate.monthlyVariance(),
                    rate == null ? AlertRules.NO_FORECAST : rate.method(), held[0], held[1], 0, levels));
        }
        return policies;
    }

    private LocationSummary central() {
        return locations.summariesOfKind(LocationKind.CENTRAL_STORE).stream().findFirst()
                .orElseThrow(() -> new BusinessRuleException("location", "the programme has no central store"));
    }

    /** The levels in force: a scenario's override, else the lead's settings, else the configured defaults. */
    PolicyCalculator.ServiceLevels serviceLevels(Double override) {
        if (override != null) {
            return new PolicyCalculator.ServiceLevels(override, override);
        }
        Map<String, Double> set = serviceLevelsSet.levelsSet();
        return new PolicyCalculator.ServiceLevels(set.getOrDefault("CRITICAL", settings.serviceLevelCritical()),
                set.getOrDefault("STANDARD", settings.serviceLevelStandard()));
    }

    /** The cycle service levels in force per part class, beside the configured defaults they replace. */
    public record ServiceLevelsInForce(double critical, double standard, double defaultCritical, double defaultStandard) {
    }

    @Transactional
    public ServiceLevelsInForce serviceLevelsInForce() {
        PolicyCalculator.ServiceLevels levels = serviceLevels(null);
        return new ServiceLevelsInForce(levels.critical(), levels.standard(), settings.serviceLevelCritical(),
                settings.serviceLevelStandard());
    }

    /** The programme lead sets the target cycle service level of critical or standard parts. */
    @Transactional
    public void setServiceLevel(String partClass, double level) {
        if (!partClass.equals("CRITICAL") && !partClass.equals("STANDARD")) {
            throw new InvalidInputException("partClass", "must be CRITICAL or STANDARD, was '" + partClass + "'");
        }
        if (!(level > 0 && level < 1)) {
            throw new InvalidInputException("level", "must be in (0, 1), was " + level);
        }
        PolicyCalculator.ServiceLevels before = serviceLevels(null);
        serviceLevelsSet.set(partClass, level, currentUser.name(), OffsetDateTime.now(clock));
        audit.record("SERVICE_LEVEL_SET", "service_level", partClass, before, Map.of("level", level));
    }
}
