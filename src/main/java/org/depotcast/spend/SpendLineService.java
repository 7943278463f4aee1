package org.depotcast.spend;

import io.quarkus.narayana.jta.QuarkusTransaction;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.ServiceKit;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.forecasting.FleetOutlook;
import org.depotcast.forecasting.FleetOutlooks;
import org.depotcast.forecasting.FleetSnapshot;
import org.depotcast.planning.PlanningService;
import org.depotcast.planning.StockPolicy;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The expected demand lines of a scenario as of an origin, from the fleet as a forecast run as of the same origin
 * sees it ({@link FleetOutlooks}): the same snapshot, usage history (measured hours included), rate models, depot
 * ratios and credibility, so a baseline projection's first twelve months equal the stored forecast depot by depot.
 */
@ApplicationScoped
class SpendLineService {
    private final FleetOutlooks outlooks;
    private final PartService parts;
    private final PumpModelService models;
    private final LocationService locations;
    private final PlanningService planning;

    SpendLineService(FleetOutlooks outlooks, PartService parts, PumpModelService models, LocationService locations,
                     PlanningService planning) {
        this.outlooks = outlooks;
        this.parts = parts;
        this.models = models;
        this.locations = locations;
        this.planning = planning;
    }

    /** Parts by id, checked to share one catalogue currency. */
    Map<Long, PartSummary> partsById() {
        Map<Long, PartSummary> partsById = new HashMap<>();
        parts.summaries().forEach(p -> partsById.put(p.id(), p));
        return partsById;
    }

    /** Every part in one catalogue currency; the scenario converts it with its own rate. */
    static String currency(ScenarioDefinition definition, Map<Long, PartSummary> partsById) {
        String catalogue = partsById.values().stream().map(PartSummary::currency).findFirst().orElse("USD");
        for (PartSummary p : partsById.values()) {
            if (!p.currency().equals(catalogue)) {
                throw new BusinessRuleException("exchangeRate", "part " + p.partNumber() + " is priced in " + p.currency()
                        + ", others in " + catalogue + ": one catalogue currency is needed");
            }
        }
        return definition.currency() == null ? catalogue : definition.currency();
    }

    /**
     * The fleet's lines over {@code periods} (the first starting at the origin) as {@link FleetOutlooks#asOf} sees
     * it, and the scenario's installations; no top-up (back-checks, tests).
     */
    SpendLineBuilder build(ScenarioDefinition definition, List<FinancialYears.Period> periods,
                           Map<Long, PartSummary> partsById) {
        int months = periods.stream().mapToInt(FinancialYears.Period::monthCount).sum();
        return withInstallations(new SpendLineBuilder(outlooks.asOf(periods.get(0).startsOn(), months), partsById,
                definition, periods), definition);
    }

    /**
     * A spend run's lines from the first day of {@code origin}'s month over the scenario's financial years: the
     * fleet, the installations and the stock needed now to reach the policy levels, the fleet models and the top-up's
     * demand both from forecast run {@code forecastRunId}, so a run finishing meanwhile mixes nothing in.
     */
    SpendLineBuilder build(ScenarioDefinition definition, FinancialYears financialYears, LocalDate origin,
                           Map<Long, PartSummary> partsById, long forecastRunId) {
        List<FinancialYears.Period> periods = financialYears.projection(origin.withDayOfMonth(1),
                definition.horizonYears());
        int months = periods.stream().mapToInt(FinancialYears.Period::monthCount).sum();
        SpendLineBuilder builder = withInstallations(new SpendLineBuilder(outlooks.asOf(periods.get(0).startsOn(),
                months, forecastRunId), partsById, definition, periods), definition);
        String central = locations.summariesOfKind(LocationKind.CENTRAL_STORE).get(0).code();
        for (StockPolicy p : planning.programmePolicies(definition.serviceLevel(), forecastRunId)) {
            PartSummary part = parts.requireSummary("partNumber", p.partNumber());
            builder.addTopUp(central, part.id(), Math.max(0, Math.ceil(p.orderUpTo() - p.position())));
        }
        return builder;
    }

    private SpendLineBuilder withInstallations(SpendLineBuilder builder, ScenarioDefinition definition) {
        builder.addFleet();
        for (ScenarioDefinition.Installation inst : definition.installations() == null
                ? List.<ScenarioDefinition.Installation>of() : definition.installations()) {
            addInstallation(builder, inst);
        }
        return builder;
    }

    private void addInstallation(SpendLineBuilder builder, ScenarioDefinition.Installation inst) {
        List<FleetSnapshot.BomPart> bom = new ArrayList<>();
        int[] interval = new int[1];
        QuarkusTransaction.requiringNew().run(() -> {
            ServiceKit kit = models.serviceKit("modelCode", inst.modelCode(), inst.depthM());
            interval[0] = kit.serviceIntervalHours();
            for (ServiceKit.Line line : kit.lines()) {
                bom.add(new FleetSnapshot.BomPart(line.partId(), line.family(), line.units()));
            }
        });
        long depotId = locations.requireSummary("depotCode", inst.depotCode()).id();
        builder.addInstallation(inst, depotId, interval[0], bom);
    }
}
