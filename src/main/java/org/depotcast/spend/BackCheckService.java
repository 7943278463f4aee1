package org.depotcast.spend;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.InvalidInputException;
import org.depotcast.core.spend.SpendDraws;
import org.depotcast.core.spend.SpendSimulation;
import org.depotcast.forecasting.FleetSnapshot;
import org.depotcast.forecasting.FleetSnapshotLoader;

import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * How good the projection has been on this programme: for each of the last complete financial years (see
 * {@link FinancialYearService}), the one-year projection made with only the data before that year began (the spend
 * lines as of that day: fleet models refitted on the history before it, the fleet as it stood), beside what the repairs of that year actually used, both at today's catalogue prices (price history is not
 * kept). Stock top-ups are left out: they are purchases, not use.
 */
@ApplicationScoped
public class BackCheckService {
    private static final int DRAWS = 4_000;

    private final FleetSnapshotLoader fleet;
    private final SpendLineService lines;
    private final AccessScope scope;
    private final FinancialYearService financialYears;

    private final Clock clock;

    BackCheckService(FleetSnapshotLoader fleet, SpendLineService lines, AccessScope scope,
                     FinancialYearService financialYears, Clock clock) {
        this.clock = clock;
        this.financialYears = financialYears;
        this.fleet = fleet;
        this.lines = lines;
        this.scope = scope;
    }

    /** {@code projectedBreakdowns}/{@code projectedServices} and {@code actualBreakdowns}/{@code actualServices} split the figures. */
    public record YearCheck(int year, String label, String months, double projectedMean, double projectedP10, double projectedP90,
                            double projectedP2_5, double projectedP97_5, double actual, boolean within80, boolean within95,
                            double projectedBreakdowns, double projectedServices, double actualBreakdowns,
                            double actualServices) {
    }

    @Transactional
    public List<YearCheck> check(int years) {
        scope.requireProgramme();
        if (years < 1 || years > 5) {
            throw new InvalidInputException("years", "must be between 1 and 5, was " + years);
        }
        Map<Long, PartSummary> partsById = lines.partsById();
        List<YearCheck> checks = new ArrayList<>();
        // A snapshot as of a year's start holds nothing dated after it: what was used comes from today's records.
        List<FleetSnapshot.Consumption> used = fleet.load(LocalDate.now(clock), 36).consumption();
        for (FinancialYears.Period period : financialYears.current().completedBefore(LocalDate.now(clock), years)) {
            LocalDate origin = period.startsOn();
            int year = origin.getYear();
            ScenarioDefinition oneYear = new ScenarioDefinition("back-check " + period.label(), 1, null, null, null, null,
                    null, null, null, DRAWS, (long) year);
            SpendLineBuilder builder = lines.build(oneYear, List.of(period), partsById);
            var yearLines = builder.lines();
            double expectedBreakdowns = 0, expectedServices = 0;
            for (var line : yearLines) {
                expectedBreakdowns += line.expectedEvents() * line.unitsPerEvent() * line.unitPrice();
                expectedServices += line.deterministicUnits() * line.unitPrice();
            }
            SpendDraws draws = SpendSimulation.run(yearLines, 1, builder.familyNames.size(), builder.partNumbers.size(),
                    Math.max(1, builder.depotCodes.size()), builder.groupLogSd, builder.groupDispersion, DRAWS, year);
            SpendSimulation.Summary s = SpendSimulation.Summary.of(draws.total(0));
            double actualBreakdowns = 0, actualServices = 0;
            for (FleetSnapshot.Consumption c : used) {
                if (!c.day().isBefore(period.startsOn()) && !c.day().isAfter(period.endsOn())) {
                    double spent = c.quantity() * partsById.get(c.partId()).unitCost().doubleValue();
                    if (c.breakdown()) {
                        actualBreakdowns += spent;
                    } else {
                        actualServices += spent;
                    }
                }
            }
            double actual = actualBreakdowns + actualServices;
            checks.add(new YearCheck(year, period.label(), period.months(), s.mean(), s.p10(), s.p90(), s.p2_5(), s.p97_5(), actual,
                    actual >= s.p10() && actual <= s.p90(), actual >= s.p2_5() && actual <= s.p97_5(),
                    expectedBreakdowns, expectedServices, actualBreakdowns, actualServices));
        }
        return checks;
    }
}
