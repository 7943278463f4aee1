package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;

import java.util.List;

/**
 * One component family's demand model, as declared in forecast-models/&lt;family&gt;.json.
 *
 * @param family                  the component family
 * @param covariates              GLM covariates, from {@link Covariate}
 * @param priorEventsPer1000Hours breakdowns per 1,000 operating hours used when the history is too thin to fit
 * @param unitsPerEvent           units replaced per breakdown; null to estimate from the history
 * @param methodPolicy            "auto" (backtest decides between fleet and history), "fleet", or a series method
 * @param preventive              whether scheduled services add demand for this family's parts
 * @param source                  the file it came from
 */
public record ForecastModelDefinition(ComponentFamily family, List<Covariate> covariates, double priorEventsPer1000Hours,
                                      Double unitsPerEvent, String methodPolicy, boolean preventive, String source) {

    /** Covariates the fleet model can use, computed per pump and period. */
    public enum Covariate {
        /** log(depth / 30 m): load on rods, pipes and seals grows with depth. */
        LOG_DEPTH,
        /** years since installation at mid-period. */
        AGE_YEARS,
        /** mean hours of use a day in the period. */
        USAGE_HOURS
    }

    static ForecastModelDefinition defaultFor(ComponentFamily family) {
        return new ForecastModelDefinition(family, List.of(Covariate.LOG_DEPTH, Covariate.AGE_YEARS), 0.02, null,
                "auto", false, "(built-in default)");
    }
}
