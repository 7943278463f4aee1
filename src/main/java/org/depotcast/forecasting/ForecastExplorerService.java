package org.depotcast.forecasting;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;
import org.depotcast.core.forecast.ErrorScores;
import org.depotcast.core.forecast.ForecastMethod;
import org.depotcast.core.forecast.SeriesForecaster;

import org.depotcast.core.forecast.FleetRateModel;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The programme lead's view into a stored forecast: monthly ranges, why the method was chosen, and the fleet model
 * of a family as rates against depth and daily use. Reads the latest finished run only; computes nothing it stores.
 */
@ApplicationScoped
public class ForecastExplorerService {
    static final String INTERVAL_MODEL = "Each month's demand: mean = the forecast; variance = the breakdowns' "
            + "(the in-sample one-step error for history methods; for the fleet model the fitted rate's with "
            + "overdispersion, plus the uncertainty of the fitted coefficients and of the credibility ratio) plus the "
            + "scheduled services' (which pumps reach their service interval depends on their future daily load, "
            + "uncertain by as much as a year's load strayed from its forecast on the fleet's own records); Poisson "
            + "when the variance does not exceed the mean, else negative binomial with the same two moments.";
    static final String BACKTEST_BASIS = "Rolling origin over the last 12 months, 3 months ahead, on the same monthly "
            + "history; lowest RMSSE wins, ties to the smaller bias.";
    static final String HOLDOUT_BASIS = "Last 12 months held out: the fleet model and the best history method each "
            + "fitted without them and scored by RMSSE on them, shown for comparison. Where a fleet model covers the part, "
            + "the forecast takes the fleet rate updated by the part's own history (credibility weighting), not the lower score.";
    private static final double HOURS_PER_YEAR_FACTOR = 365.25;
    private static final double[] DEPTHS_M = {10, 20, 30, 40, 50, 60, 70, 80, 90, 100};
    private static final double[] HOURS_PER_DAY = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12};

    private final ForecastQueryService queries;
    private final PartService parts;
    private final ForecastModelFiles modelFiles;

    ForecastExplorerService(ForecastQueryService queries, PartService parts, ForecastModelFiles modelFiles) {
        this.queries = queries;
        this.parts = parts;
        this.modelFiles = modelFiles;
    }

    public ForecastExplorerResponse part(String partNumber, String location) {
        StoredForecastResponse f = queries.forPart(partNumber, location);
        PartSummary part = parts.requireSummary(null, partNumber);
        List<ForecastExplorerResponse.MonthRange> ranges = new ArrayList<>();
        for (StoredForecastResponse.Month m : f.forecast()) {
            ForecastRange r = m.range();
            ranges.add(new ForecastExplorerResponse.MonthRange(m.month(), m.total(), r.distribution(), r.low80(),
                    r.high80(), r.low95(), r.high95()));
        }
        double[] history = f.history().stream().mapToDouble(StoredForecastResponse.HistoryMonth::quantity).toArray();
        List<ForecastExplorerResponse.MethodScore> methods = new ArrayList<>();
        if (history.length > 0) {
            Map<ForecastMethod, ErrorScores> scores = SeriesForecaster.forecastScored(history, null, Double.NaN, Double.NaN, 1).backtest();
            scores.forEach((method, s) -> methods.add(new ForecastExplorerResponse.MethodScore(method.name(),
                    ForecastRecords.finite(s.mase()), ForecastRecords.finite(s.rmsse()), ForecastRecords.finite(s.scaledBias()),
                    method.name().equals(f.method()))));
        }
        String chosen = DemandAssembler.FLEET.equals(f.method()) ? "fleet model" : "history";
        return new ForecastExplorerResponse(part.partNumber(), part.description(), part.unitOfIssue().name(), f.location(), f,
                ranges, INTERVAL_MODEL, new ForecastExplorerResponse.Holdout(chosen, f.fleetRmsse(), f.historyRmsse(), HOLDOUT_BASIS),
                methods, BACKTEST_BASIS);
    }

    /** Families with a fleet model in the latest run, in the catalogue's order. */
    public List<FleetModelResponse> fleetModels() {
        List<FleetModelResponse> out = new ArrayList<>();
        for (ComponentFamily family : ComponentFamily.values()) {
            try {
                out.add(queries.fleetModel(family.name()));
            } catch (EntityMissingException e) {
                // A family with no parts in the catalogue has no model in the run: nothing to show for it.
            }
        }
        return out;
    }

    public FleetModelView fleetModel(String family, Double depthM, Double hoursPerDay, Double ageYears) {
        FleetModelView.ReferencePump reference = reference(depthM, hoursPerDay, ageYears);
        FleetModelResponse fit = queries.fleetModel(family.toUpperCase(Locale.ROOT));
        double scale = fit.overdispersed() && fit.dispersion() != null ? Math.sqrt(fit.dispersion()) : 1;
        List<FleetModelView.Term> terms = new ArrayList<>();
        fit.coefficients().forEach((name, beta) -> {
            Double se = fit.standardErrors().get(name);
            Double adjusted = se == null ? null : se * scale;
            terms.add(new FleetModelView.Term(name, words(name), beta, adjusted,
                    adjusted == null ? null : beta - 1.96 * adjusted, adjusted == null ? null : beta + 1.96 * adjusted,
                    Math.exp(beta), adjusted == null ? null : Math.exp(beta - 1.96 * adjusted),
                    adjusted == null ? null : Math.exp(beta + 1.96 * adjusted)));
        });
        FleetRateModel model = queries.rateModelOf(fit.runId(), fit.family());
        List<FleetModelView.RatePoint> byDepth = new ArrayList<>();
        for (double d : DEPTHS_M) {
            byDepth.add(point(model, d, d, reference.hoursPerDay(), reference.ageYears()));
        }
        List<FleetModelView.RatePoint> byUse = new ArrayList<>();
        for (double h : HOURS_PER_DAY) {
            byUse.add(point(model, h, reference.depthM(), h, reference.ageYears()));
        }
        String note = "prior".equals(fit.source())
                ? "Too few breakdowns to fit (fewer than 10): the declared prior rate is used, the same at every depth and use."
                : fit.overdispersed() ? "Overdispersed (Pearson χ²/df above 1.5): intervals widened by its square root (quasi-Poisson)."
                : "Poisson fit; intervals are estimate ± 1.96 standard errors.";
        return new FleetModelView(fit, terms, reference, byDepth, byUse, note + leftOut(fit));
    }

    /** The declared covariates the fit did not keep (chosen by BIC), in words; empty when none or a prior. */
    private String leftOut(FleetModelResponse fit) {
        ForecastModelDefinition definition = modelFiles.load().get(ComponentFamily.valueOf(fit.family()));
        if (definition == null || !"fit".equals(fit.source())) {
            return "";
        }
        List<String> dropped = definition.covariates().stream().map(org.depotcast.core.forecast.RateCovariate::term)
                .filter(name -> !fit.coefficients().containsKey(name)).map(name -> switch (name) {
                    case "log_depth" -> "borehole depth";
                    case "age_years" -> "pump age";
                    case "usage_hours" -> "daily use beyond its hours";
                    default -> name;
                }).toList();
        return dropped.isEmpty() ? "" : " Left out because this family's breakdowns do not show an effect beyond chance "
                + "(BIC): " + String.join("; ", dropped) + ".";
    }

    /** The fleet-wide rate at a reference pump (no depot ratio), per pump-year of its daily use. */
    private static FleetModelView.RatePoint point(FleetRateModel model, double value, double depthM, double hoursPerDay,
                                                  double ageYears) {
        double breakdowns = model.ratePerHour(depthM, ageYears, hoursPerDay) * hoursPerDay * HOURS_PER_YEAR_FACTOR;
        return new FleetModelView.RatePoint(value, breakdowns, breakdowns * model.unitsPerEvent());
    }

    private static String words(String term) {
        return switch (term) {
            case "intercept" -> "log breakdowns per operating hour of a new pump at 30 m";
            case "log_depth" -> "per unit of log(depth / 30 m)";
            case "age_years" -> "per year of age";
            case "usage_hours" -> "per hour of daily use";
            default -> term;
        };
    }

    private static FleetModelView.ReferencePump reference(Double depthM, Double hoursPerDay, Double ageYears) {
        List<org.depotcast.common.FieldError> errors = new ArrayList<>();
        double d = depthM == null ? 30 : depthM, h = hoursPerDay == null ? 6 : hoursPerDay, a = ageYears == null ? 5 : ageYears;
        if (!(d > 0 && d <= 500)) {
            errors.add(new org.depotcast.common.FieldError("depthM", "must be above 0 and at most 500 m, was " + d));
        }
        if (!(h > 0 && h <= 24)) {
            errors.add(new org.depotcast.common.FieldError("hoursPerDay", "must be above 0 and at most 24, was " + h));
        }
        if (!(a >= 0 && a <= 60)) {
            errors.add(new org.depotcast.common.FieldError("ageYears", "must be between 0 and 60, was " + a));
        }
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
        return new FleetModelView.ReferencePump(d, h, a);
    }
}
